import "server-only";
// Tables of the billing domain (issue 16): the shop's price list and billing settings, quotes and
// invoices with their lines, and payments. Money is integer minor units (BIGINT), quantities integer
// thousandths, tax rates integer basis points: nothing is stored as a float.
import { sql } from "drizzle-orm";
import { bigint, customType, decimal, index, int, json, mysqlEnum, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { timestamp } from "../columns";
import { jobs } from "./jobs";
import { INVOICE_STATUSES, LINE_SOURCES, PRICE_ITEM_KINDS, QUOTE_STATUSES } from "@/shared/billing/constants";

const id = () => varchar("id", { length: 36 }).primaryKey();
const shopId = () => varchar("shop_id", { length: 36 }).notNull();
const minor = (name: string) => bigint(name, { mode: "number" });
const createdAt = () => timestamp("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`);
const updatedAt = () => timestamp("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`);
/** Token hashes compare byte for byte, never case-insensitively (web-anchors A7, MariaDB caveat). */
const sha256Hex = customType<{ data: string; driverData: string }>({ dataType: () => "char(64) CHARACTER SET ascii COLLATE ascii_bin" });

/** One row per shop: currency, terms, time allowances and the invoice number sequence (locked on issue). */
export const billingSettings = mysqlTable("billing_settings", {
  shopId: varchar("shop_id", { length: 36 }).primaryKey(),
  currency: varchar("currency", { length: 3 }).notNull().default("EUR"),
  currencyDigits: int("currency_digits").notNull().default(2),
  paymentTermsDays: int("payment_terms_days").notNull().default(30),
  paymentTermsNote: varchar("payment_terms_note", { length: 300 }).notNull().default(""),
  invoicePrefix: varchar("invoice_prefix", { length: 12 }).notNull().default("INV-"),
  lastInvoiceNumber: int("last_invoice_number").notNull().default(0),
  cylinderSetUpMin: decimal("cylinder_set_up_min", { precision: 6, scale: 1, mode: "number" }).notNull().default(5),
  stoneChangeMin: decimal("stone_change_min", { precision: 6, scale: 1, mode: "number" }).notNull().default(2),
  jobSetUpMin: decimal("job_set_up_min", { precision: 6, scale: 1, mode: "number" }).notNull().default(15),
  updatedAt: updatedAt(),
});

export const taxRates = mysqlTable(
  "tax_rates",
  {
    id: id(),
    shopId: shopId(),
    name: varchar("name", { length: 60 }).notNull(),
    rateBp: int("rate_bp").notNull(),
    archivedAt: timestamp("archived_at"),
    createdAt: createdAt(),
  },
  (t) => [index("tax_rates_shop_idx").on(t.shopId)],
);

export const priceItems = mysqlTable(
  "price_items",
  {
    id: id(),
    shopId: shopId(),
    kind: mysqlEnum("kind", PRICE_ITEM_KINDS).notNull(),
    name: varchar("name", { length: 120 }).notNull(),
    unitPriceMinor: minor("unit_price_minor").notNull(),
    taxRateId: varchar("tax_rate_id", { length: 36 }),
    archivedAt: timestamp("archived_at"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("price_items_shop_kind_idx").on(t.shopId, t.kind)],
);

export const quotes = mysqlTable(
  "quotes",
  {
    id: id(),
    shopId: shopId(),
    jobId: varchar("job_id", { length: 36 }).references(() => jobs.id, { onDelete: "set null" }),
    /** A quick plan's saved request (quickSaveSchema): accepting it books the job in. */
    quickRequest: json("quick_request"),
    status: mysqlEnum("status", QUOTE_STATUSES).notNull().default("draft"),
    customerName: varchar("customer_name", { length: 120 }).notNull(),
    customerEmail: varchar("customer_email", { length: 254 }).notNull(),
    note: varchar("note", { length: 2000 }).notNull().default(""),
    currency: varchar("currency", { length: 3 }).notNull(),
    netMinor: minor("net_minor").notNull().default(0),
    taxMinor: minor("tax_minor").notNull().default(0),
    totalMinor: minor("total_minor").notNull().default(0),
    estimatedMinutes: decimal("estimated_minutes", { precision: 9, scale: 1, mode: "number" }),
    acceptTokenHash: sha256Hex("accept_token_hash"),
    tokenExpiresAt: timestamp("token_expires_at"),
    sentAt: timestamp("sent_at"),
    decidedAt: timestamp("decided_at"),
    bookedJobId: varchar("booked_job_id", { length: 36 }),
    createdBy: varchar("created_by", { length: 36 }).notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("quotes_shop_status_idx").on(t.shopId, t.status), uniqueIndex("quotes_accept_token_unique").on(t.acceptTokenHash)],
);

const lineColumns = () => ({
  id: id(),
  shopId: shopId(),
  position: int("position").notNull(),
  source: mysqlEnum("source", LINE_SOURCES).notNull(),
  description: varchar("description", { length: 200 }).notNull(),
  quantityMilli: int("quantity_milli").notNull(),
  unitPriceMinor: minor("unit_price_minor").notNull(),
  taxRateBp: int("tax_rate_bp").notNull(),
  netMinor: minor("net_minor").notNull(),
});

export const quoteLines = mysqlTable(
  "quote_lines",
  {
    ...lineColumns(),
    quoteId: varchar("quote_id", { length: 36 })
      .notNull()
      .references(() => quotes.id, { onDelete: "cascade" }),
  },
  (t) => [uniqueIndex("quote_lines_pos_unique").on(t.quoteId, t.position)],
);

export const invoices = mysqlTable(
  "invoices",
  {
    id: id(),
    shopId: shopId(),
    jobId: varchar("job_id", { length: 36 })
      .notNull()
      .references(() => jobs.id),
    status: mysqlEnum("status", INVOICE_STATUSES).notNull().default("draft"),
    /** Given on issue from the shop's sequence; NULL while a draft. */
    number: int("number"),
    numberText: varchar("number_text", { length: 24 }),
    customerName: varchar("customer_name", { length: 120 }).notNull(),
    customerEmail: varchar("customer_email", { length: 254 }).notNull().default(""),
    note: varchar("note", { length: 2000 }).notNull().default(""),
    currency: varchar("currency", { length: 3 }).notNull(),
    currencyDigits: int("currency_digits").notNull().default(2),
    netMinor: minor("net_minor").notNull().default(0),
    taxMinor: minor("tax_minor").notNull().default(0),
    totalMinor: minor("total_minor").notNull().default(0),
    /** The tax groups as frozen on issue: [{ taxRateBp, netMinor, taxMinor }]. */
    taxes: json("taxes").notNull(),
    /** Bumped by every edit, so a stale form cannot overwrite a newer draft. */
    version: int("version").notNull().default(1),
    issuedAt: timestamp("issued_at"),
    issuedBy: varchar("issued_by", { length: 36 }),
    dueAt: timestamp("due_at"),
    paidAt: timestamp("paid_at"),
    voidReason: varchar("void_reason", { length: 500 }),
    voidedAt: timestamp("voided_at"),
    voidedBy: varchar("voided_by", { length: 36 }),
    checkoutSessionId: varchar("checkout_session_id", { length: 255 }),
    checkoutUrl: varchar("checkout_url", { length: 2000 }),
    createdBy: varchar("created_by", { length: 36 }).notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("invoices_shop_number_unique").on(t.shopId, t.number),
    index("invoices_shop_status_idx").on(t.shopId, t.status),
    index("invoices_job_idx").on(t.jobId),
    uniqueIndex("invoices_checkout_session_unique").on(t.checkoutSessionId),
  ],
);

export const invoiceLines = mysqlTable(
  "invoice_lines",
  {
    ...lineColumns(),
    invoiceId: varchar("invoice_id", { length: 36 })
      .notNull()
      .references(() => invoices.id, { onDelete: "cascade" }),
  },
  (t) => [uniqueIndex("invoice_lines_pos_unique").on(t.invoiceId, t.position)],
);

/** One row per provider event applied: the unique event id makes a repeated webhook change nothing. */
export const payments = mysqlTable(
  "payments",
  {
    id: id(),
    shopId: shopId(),
    invoiceId: varchar("invoice_id", { length: 36 })
      .notNull()
      .references(() => invoices.id),
    provider: varchar("provider", { length: 20 }).notNull(),
    providerEventId: varchar("provider_event_id", { length: 255 }).notNull(),
    providerSessionId: varchar("provider_session_id", { length: 255 }).notNull(),
    providerPaymentId: varchar("provider_payment_id", { length: 255 }),
    amountMinor: minor("amount_minor").notNull(),
    currency: varchar("currency", { length: 3 }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("payments_provider_event_unique").on(t.provider, t.providerEventId), index("payments_invoice_idx").on(t.invoiceId)],
);

export type Quote = typeof quotes.$inferSelect;
export type Invoice = typeof invoices.$inferSelect;
export type BillingSettingsRow = typeof billingSettings.$inferSelect;
