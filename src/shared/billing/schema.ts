// Billing schemas, shared by the forms and the server. Money arrives as text in major units
// ("45.50") or as integer minor units; quantities as text ("1.5") or integer thousandths.
import { z } from "zod";
import { MAX_MINOR, MAX_QUANTITY_MILLI, MAX_RATE_BP, parseMajor } from "@/lib/billing";
import { CLIENT_ID_PATTERN } from "@/shared/client-id";
import { PRICE_ITEM_KINDS } from "./constants";
import { quickSaveSchema } from "@/shared/plans/schema";

const clientId = z.string().regex(CLIENT_ID_PATTERN, "That id is not valid.");

/** Money in major units as typed ("45.50"), or integer minor units from JSON. */
export const moneyMinor = (label: string, min = 0) =>
  z.union([z.number(), z.string()]).transform((value, ctx) => {
    const minor = typeof value === "number" ? value : parseMajor(value);
    if (minor === null || !Number.isSafeInteger(minor)) {
      ctx.addIssue({ code: "custom", message: `Enter the ${label} as an amount, e.g. 45.50.` });
      return z.NEVER;
    }
    if (minor < min || minor > MAX_MINOR) {
      ctx.addIssue({ code: "custom", message: `The ${label} must be between ${min / 100} and ${MAX_MINOR / 100}.` });
      return z.NEVER;
    }
    return minor;
  });

/** A quantity with up to three decimals ("1.5", "4"), kept as integer thousandths. */
export const quantityMilli = z.union([z.number(), z.string()]).transform((value, ctx) => {
  const n = typeof value === "number" ? value / 1000 : Number(String(value).trim().replace(",", "."));
  const milli = Math.round(n * 1000);
  if (String(value).trim() === "" || !Number.isFinite(n) || Math.abs(n * 1000 - milli) > 1e-6) {
    ctx.addIssue({ code: "custom", message: "Enter the quantity with at most three decimals, e.g. 1.5." });
    return z.NEVER;
  }
  if (milli <= 0 || milli > MAX_QUANTITY_MILLI) {
    ctx.addIssue({ code: "custom", message: "The quantity must be above 0 and at most 100000." });
    return z.NEVER;
  }
  return milli;
});

/** A tax rate in percent as typed ("20", "7.5"), kept as basis points. */
export const ratePercentBp = z.union([z.number(), z.string()]).transform((value, ctx) => {
  const pct = typeof value === "number" ? value / 100 : Number(String(value).trim().replace(",", ".").replace(/%$/, ""));
  const bp = Math.round(pct * 100);
  if (!Number.isFinite(pct) || Math.abs(pct * 100 - bp) > 1e-6 || bp < 0 || bp > MAX_RATE_BP) {
    ctx.addIssue({ code: "custom", message: "Enter the tax rate in percent between 0 and 100, at most two decimals." });
    return z.NEVER;
  }
  return bp;
});

const email = z.string().trim().max(254).pipe(z.email("That is not an e-mail address."));

export const billingSettingsSchema = z.object({
  currency: z.string().trim().toUpperCase().regex(/^[A-Z]{3}$/, "Use a three-letter currency code (ISO 4217)."),
  paymentTermsDays: z.coerce.number().int("Whole days.").min(0, "At least 0 days.").max(365, "At most 365 days."),
  paymentTermsNote: z.string().trim().max(300, "At most 300 characters.").default(""),
  invoicePrefix: z.string().trim().max(12, "At most 12 characters.").regex(/^[A-Za-z0-9-/]*$/, "Letters, digits, - and / only."),
  cylinderSetUpMin: z.coerce.number().min(0, "At least 0 min.").max(600, "At most 600 min."),
  stoneChangeMin: z.coerce.number().min(0, "At least 0 min.").max(600, "At most 600 min."),
  jobSetUpMin: z.coerce.number().min(0, "At least 0 min.").max(6000, "At most 6000 min."),
});

export const taxRateSchema = z.object({ id: clientId, name: z.string().trim().min(1, "Name the rate.").max(60), rate: ratePercentBp });

export const priceItemSchema = z.object({
  id: clientId,
  kind: z.enum(PRICE_ITEM_KINDS, "Choose what the item prices."),
  name: z.string().trim().min(1, "Name the item.").max(120, "At most 120 characters."),
  unitPrice: moneyMinor("unit price"),
  taxRateId: z.string().max(36).optional().transform((v) => (v ? v : null)),
});

