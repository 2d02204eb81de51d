import { describe, expect, it, vi } from "vitest";
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";

// The quote mail stays in the outbox (no send after commit), so the test reads its attachment from there.
vi.mock("@/server/mail/outbox", async (original) => ({ ...(await original<Record<string, unknown>>()), sendAfterCommit: vi.fn() }));

import { db } from "@/server/db";
import { emailOutbox } from "@/server/db/schema";
import { GET as invoicePdfRoute } from "@/app/api/invoices/[invoiceId]/pdf/route";
import { GET as quotePdfRoute } from "@/app/api/quotes/[quoteId]/pdf/route";
import { createInvoiceDraft, getInvoice, issueInvoice } from "@/server/billing/invoices";
import { createQuote, sendQuote } from "@/server/billing/quotes";
import { readStored } from "@/server/uploads/storage";
import { pdfText } from "@/server/pdf/pdf-text";
import { savePlanDraft } from "@/server/plans/mutations";
import { asUser, makeRequest } from "../support/session";
import { baseRequest, createPlanJob, createPlanShop } from "./plans-fixtures";
import { priceShop } from "./billing-fixtures";

const line = (description: string, quantity: string, unitPrice: string, taxRate: string) => ({ description, quantity, unitPrice, taxRate });
const params = <P>(p: P) => ({ params: Promise.resolve(p) });

async function pricedJob(label: string) {
  const shop = await createPlanShop(label);
  await priceShop(shop.actors.owner);
  const job = await createPlanJob(shop.actors.machinist, 2);
  await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) });
  return { shop, job };
}

describe("quote and invoice PDFs", () => {
  it("sends the quote with its PDF attached: the lines, the total with its currency and the job", async () => {
    const { shop, job } = await pricedJob("pdf-quote");
    const id = randomUUID();
    await createQuote({ actor: shop.actors.machinist, input: { id, customerName: "Demo customer", customerEmail: `pdf-quote-${id}@example.test`, jobId: job.jobId, lines: [line("Gasket set (demo part)", "1", "12.99", "0")] } });
    await sendQuote({ actor: shop.actors.machinist, quoteId: id });
    const [mail] = await db.select().from(emailOutbox).where(and(eq(emailOutbox.shopId, shop.shopId), eq(emailOutbox.kind, "quote")));
    expect(mail!.attachments).toEqual([expect.objectContaining({ contentType: "application/pdf", filename: `quote-job-${job.number}-${id.slice(0, 8)}.pdf` })]);
    const attachment = mail!.attachments![0]!;
    const text = await pdfText(await readStored(attachment.shopId, attachment.storedName), { layout: true });
    expect(text).toContain(`Quote for job #${job.number}`);
    expect(text).toContain("Gasket set (demo part)");
    expect(text).toMatch(/Total\s+[\d.]+ EUR/);

    await asUser(shop.actors.machinist);
    const response = await quotePdfRoute(makeRequest(`/api/quotes/${id}/pdf`), params({ quoteId: id }));
    expect(response.headers.get("content-type")).toBe("application/pdf");
    expect(await pdfText(new Uint8Array(await response.arrayBuffer()))).toContain("Gasket set (demo part)");
  });

  it("serves the invoice PDF marked as a draft, then with its number; another shop gets 404", async () => {
    const { shop, job } = await pricedJob("pdf-invoice");
    const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId: job.jobId, lines: [line("Gasket set (demo part)", "1", "12.99", "0")] } });
    await asUser(shop.actors.machinist);
    const draft = await pdfText(new Uint8Array(await (await invoicePdfRoute(makeRequest(`/api/invoices/${id}/pdf`), params({ invoiceId: id }))).arrayBuffer()));
    expect(draft).toContain("Invoice (draft, not issued)");
    expect(draft).toContain("Gasket set (demo part)");
    const { numberText } = await issueInvoice({ actor: shop.actors.lead, invoiceId: id });
    const invoice = (await getInvoice({ actor: shop.actors.lead, invoiceId: id }))!;
    const issued = await pdfText(new Uint8Array(await (await invoicePdfRoute(makeRequest(`/api/invoices/${id}/pdf`), params({ invoiceId: id }))).arrayBuffer()));
    expect(issued).toContain(`Invoice ${numberText}`);
    expect(issued).toContain(`${(invoice.totalMinor / 100).toFixed(2)} EUR`);

    const other = await createPlanShop("pdf-invoice-other");
    await asUser(other.actors.owner);
    expect((await invoicePdfRoute(makeRequest(`/api/invoices/${id}/pdf`), params({ invoiceId: id }))).status).toBe(404);
  });
});
