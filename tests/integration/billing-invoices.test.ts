import { describe, expect, it, vi } from "vitest";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";

// The SDK talks to this file's own fake on its own port (env.ts reads it when the modules load).
const FAKE_PORT = vi.hoisted(() => {
  const port = 12_200 + Math.floor(Math.random() * 700);
  process.env.PAYMENT_API_BASE = `http://127.0.0.1:${port}`;
  return port;
});

// Mail stays in the outbox (no send after commit): the invoice-mail test reads it from there.
vi.mock("@/server/mail/outbox", async (original) => ({ ...(await original<Record<string, unknown>>()), sendAfterCommit: vi.fn() }));

import { db } from "@/server/db";
import { emailOutbox, invoiceLines, invoices, payments, planStages } from "@/server/db/schema";
import { sendInvoice } from "@/server/billing/invoice-mail";
import { readStored } from "@/server/uploads/storage";
import { pdfText } from "@/server/pdf/pdf-text";
import { workDoneFor } from "@/server/billing/work";
import { createInvoiceDraft, getInvoice, issueInvoice, updateInvoiceDraft, voidInvoice } from "@/server/billing/invoices";
import { amendInvoiceDraft } from "@/server/billing/invoice-edit";
import { checkoutLink } from "@/server/billing/payments";
import { paymentConfig } from "@/env";
import { signPayload } from "../../scripts/payment-fake";
import { deliverWebhook as deliver, paymentFakeForFile } from "../support/payment-fake";
import { createPlanJob, createPlanShop } from "./plans-fixtures";
import { baseRequest } from "./plans-fixtures";
import { savePlanDraft } from "@/server/plans/mutations";
import { expectAppError } from "./jobs-support";
import { logRunsAsPlanned, priceShop } from "./billing-fixtures";

const fake = paymentFakeForFile(FAKE_PORT);

const line = (description: string, quantity: string, unitPrice: string, taxRate: string) => ({ description, quantity, unitPrice, taxRate });

async function shopWithPricedJob(label: string, ranCylinders = [1, 2, 3, 4]) {
  const shop = await createPlanShop(label);
  await priceShop(shop.actors.owner);
  const job = await createPlanJob(shop.actors.machinist, 4);
  const { planId } = await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) });
  await logRunsAsPlanned(shop.actors.machinist, planId, ranCylinders);
  return { shop, jobId: job.jobId, planId };
}

