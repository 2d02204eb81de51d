// Names of the billing domain, shared by the tables, the schemas and the screens.
export const PRICE_ITEM_KINDS = ["boring", "honing", "plateau", "torque_plate", "machine_hour", "labour_hour", "part", "other"] as const;
export type PriceItemKind = (typeof PRICE_ITEM_KINDS)[number];

export const PRICE_ITEM_KIND_LABELS: Record<PriceItemKind, string> = {
  boring: "Boring, per cylinder",
  honing: "Honing, per cylinder",
  plateau: "Plateau finish, per cylinder",
  torque_plate: "Torque-plate set-up, per job",
  machine_hour: "Machine time, per hour",
  labour_hour: "Labour, per hour",
  part: "Part",
  other: "Other",
};

export const QUOTE_STATUSES = ["draft", "sent", "accepted", "declined"] as const;
export type QuoteStatus = (typeof QUOTE_STATUSES)[number];

export const INVOICE_STATUSES = ["draft", "issued", "paid", "void"] as const;
export type InvoiceStatus = (typeof INVOICE_STATUSES)[number];

export const LINE_SOURCES = ["plan", "work", "manual"] as const;
export type LineSource = (typeof LINE_SOURCES)[number];
