import { beforeAll, describe, expect, it, vi } from "vitest";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";

// The SDK talks to this file's own fake on its own port (env.ts reads it when the modules load).
const FAKE_PORT = vi.hoisted(() => {
  const port = 13_000 + Math.floor(Math.random() * 700);
  process.env.PAYMENT_API_BASE = `http://127.0.0.1:${port}`;
  return port;
});

// Mail stays in the outbox: the test reads the record mail from there.
vi.mock("@/server/mail/outbox", async (original) => ({ ...(await original<Record<string, unknown>>()), sendAfterCommit: vi.fn() }));

import { db } from "@/server/db";
import { emailOutbox, invoices } from "@/server/db/schema";
import { createInvoiceDraft, issueInvoice } from "@/server/billing/invoices";
import { checkoutLink } from "@/server/billing/payments";
import { checkoutForRecordToken, invoiceForRecordToken } from "@/server/billing/customer-payment";
import { sendRecord } from "@/server/records/send";
import { payRecordInvoiceAction } from "@/app/records/[token]/actions";
import { paymentFakeForFile } from "../support/payment-fake";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { callAction, signOutTestUser } from "../support/session";
import { createPassedJob } from "./records-fixtures";
import { priceShop } from "./billing-fixtures";

const fake = paymentFakeForFile(FAKE_PORT);
let shop: TestShop;
beforeAll(async () => {
  shop = await createShopWithMembers("record-pay");
  await priceShop(shop.actors.owner);
});

async function invoicedJob(issue: boolean) {
  const passed = await createPassedJob(shop, 1);
  const line = { description: "Gasket set (demo part)", quantity: "1", unitPrice: "12.99", taxRate: "20" };
  const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId: passed.job.jobId, lines: [line] } });
  if (issue) await issueInvoice({ actor: shop.actors.lead, invoiceId: id });
  return { jobId: passed.job.jobId, invoiceId: id };
}

async function sendAndRead(jobId: string) {
  const to = `record-pay-${randomUUID().slice(0, 8)}@example.test`;
  await sendRecord({ actor: shop.actors.machinist, input: { jobId, to, unitSystem: "metric", clientId: randomUUID() } });
  const [mail] = await db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, to));
  return { mail: mail!, token: /\/records\/([0-9a-f]{40})/.exec(mail!.text)![1]! };
}

const redirectOf = async (promise: Promise<unknown>) => {
  const error = await promise.then(() => null, (e: unknown) => e as { digest?: string });
  return error?.digest?.split(";")[2] ?? null; // NEXT_REDIRECT;<type>;<url>;<status>;
};

describe("the payment link with the machining record", () => {
  it("mails the issued invoice's link, the record page pays through the same checkout, then shows it paid", async () => {
    const { jobId, invoiceId } = await invoicedJob(true);
    const { mail, token } = await sendAndRead(jobId);
    const [row] = await db.select().from(invoices).where(eq(invoices.id, invoiceId));
    expect(row!.checkoutUrl).toMatch(new RegExp(`^http://127.0.0.1:${FAKE_PORT}/pay/cs_test_`));
    const amount = `${(row!.totalMinor / 100).toFixed(2)} EUR`;
    expect(mail.text).toContain(row!.checkoutUrl!);
    expect(mail.text).toContain(`Invoice ${row!.numberText} for this work is open: ${amount}`);
    expect((await checkoutLink({ actor: shop.actors.owner, invoiceId })).url).toBe(row!.checkoutUrl); // what the invoice mail sends

    expect(await invoiceForRecordToken(token)).toEqual({ numberText: row!.numberText, status: "issued", amount, paidOn: null });
    signOutTestUser(); // the customer has no account
    expect(await redirectOf(callAction(payRecordInvoiceAction, { token }))).toBe(row!.checkoutUrl);

    expect(await fake.pay(row!.checkoutUrl!.split("/").pop()!)).toBe(200);
    const paid = (await invoiceForRecordToken(token))!;
    expect(paid).toMatchObject({ status: "paid", amount });
    expect(paid.paidOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(await checkoutForRecordToken(token)).toBeNull();
    expect(await callAction(payRecordInvoiceAction, { token })).toMatchObject({ ok: false });
  });

  it("sends a job with only a draft invoice without any payment, and a dead link pays nothing", async () => {
    const { jobId, invoiceId } = await invoicedJob(false);
    const { mail, token } = await sendAndRead(jobId);
    expect(mail.text).not.toContain("Pay invoice");
    expect(await invoiceForRecordToken(token)).toBeNull();
    expect(await checkoutForRecordToken(token)).toBeNull();
    const [row] = await db.select({ checkoutUrl: invoices.checkoutUrl }).from(invoices).where(eq(invoices.id, invoiceId));
    expect(row!.checkoutUrl).toBeNull();
    expect(await invoiceForRecordToken("0".repeat(40))).toBeNull();
    expect(await callAction(payRecordInvoiceAction, { token: "not-a-token" })).toMatchObject({ ok: false });
  });
});