describe("invoices", () => {
  it("drafts from the run log: cylinders not run add nothing, the time is the strokes logged", async () => {
    const { shop, jobId, planId } = await shopWithPricedJob("bill-runs", [1, 3]);
    const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId, lines: [] } });
    const draft = (await getInvoice({ actor: shop.actors.machinist, invoiceId: id }))!;
    expect(draft.lines[0]!.quantityMilli).toBe(2000); // two cylinders honed, two not run
    const work = await workDoneFor(shop.shopId, jobId);
    expect(work.cylinders.map((c) => c.cylinder)).toEqual([1, 3]);
    const stages = await db.select().from(planStages).where(eq(planStages.planId, planId));
    const planned = stages.filter((s) => s.cylinderNumber === 1 && s.kind !== "bore").reduce((n, s) => n + (s.strokesNominal ?? 0) / s.doubleStrokesPerMin!, 0);
    const logged = work.cylinders[0]!.stages.reduce((n, s) => n + s.doubleStrokes / s.doubleStrokesPerMin, 0);
    expect(logged).toBeCloseTo(planned, 9);

    const none = await createPlanJob(shop.actors.machinist, 2);
    expect(await workDoneFor(shop.shopId, none.jobId)).toEqual({ cylinders: [], source: "none" });
  });

  it("drafts from the logged work, recomputes totals on the server and freezes them on issue", async () => {
    const { shop, jobId } = await shopWithPricedJob("bill-issue");
    const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId, lines: [line("Gasket set (demo part)", "1", "12.99", "0")] } });
    const draft = (await getInvoice({ actor: shop.actors.machinist, invoiceId: id }))!;
    expect(draft.status).toBe("draft");
    expect(draft.lines.map((l) => l.description)).toEqual(["Honing per cylinder (demo price)", "Machine time per hour (demo price)", "Gasket set (demo part)"]);
    expect(draft.lines[0]!.quantityMilli).toBe(4000);
    expect(draft.lines[1]!.quantityMilli).toBeGreaterThan(0);
    expect(draft.totalMinor).toBe(draft.netMinor + draft.taxMinor);
    expect(draft.netMinor).toBe(draft.lines.reduce((s, l) => s + l.netMinor, 0));

    await expectAppError(issueInvoice({ actor: shop.actors.machinist, invoiceId: id }), "forbidden");
    const issued = await issueInvoice({ actor: shop.actors.lead, invoiceId: id });
    expect(issued).toEqual({ number: 1, numberText: "INV-00001" });
    const frozen = (await getInvoice({ actor: shop.actors.owner, invoiceId: id }))!;
    await expectAppError(updateInvoiceDraft({ actor: shop.actors.owner, invoiceId: id, input: { version: frozen.version, customerName: "X", lines: [line("Changed", "1", "1.00", "0")] } }), "conflict");
    await expectAppError(issueInvoice({ actor: shop.actors.owner, invoiceId: id }), "conflict");
    const after = (await getInvoice({ actor: shop.actors.owner, invoiceId: id }))!;
    expect({ total: after.totalMinor, number: after.number, lines: after.lines.length }).toEqual({ total: frozen.totalMinor, number: 1, lines: 3 });

    const second = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId, lines: [] } });
    expect((await issueInvoice({ actor: shop.actors.owner, invoiceId: second.id })).number).toBe(2);
  });

  it("edits a draft with a version check and refuses bad lines without writing", async () => {
    const { shop, jobId } = await shopWithPricedJob("bill-edit");
    const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId, lines: [] } });
    const before = (await getInvoice({ actor: shop.actors.machinist, invoiceId: id }))!;
    await expect(updateInvoiceDraft({ actor: shop.actors.machinist, invoiceId: id, input: { version: 1, customerName: "Demo customer", lines: [line("Bad", "1.2345", "1", "0")] } })).rejects.toMatchObject({ name: "ZodError" });
    const { version } = await updateInvoiceDraft({ actor: shop.actors.machinist, invoiceId: id, input: { version: 1, customerName: "Demo customer", lines: [line("Labour (demo)", "1.5", "33.33", "20")] } });
    expect(version).toBe(2);
    const edited = (await getInvoice({ actor: shop.actors.machinist, invoiceId: id }))!;
    expect(edited.lines.length).toBe(1);
    expect(edited.netMinor).toBe(5000); // 1.5 × 33.33 = 49.995 → 50.00 (half away from zero, common practice)
    expect(edited.taxMinor).toBe(1000);
    expect(before.lines.length).toBe(2);
    await expectAppError(updateInvoiceDraft({ actor: shop.actors.machinist, invoiceId: id, input: { version: 1, customerName: "Stale", lines: [] } }), "conflict");
    await expectAppError(updateInvoiceDraft({ actor: shop.actors.apprentice, invoiceId: id, input: { version: 2, customerName: "A", lines: [] } }), "forbidden");
  });

  it("edits every line in place, removes and adds lines from the page's form, refuses a bad field whole, and is frozen once issued", async () => {
    const { shop, jobId } = await shopWithPricedJob("bill-amend", [1]);
    const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId, lines: [line("Gasket set (demo part)", "1", "12.99", "0")] } });
    const before = (await getInvoice({ actor: shop.actors.machinist, invoiceId: id }))!;
    expect(before.lines.map((l) => l.position)).toEqual([1, 2, 3]);
    const honing = before.lines[0]!.unitPriceMinor;
    const form = (extra: Record<string, unknown>) => ({ invoiceId: id, version: String(before.version), customerName: before.customerName, ...extra });

    const bad = form({ "line.1.quantity": "2", "line.3.unitPrice": "10.005", lineDescription: "Labour (demo)", lineUnitPrice: "" });
    await expect(amendInvoiceDraft({ actor: shop.actors.machinist, input: bad })).rejects.toMatchObject({
      code: "bad_request", fieldErrors: { "line.3.unitPrice": [expect.any(String)], lineUnitPrice: [expect.any(String)] },
    });
    expect(await getInvoice({ actor: shop.actors.machinist, invoiceId: id })).toEqual(before); // nothing changed

    await amendInvoiceDraft({ actor: shop.actors.machinist, input: form({
      "line.1.description": "Honing, four bores (demo)", "line.1.quantity": "3", "line.1.unitPrice": String(honing / 100), "line.1.taxRate": "20",
      removePosition: "2", "line.3.description": "Gasket set (demo part)", "line.3.quantity": "2", "line.3.unitPrice": "10.01", "line.3.taxRate": "0",
      lineDescription: "Labour (demo)", lineQuantity: "1.5", lineUnitPrice: "33.33", lineTaxRate: "20",
    }) });
    const edited = (await getInvoice({ actor: shop.actors.machinist, invoiceId: id }))!;
    expect(edited.lines.map((l) => [l.position, l.source, l.description, l.quantityMilli, l.unitPriceMinor, l.taxRateBp, l.netMinor])).toEqual([
      [1, "work", "Honing, four bores (demo)", 3000, honing, 2000, 3 * honing],
      [2, "manual", "Gasket set (demo part)", 2000, 1001, 0, 2002],
      [3, "manual", "Labour (demo)", 1500, 3333, 2000, 5000], // 1.5 × 33.33 = 49.995 → 50.00 (half away from zero, common practice)
    ]);
    expect(edited.netMinor).toBe(3 * honing + 2002 + 5000);
    expect(edited.version).toBe(before.version + 1);
    await expectAppError(amendInvoiceDraft({ actor: shop.actors.machinist, input: form({ "line.1.quantity": "9" }) }), "conflict"); // a stale form

    await issueInvoice({ actor: shop.actors.owner, invoiceId: id });
    const issued = (await getInvoice({ actor: shop.actors.owner, invoiceId: id }))!;
    const late = { ...form({ "line.1.quantity": "9", lineDescription: "Late line", lineUnitPrice: "1.00" }), version: String(issued.version) };
    await expectAppError(amendInvoiceDraft({ actor: shop.actors.owner, input: late }), "conflict");
    expect(await getInvoice({ actor: shop.actors.owner, invoiceId: id })).toEqual(issued);
  });

  it("voids an issued invoice only with a reason, and keeps it", async () => {
    const { shop, jobId } = await shopWithPricedJob("bill-void");
    const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId, lines: [] } });
    await expectAppError(voidInvoice({ actor: shop.actors.owner, invoiceId: id, input: { reason: "Wrong customer on it" } }), "conflict");
    await issueInvoice({ actor: shop.actors.owner, invoiceId: id });
    await expect(voidInvoice({ actor: shop.actors.owner, invoiceId: id, input: { reason: "" } })).rejects.toMatchObject({ name: "ZodError" });
    await voidInvoice({ actor: shop.actors.lead, invoiceId: id, input: { reason: "Wrong customer on it" } });
    const row = (await getInvoice({ actor: shop.actors.owner, invoiceId: id }))!;
    expect({ status: row.status, reason: row.voidReason, number: row.number }).toEqual({ status: "void", reason: "Wrong customer on it", number: 1 });
  });

  it("answers another shop's invoice as not found", async () => {
    const { shop, jobId } = await shopWithPricedJob("bill-scope");
    const other = await createPlanShop("bill-scope-other");
    const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId, lines: [] } });
    expect(await getInvoice({ actor: other.actors.owner, invoiceId: id })).toBeNull();
    await expectAppError(issueInvoice({ actor: other.actors.owner, invoiceId: id }), "not_found");
    await expectAppError(createInvoiceDraft({ actor: other.actors.owner, input: { id: randomUUID(), jobId, lines: [] } }), "not_found");
  });
});