export const manualLineSchema = z.object({
  description: z.string().trim().min(1, "Describe the line.").max(200, "At most 200 characters."),
  quantity: quantityMilli,
  unitPrice: moneyMinor("unit price", -MAX_MINOR),
  taxRate: ratePercentBp,
});
export type ManualLine = z.infer<typeof manualLineSchema>;

const lines = z.array(manualLineSchema).max(50, "At most 50 lines.").default([]);

export const quoteCreateSchema = z
  .object({
    id: clientId,
    customerName: z.string().trim().min(1, "Name the customer.").max(120),
    customerEmail: email,
    note: z.string().trim().max(2000).default(""),
    jobId: z.string().max(36).optional(),
    quick: quickSaveSchema.optional(),
    lines,
  })
  .refine((q) => (q.jobId ? 1 : 0) + (q.quick ? 1 : 0) === 1, { message: "Quote a job or a quick plan.", path: ["jobId"] });
export type QuoteCreate = z.infer<typeof quoteCreateSchema>;

/** The job quote's plain form: the quote's fields and one optional manual line, as typed. */
export const quoteFormSchema = z
  .object({
    id: clientId,
    jobId: z.string().min(1).max(36),
    customerName: z.string().trim().min(1, "Name the customer.").max(120),
    customerEmail: email,
    note: z.string().trim().max(2000).default(""),
    lineDescription: z.string().trim().max(200).default(""),
    lineQuantity: z.string().max(20).default(""),
    lineUnitPrice: z.string().max(20).default(""),
    lineTaxRate: z.string().max(10).default(""),
  })
  .transform(({ lineDescription, lineQuantity, lineUnitPrice, lineTaxRate, ...q }, ctx) => {
    if (!lineDescription) return { ...q, lines: [] };
    const parsed = manualLineSchema.safeParse({ description: lineDescription, quantity: lineQuantity || "1", unitPrice: lineUnitPrice, taxRate: lineTaxRate || "0" });
    if (!parsed.success) {
      for (const issue of parsed.error.issues) ctx.addIssue({ code: "custom", path: [`line${String(issue.path[0] ?? "").replace(/^./, (c) => c.toUpperCase())}`], message: issue.message });
      return z.NEVER;
    }
    return { ...q, lines: [parsed.data] };
  });

export const invoiceCreateSchema = z.object({ id: clientId, jobId: z.string().min(1).max(36), lines });

export const invoiceUpdateSchema = z.object({
  version: z.coerce.number().int().min(1),
  customerName: z.string().trim().min(1, "Name the customer.").max(120),
  customerEmail: z.union([z.literal(""), email]).default(""),
  note: z.string().trim().max(2000).default(""),
  lines: z.array(manualLineSchema.extend({ source: z.enum(["plan", "work", "manual"]).default("manual") })).max(80, "At most 80 lines."),
});

export const voidSchema = z.object({ reason: z.string().trim().min(5, "Give the reason (at least 5 characters).").max(500, "At most 500 characters.") });

export const decisionSchema = z.object({ token: z.string().regex(/^[0-9a-f]{40}$/, "That link is not valid."), decision: z.enum(["accept", "decline"]) });

const positions = z.preprocess(
  (v) => (v === undefined || v === "" ? [] : Array.isArray(v) ? v : [v]),
  z.array(z.coerce.number().int().min(1).max(80)).max(80),
);

/** The name of an existing line's field in the draft's form: `line.3.quantity`. */
export const lineFieldName = (position: number, field: "description" | "quantity" | "unitPrice" | "taxRate") => `line.${position}.${field}`;

/**
 * The draft invoice's plain form: its header fields, every line edited in place (`line.<position>.<field>`,
 * text at most 200 characters; an absent field keeps its stored value), the lines to remove
 * and one new line to add.
 */
export const invoiceAmendSchema = z.object({
  invoiceId: z.string().min(1).max(36),
  version: z.coerce.number().int().min(1),
  customerName: z.string().trim().min(1, "Name the customer.").max(120),
  customerEmail: z.union([z.literal(""), email]).default(""),
  note: z.string().trim().max(2000).default(""),
  lineDescription: z.string().trim().max(200).default(""),
  lineQuantity: z.string().max(20).default(""),
  lineUnitPrice: z.string().max(20).default(""),
  lineTaxRate: z.string().max(10).default(""),
  removePosition: positions,
}).catchall(z.string().max(200));

export const invoiceDraftFormSchema = z.object({ id: clientId, jobId: z.string().min(1, "Choose the job.").max(36) });
