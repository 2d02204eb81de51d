import "server-only";
import { and, asc, desc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "@/server/db";
import { billingSettings, customers, invoiceLines, invoices, jobs, type Invoice } from "@/server/db/schema";
import { newId } from "@/server/db/ids";
import { inTransaction } from "@/server/db/retry";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey, notFound } from "@/server/errors";
import { loadJob } from "@/server/jobs/access";
import { invoiceCreateSchema, invoiceUpdateSchema, voidSchema } from "@/shared/billing/schema";
import { draftLines, priced, type DraftLine } from "./lines";
import { priceListFor, settingsFor } from "./settings";
import { workDoneFor } from "./work";

// Invoices: drafted from the work done and manual lines (machinist+), issued — numbered from the
// shop's sequence and frozen — by the lead or owner, voided with a reason. Totals are recomputed on
// the server from the lines every time; nothing the client sends as a total is kept.

async function lockInvoice(tx: Tx, actor: Actor, invoiceId: string): Promise<Invoice> {
  const [row] = await tx.select().from(invoices).where(and(eq(invoices.id, invoiceId), eq(invoices.shopId, actor.shopId))).for("update");
  if (!row) throw notFound("That invoice");
  return row;
}

async function writeLines(tx: Tx, shopId: string, invoiceId: string, lines: DraftLine[]) {
  const { rows, totals } = priced(lines);
  await tx.delete(invoiceLines).where(eq(invoiceLines.invoiceId, invoiceId));
  if (rows.length > 0) await tx.insert(invoiceLines).values(rows.map((r) => ({ ...r, id: newId(), shopId, invoiceId })));
  return { netMinor: totals.netMinor, taxMinor: totals.taxMinor, totalMinor: totals.totalMinor, taxes: totals.taxes };
}

export async function createInvoiceDraft({ actor, input }: { actor: Actor; input: unknown }): Promise<{ id: string }> {
  assertCan(actor, "invoices.edit");
  const { id, jobId, lines } = invoiceCreateSchema.parse(input);
  const job = await loadJob({ actor, jobId });
  const [customer] = job.customerId ? await db.select().from(customers).where(and(eq(customers.id, job.customerId), eq(customers.shopId, actor.shopId))).limit(1) : [];
  const settings = await settingsFor(actor.shopId);
  const drafted = draftLines({ work: await workDoneFor(actor.shopId, jobId), priceList: await priceListFor(actor.shopId), settings, torquePlate: job.torquePlate, source: "work", manual: lines });
  try {
    await inTransaction(async (tx) => {
      await tx.insert(invoices).values({
        id, shopId: actor.shopId, jobId, customerName: customer?.name ?? "Walk-in customer", customerEmail: customer?.email ?? "",
        currency: settings.currency, currencyDigits: settings.currencyDigits, taxes: [], createdBy: actor.userId,
      });
      const totals = await writeLines(tx, actor.shopId, id, drafted);
      await tx.update(invoices).set(totals).where(eq(invoices.id, id));
    });
  } catch (error) {
    if (!isDuplicateKey(error)) throw error;
    const [existing] = await db.select({ shopId: invoices.shopId }).from(invoices).where(eq(invoices.id, id)).limit(1);
    if (existing?.shopId !== actor.shopId) throw new AppError("conflict", "That id is taken.");
  }
  return { id };
}

export async function updateInvoiceDraft({ actor, invoiceId, input }: { actor: Actor; invoiceId: string; input: unknown }) {
  assertCan(actor, "invoices.edit");
  const { version, lines, ...fields } = invoiceUpdateSchema.parse(input);
  return inTransaction(async (tx) => {
    const invoice = await lockInvoice(tx, actor, invoiceId);
    if (invoice.status !== "draft") throw new AppError("conflict", "An issued invoice is frozen; void it and draft a new one.");
    if (invoice.version !== version) throw new AppError("conflict", "Someone changed this invoice since you opened it. Reload to see their changes.");
    const totals = await writeLines(tx, actor.shopId, invoiceId, lines.map((l) => ({ source: l.source, description: l.description, quantityMilli: l.quantity, unitPriceMinor: l.unitPrice, taxRateBp: l.taxRate })));
    await tx.update(invoices).set({ ...fields, ...totals, version: invoice.version + 1, updatedAt: new Date() }).where(eq(invoices.id, invoiceId));
    return { version: invoice.version + 1 };
  });
}