describe("card payment through the fake", () => {
  async function issuedInvoice(label: string) {
    const { shop, jobId } = await shopWithPricedJob(label);
    const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId, lines: [] } });
    await issueInvoice({ actor: shop.actors.owner, invoiceId: id });
    return { shop, id };
  }

  it("creates one checkout for the frozen total; the signed webhook marks the invoice paid", async () => {
    const { shop, id } = await issuedInvoice("pay-ok");
    const { url } = await checkoutLink({ actor: shop.actors.machinist, invoiceId: id });
    expect(url).toMatch(new RegExp(`^http://127.0.0.1:${FAKE_PORT}/pay/cs_test_`));
    expect((await checkoutLink({ actor: shop.actors.machinist, invoiceId: id })).url).toBe(url);
    const sessionId = url.split("/").pop()!;
    const [invoice] = await db.select().from(invoices).where(eq(invoices.id, id));
    expect(fake.sessions.get(sessionId)!.amount_total).toBe(invoice!.totalMinor);
    expect(await fake.pay(sessionId)).toBe(200);
    const [paid] = await db.select().from(invoices).where(eq(invoices.id, id));
    expect(paid!.status).toBe("paid");
    expect(paid!.paidAt).toBeInstanceOf(Date);
    await expectAppError(checkoutLink({ actor: shop.actors.machinist, invoiceId: id }), "conflict");
  });

  it("refuses a bad signature and changes nothing", async () => {
    const { shop, id } = await issuedInvoice("pay-badsig");
    const { url } = await checkoutLink({ actor: shop.actors.machinist, invoiceId: id });
    const session = { ...fake.sessions.get(url.split("/").pop()!)!, status: "complete", payment_status: "paid" };
    const payload = JSON.stringify({ id: `evt_${randomUUID()}`, object: "event", created: 1, type: "checkout.session.completed", data: { object: session } });
    expect(await deliver(payload, signPayload(payload, "whsec_not_the_secret"))).toBe(400);
    expect(await deliver(payload, "")).toBe(400);
    expect(await deliver(payload.replace('"paid"', '"paid" '), signPayload(payload, paymentConfig().webhookSecret))).toBe(400);
    const stale = Math.floor(Date.now() / 1000) - 3600; // outside the SDK's default 300 s tolerance
    expect(await deliver(payload, signPayload(payload, paymentConfig().webhookSecret, stale))).toBe(400);
    const [row] = await db.select().from(invoices).where(eq(invoices.id, id));
    expect(row!.status).toBe("issued");
    expect(await db.select().from(payments).where(eq(payments.invoiceId, id))).toEqual([]);
    void shop;
  });

  it("applies the same event once, even delivered twice at the same time", async () => {
    const { shop, id } = await issuedInvoice("pay-twice");
    const { url } = await checkoutLink({ actor: shop.actors.machinist, invoiceId: id });
    const session = { ...fake.sessions.get(url.split("/").pop()!)!, status: "complete", payment_status: "paid", payment_intent: "pi_test_1" };
    const payload = JSON.stringify({ id: `evt_${randomUUID()}`, object: "event", created: Math.floor(Date.now() / 1000), type: "checkout.session.completed", data: { object: session } });
    const signature = signPayload(payload, paymentConfig().webhookSecret);
    const statuses = await Promise.all([deliver(payload, signature), deliver(payload, signature)]);
    expect(statuses).toEqual([200, 200]);
    expect(await deliver(payload, signature)).toBe(200);
    expect((await db.select().from(payments).where(eq(payments.invoiceId, id))).length).toBe(1);
    const [row] = await db.select().from(invoices).where(eq(invoices.id, id));
    expect(row!.status).toBe("paid");
    expect((await db.select().from(invoiceLines).where(eq(invoiceLines.invoiceId, id))).length).toBeGreaterThan(0);
  });

  it("will not take payment for a draft", async () => {
    const { shop, jobId } = await shopWithPricedJob("pay-draft");
    const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId, lines: [] } });
    await expectAppError(checkoutLink({ actor: shop.actors.machinist, invoiceId: id }), "conflict");
  });
});

