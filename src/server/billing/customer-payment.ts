import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/server/db";
import { invoices } from "@/server/db/schema";
import { logError } from "@/server/log";
import { jobOfRecordToken } from "@/server/records/links";
import { moneyText } from "@/shared/billing/format";
import { checkoutUrlOf } from "./payments";

// What the job's customer pays, shown with the machining record (its mail and its page): the job's
// newest issued or paid invoice. Drafts and void invoices are the shop's business, never the customer's.

export type CustomerInvoice = { numberText: string; status: "issued" | "paid"; amount: string; paidOn: string | null };

async function invoiceOfJob(shopId: string, jobId: string) {
  const [row] = await db.select().from(invoices)
    .where(and(eq(invoices.shopId, shopId), eq(invoices.jobId, jobId), inArray(invoices.status, ["issued", "paid"])))
    .orderBy(desc(invoices.issuedAt)).limit(1);
  return row ?? null;
}

const viewOf = (row: NonNullable<Awaited<ReturnType<typeof invoiceOfJob>>>): CustomerInvoice => ({
  numberText: row.numberText ?? "", status: row.status === "paid" ? "paid" : "issued", amount: moneyText(row.totalMinor, row.currency, row.currencyDigits),
  paidOn: row.paidAt ? row.paidAt.toISOString().slice(0, 10) : null,
});

/**
 * The invoice to mail with the record (the sender's permission is checked by the send): an issued one
 * carries its payment link, the same checkout as the invoice mail. If the payment service does not
 * answer, the record still goes, and `payLink` is null: the record's page offers the payment later.
 */
export async function invoiceForRecordMail(shopId: string, jobId: string): Promise<(CustomerInvoice & { payLink: string | null }) | null> {
  const row = await invoiceOfJob(shopId, jobId);
  if (!row || row.status !== "issued") return null;
  try {
    return { ...viewOf(row), payLink: await checkoutUrlOf(row) };
  } catch (error) {
    logError("record.payment_link", error);
    return { ...viewOf(row), payLink: null };
  }
}

/** The invoice shown on the record's customer page, or null (a dead link, no invoice issued yet). */
export async function invoiceForRecordToken(token: unknown): Promise<CustomerInvoice | null> {
  const target = await jobOfRecordToken(token);
  const row = target ? await invoiceOfJob(target.shopId, target.jobId) : null;
  return row ? viewOf(row) : null;
}

/** The payment page behind the record page's "Pay invoice"; null when the link is dead or nothing is owed. */
export async function checkoutForRecordToken(token: unknown): Promise<string | null> {
  const target = await jobOfRecordToken(token);
  const row = target ? await invoiceOfJob(target.shopId, target.jobId) : null;
  return row?.status === "issued" ? checkoutUrlOf(row) : null;
}
