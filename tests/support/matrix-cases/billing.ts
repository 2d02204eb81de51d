// Matrix rows for issue 16 (billing): price list and settings (owner), quotes (machinist and up),
// invoice drafts (machinist and up), issue and void (lead and owner). The actions that open another
// page (job quote form, draft invoice, pay by card) redirect and are covered by the e2e test. Sending an
// invoice needs the payment fake: role-matrix.test.ts runs one.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { bookQuoteAction, createQuoteAction, sendQuoteAction } from "@/app/(shop)/quotes/actions";
import { addTaxRateAction, updateBillingSettingsAction } from "@/app/(shop)/settings/billing/actions";
import { amendInvoiceAction, issueInvoiceAction, sendInvoiceAction, voidInvoiceAction } from "@/app/(shop)/invoices/actions";
import { db } from "@/server/db";
import { invoices, quotes } from "@/server/db/schema";
import { createQuote } from "@/server/billing/quotes";
import { createInvoiceDraft, issueInvoice } from "@/server/billing/invoices";
import type { MatrixCase, MatrixContext, Outcome } from "../matrix";
import { actionOutcome, routeOutcome } from "../matrix";
import { makeRequest } from "../session";
import { GET as quotePdf } from "@/app/api/quotes/[quoteId]/pdf/route";
import { GET as invoicePdf } from "@/app/api/invoices/[invoiceId]/pdf/route";
import { BORE_LENGTH_UM, CLEARANCE, createPlanJob, PISTON_UM, withLibrary } from "../../integration/plans-fixtures";
import { priceShop } from "../../integration/billing-fixtures";

const outcome = (result: { ok: boolean; message?: string }) => actionOutcome(result) as Outcome;
const settings = { currency: "EUR", paymentTermsDays: "30", paymentTermsNote: "", invoicePrefix: "M-", cylinderSetUpMin: "5", stoneChangeMin: "2", jobSetUpMin: "15" };

async function quickInput({ shop }: MatrixContext) {
  const planShop = await withLibrary(shop);
  return {
    id: randomUUID(), customerName: "Matrix customer (demo)", customerEmail: `matrix-${randomUUID()}@example.test`,
    quick: {
      plan: { mode: "quick", boreMaterial: "grey_iron", boreLengthUm: BORE_LENGTH_UM, pistonDiameterUm: PISTON_UM, bore: { kind: "stock", stockUm: 70 }, machineId: planShop.machineId, clearance: CLEARANCE },
      job: { engineDescription: "Matrix quick plan (invented)", cylinderCount: 1, standardBoreUm: 94_000 },
    },
  };
}

async function pricedQuote(c: MatrixContext): Promise<string> {
  await priceShop(c.shop.actors.owner);
  return (await createQuote({ actor: c.shop.actors.machinist, input: await quickInput(c) })).id;
}

async function draftInvoice({ shop }: MatrixContext): Promise<string> {
  const job = await createPlanJob(shop.actors.machinist, 1);
  const line = { description: "Matrix line (demo)", quantity: "1", unitPrice: "10.00", taxRate: "0" };
  return (await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId: job.jobId, lines: [line] } })).id;
}

const amend = (invoiceId: string) => ({ invoiceId, version: "1", customerName: "Matrix customer (demo)", lineDescription: "Part (demo)", lineQuantity: "1", lineUnitPrice: "2.50", lineTaxRate: "0" });

async function issuedWithAddress(c: MatrixContext): Promise<string> {
  const invoiceId = await draftInvoice(c);
  await issueInvoice({ actor: c.shop.actors.owner, invoiceId });
  await db.update(invoices).set({ customerEmail: `matrix-${randomUUID()}@example.test` }).where(eq(invoices.id, invoiceId));
  return invoiceId;
}

/** A quote the customer accepted whose booking failed (written as such: the booking's own test makes it fail for real). */
async function acceptedUnbooked(c: MatrixContext): Promise<string> {
  const quoteId = await pricedQuote(c);
  await db.update(quotes).set({ status: "accepted", decidedAt: new Date() }).where(eq(quotes.id, quoteId));
  return quoteId;
}

export const billingMatrixCases: MatrixCase[] = [
  { name: "action billing.updateSettings", allowed: ["owner"], otherShop: "allowed", call: async () => outcome(await updateBillingSettingsAction(null, settings)) },
  { name: "action billing.addTaxRate", allowed: ["owner"], otherShop: "allowed", call: async () => outcome(await addTaxRateAction(null, { id: randomUUID(), name: "Matrix (demo)", rate: "7.5" })) },
  { name: "action quotes.create", allowed: ["owner", "lead", "machinist"], otherShop: 404, call: async (c) => outcome(await createQuoteAction(null, await quickInput(c))) },
  { name: "action quotes.send", allowed: ["owner", "lead", "machinist"], otherShop: 404, call: async (c) => outcome(await sendQuoteAction(null, { quoteId: await pricedQuote(c) })) },
  { name: "action invoices.amend", allowed: ["owner", "lead", "machinist"], otherShop: 404, call: async (c) => outcome(await amendInvoiceAction(null, amend(await draftInvoice(c)))) },
  { name: "action quotes.bookByHand", allowed: ["owner", "lead", "machinist"], otherShop: 404, call: async (c) => outcome(await bookQuoteAction(null, { quoteId: await acceptedUnbooked(c) })) },
  { name: "action invoices.send", allowed: ["owner", "lead", "machinist"], otherShop: 404, call: async (c) => outcome(await sendInvoiceAction(null, { invoiceId: await issuedWithAddress(c) })) },
  { name: "action invoices.issue", allowed: ["owner", "lead"], otherShop: 404, call: async (c) => outcome(await issueInvoiceAction(null, { invoiceId: await draftInvoice(c) })) },
  {
    name: "GET /api/quotes/[quoteId]/pdf", allowed: ["owner", "lead", "machinist"], otherShop: 404,
    call: async (c) => { const quoteId = await pricedQuote(c); return routeOutcome(await quotePdf(makeRequest(`/api/quotes/${quoteId}/pdf`), { params: Promise.resolve({ quoteId }) })); },
  },
  {
    name: "GET /api/invoices/[invoiceId]/pdf", allowed: ["owner", "lead", "machinist"], otherShop: 404,
    call: async (c) => { const invoiceId = await draftInvoice(c); return routeOutcome(await invoicePdf(makeRequest(`/api/invoices/${invoiceId}/pdf`), { params: Promise.resolve({ invoiceId }) })); },
  },
  {
    name: "action invoices.void", allowed: ["owner", "lead"], otherShop: 404,
    call: async (c) => {
      const invoiceId = await draftInvoice(c);
      await issueInvoice({ actor: c.shop.actors.owner, invoiceId });
      return outcome(await voidInvoiceAction(null, { invoiceId, reason: "Matrix: issued by mistake" }));
    },
  },
];