describe("sending an invoice", () => {
  it("e-mails the issued invoice with its PDF and the card payment link; a draft or an invoice without an address is refused", async () => {
    const { shop, jobId } = await shopWithPricedJob("bill-send", [1]);
    const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId, lines: [] } });
    await expectAppError(sendInvoice({ actor: shop.actors.machinist, invoiceId: id }), "conflict"); // a draft
    const { numberText } = await issueInvoice({ actor: shop.actors.lead, invoiceId: id });
    await expectAppError(sendInvoice({ actor: shop.actors.machinist, invoiceId: id }), "bad_request"); // no address
    const address = `bill-send-${randomUUID()}@example.test`;
    await db.update(invoices).set({ customerEmail: address }).where(eq(invoices.id, id));
    await expectAppError(sendInvoice({ actor: shop.actors.apprentice, invoiceId: id }), "forbidden");

    expect(await sendInvoice({ actor: shop.actors.machinist, invoiceId: id })).toEqual({ sentTo: address });
    const [mail] = await db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, address));
    const [row] = await db.select({ checkoutUrl: invoices.checkoutUrl }).from(invoices).where(eq(invoices.id, id));
    expect(mail!.subject).toContain(`Invoice ${numberText}`);
    expect(mail!.html).toContain(row!.checkoutUrl!);
    const attachment = mail!.attachments![0]!;
    expect(attachment).toMatchObject({ contentType: "application/pdf", filename: `invoice-${numberText}.pdf` });
    expect(await pdfText(await readStored(attachment.shopId, attachment.storedName))).toContain(`Invoice ${numberText}`);
  });
});