/** Numbers the draft from the shop's sequence (locked row) and freezes its totals as they are now. */
export async function issueInvoice({ actor, invoiceId }: { actor: Actor; invoiceId: string }) {
  assertCan(actor, "invoices.issue");
  return inTransaction(async (tx) => {
    const invoice = await lockInvoice(tx, actor, invoiceId);
    if (invoice.status !== "draft") throw new AppError("conflict", "This invoice has already been issued.");
    if (invoice.totalMinor <= 0) throw new AppError("bad_request", "An invoice needs a total above zero to be issued.");
    const settings = await settingsFor(actor.shopId, tx);
    const [seq] = await tx.select().from(billingSettings).where(eq(billingSettings.shopId, actor.shopId)).for("update");
    const number = (seq?.lastInvoiceNumber ?? 0) + 1;
    await tx.update(billingSettings).set({ lastInvoiceNumber: number }).where(eq(billingSettings.shopId, actor.shopId));
    const issuedAt = new Date();
    const dueAt = new Date(issuedAt.getTime() + settings.paymentTermsDays * 86_400_000);
    const numberText = `${settings.invoicePrefix}${String(number).padStart(5, "0")}`;
    await tx.update(invoices).set({ status: "issued", number, numberText, issuedAt, issuedBy: actor.userId, dueAt, updatedAt: issuedAt }).where(eq(invoices.id, invoiceId));
    return { number, numberText };
  });
}

export async function voidInvoice({ actor, invoiceId, input }: { actor: Actor; invoiceId: string; input: unknown }) {
  assertCan(actor, "invoices.issue");
  const { reason } = voidSchema.parse(input);
  await inTransaction(async (tx) => {
    const invoice = await lockInvoice(tx, actor, invoiceId);
    if (invoice.status !== "issued") throw new AppError("conflict", invoice.status === "paid" ? "A paid invoice cannot be voided; refund it with the payment provider." : "Only an issued invoice can be voided; a draft is simply edited.");
    await tx.update(invoices).set({ status: "void", voidReason: reason, voidedAt: new Date(), voidedBy: actor.userId, updatedAt: new Date() }).where(eq(invoices.id, invoiceId));
  });
  return { ok: true as const };
}

export async function getInvoice({ actor, invoiceId }: { actor: Actor; invoiceId: string }) {
  assertCan(actor, "billing.view");
  const [row] = await db
    .select({ invoice: invoices, jobNumber: jobs.number, engine: jobs.engineDescription })
    .from(invoices)
    .innerJoin(jobs, eq(jobs.id, invoices.jobId))
    .where(and(eq(invoices.id, invoiceId), eq(invoices.shopId, actor.shopId)))
    .limit(1);
  if (!row) return null;
  const lines = await db.select().from(invoiceLines).where(eq(invoiceLines.invoiceId, invoiceId)).orderBy(asc(invoiceLines.position));
  return { ...row.invoice, jobNumber: row.jobNumber, engine: row.engine, lines };
}

export async function listInvoices({ actor }: { actor: Actor }) {
  assertCan(actor, "billing.view");
  return db
    .select({
      id: invoices.id, status: invoices.status, numberText: invoices.numberText, customerName: invoices.customerName, currency: invoices.currency,
      currencyDigits: invoices.currencyDigits, totalMinor: invoices.totalMinor, issuedAt: invoices.issuedAt, paidAt: invoices.paidAt, jobNumber: jobs.number,
    })
    .from(invoices)
    .innerJoin(jobs, eq(jobs.id, invoices.jobId))
    .where(eq(invoices.shopId, actor.shopId))
    .orderBy(desc(invoices.createdAt), desc(sql`${invoices.number}`))
    .limit(200);
}
