import { describe, expect, it, vi } from "vitest";
import { randomUUID } from "node:crypto";
import { and, desc, eq } from "drizzle-orm";

// The quote mail stays in the outbox (no send after commit), so the test reads its link from there.
vi.mock("@/server/mail/outbox", async (original) => ({ ...(await original<Record<string, unknown>>()), sendAfterCommit: vi.fn() }));

import { db } from "@/server/db";
import { emailOutbox, jobs, memberships, plans, quotes } from "@/server/db/schema";
import { bookQuoteByHand, createQuote, decideQuote, getQuote, quoteForLink, sendQuote } from "@/server/billing/quotes";
import { savePlanDraft } from "@/server/plans/mutations";
import { baseRequest, BORE_LENGTH_UM, CLEARANCE, createPlanJob, createPlanShop, PISTON_UM, type PlanShop } from "./plans-fixtures";
import { priceShop } from "./billing-fixtures";
import { expectAppError } from "./jobs-support";

const line = (description: string, quantity: string, unitPrice: string, taxRate: string) => ({ description, quantity, unitPrice, taxRate });
const quick = (shop: PlanShop, cylinderCount = 4) => ({
  plan: { mode: "quick" as const, boreMaterial: "grey_iron" as const, boreLengthUm: BORE_LENGTH_UM, pistonDiameterUm: PISTON_UM, bore: { kind: "stock" as const, stockUm: 70 }, machineId: shop.machineId, clearance: CLEARANCE },
  job: { engineDescription: "Inline four, quote test (invented)", cylinderCount, standardBoreUm: 94_000 },
});

async function linkOf(shopId: string): Promise<string> {
  const [mail] = await db.select({ html: emailOutbox.html, to: emailOutbox.toAddress }).from(emailOutbox).where(and(eq(emailOutbox.shopId, shopId), eq(emailOutbox.kind, "quote"))).orderBy(desc(emailOutbox.createdAt)).limit(1);
  const token = /\/quote\/([0-9a-f]{40})/.exec(mail!.html)![1]!;
  return token;
}

async function pricedShop(label: string) {
  const shop = await createPlanShop(label);
  await priceShop(shop.actors.owner);
  return shop;
}

describe("quotes", () => {
  it("books an accepted quote whose booking failed by hand, once: a second call changes nothing", async () => {
    const shop = await pricedShop("quote-by-hand");
    const id = randomUUID();
    await createQuote({ actor: shop.actors.machinist, input: { id, customerName: "Hand customer (demo)", customerEmail: `quote-hand-${id}@example.test`, quick: quick(shop, 2) } });
    await sendQuote({ actor: shop.actors.machinist, quoteId: id });
    const token = await linkOf(shop.shopId);
    await expectAppError(bookQuoteByHand({ actor: shop.actors.lead, quoteId: id }), "conflict"); // sent, not accepted
    // The quote's author is an apprentice now, so the customer's acceptance cannot book the job.
    await db.update(memberships).set({ role: "apprentice" }).where(and(eq(memberships.userId, shop.actors.machinist.userId), eq(memberships.shopId, shop.shopId)));
    await expectAppError(decideQuote({ token, decision: "accept" }), "conflict");
    expect((await getQuote({ actor: shop.actors.owner, quoteId: id }))!).toMatchObject({ status: "accepted", bookedJobId: null });
    const jobsBefore = (await db.select({ id: jobs.id }).from(jobs).where(eq(jobs.shopId, shop.shopId))).length;

    await expectAppError(bookQuoteByHand({ actor: shop.actors.apprentice, quoteId: id }), "forbidden");
    const other = await createPlanShop("quote-by-hand-other");
    await expectAppError(bookQuoteByHand({ actor: other.actors.owner, quoteId: id }), "not_found");
    const first = await bookQuoteByHand({ actor: shop.actors.lead, quoteId: id });
    expect(first.alreadyBooked).toBe(false);
    const [booked] = await db.select().from(quotes).where(eq(quotes.id, id));
    expect({ job: booked!.bookedJobId, link: booked!.acceptTokenHash }).toEqual({ job: first.jobId, link: null });
    const [job] = await db.select({ number: jobs.number, cylinders: jobs.cylinderCount }).from(jobs).where(eq(jobs.id, first.jobId));
    expect(job).toEqual({ number: first.jobNumber, cylinders: 2 });

    const again = await Promise.all([bookQuoteByHand({ actor: shop.actors.owner, quoteId: id }), bookQuoteByHand({ actor: shop.actors.lead, quoteId: id })]);
    expect(again).toEqual([{ ...first, alreadyBooked: true }, { ...first, alreadyBooked: true }]);
    const [unchanged] = await db.select().from(quotes).where(eq(quotes.id, id));
    expect(unchanged).toEqual(booked);
    expect((await db.select({ id: jobs.id }).from(jobs).where(eq(jobs.shopId, shop.shopId))).length).toBe(jobsBefore + 1);
    expect(await db.select({ id: plans.id }).from(plans).where(eq(plans.jobId, first.jobId))).toHaveLength(1);
    await expectAppError(decideQuote({ token, decision: "accept" }), "bad_request"); // the link is spent
  });

  it("drafts a quote from a job's saved plan plus manual lines, and sends its lines and totals with a link", async () => {
    const shop = await pricedShop("quote-job");
    const job = await createPlanJob(shop.actors.machinist, 4);
    await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) });
    const id = randomUUID();
    const input = { id, customerName: "Demo customer", customerEmail: `quote-job-${id}@example.test`, jobId: job.jobId, lines: [line("Gasket set (demo part)", "1", "12.99", "0")] };
    await createQuote({ actor: shop.actors.machinist, input });
    expect(await createQuote({ actor: shop.actors.machinist, input })).toEqual({ id }); // a retry answers with the first
    const quote = (await getQuote({ actor: shop.actors.machinist, quoteId: id }))!;
    expect(quote.lines.map((l) => [l.description, l.source])).toEqual([["Honing per cylinder (demo price)", "plan"], ["Machine time per hour (demo price)", "plan"], ["Gasket set (demo part)", "manual"]]);
    expect(quote.lines[0]!.quantityMilli).toBe(4000);
    expect(quote.totalMinor).toBe(quote.netMinor + quote.taxMinor);
    expect(quote.estimatedMinutes).toBeGreaterThan(0);

    await expectAppError(sendQuote({ actor: shop.actors.apprentice, quoteId: id }), "forbidden");
    await sendQuote({ actor: shop.actors.machinist, quoteId: id });
    const [mail] = await db.select().from(emailOutbox).where(and(eq(emailOutbox.shopId, shop.shopId), eq(emailOutbox.kind, "quote")));
    expect(mail!.toAddress).toBe(input.customerEmail);
    expect(mail!.html).toContain("Gasket set (demo part)");
    expect(mail!.html).toContain(`${(quote.totalMinor / 100).toFixed(2)} EUR`);
    const token = await linkOf(shop.shopId);
    const [row] = await db.select({ hash: quotes.acceptTokenHash }).from(quotes).where(eq(quotes.id, id));
    expect(row!.hash).not.toContain(token); // stored hashed
    expect((await quoteForLink(token))!.totalMinor).toBe(quote.totalMinor);

    expect(await decideQuote({ token, decision: "accept" })).toEqual({ outcome: "accepted", jobNumber: job.number });
    const after = (await getQuote({ actor: shop.actors.owner, quoteId: id }))!;
    expect({ status: after.status, booked: after.bookedJobId, open: after.linkOpen }).toEqual({ status: "accepted", booked: job.jobId, open: false });
    await expectAppError(decideQuote({ token, decision: "accept" }), "bad_request"); // single use
  });

  it("books a quick plan's job in exactly once under a double click and concurrent accepts", async () => {
    const shop = await pricedShop("quote-quick");
    const id = randomUUID();
    await createQuote({ actor: shop.actors.machinist, input: { id, customerName: "Quick customer (demo)", customerEmail: `quote-quick-${id}@example.test`, quick: quick(shop, 3) } });
    const quote = (await getQuote({ actor: shop.actors.machinist, quoteId: id }))!;
    expect(quote.lines[0]).toMatchObject({ description: "Honing per cylinder (demo price)", quantityMilli: 3000 });
    await sendQuote({ actor: shop.actors.machinist, quoteId: id });
    const token = await linkOf(shop.shopId);
    const jobsBefore = await db.select({ id: jobs.id }).from(jobs).where(eq(jobs.shopId, shop.shopId));

    const answers = await Promise.allSettled(Array.from({ length: 4 }, () => decideQuote({ token, decision: "accept" })));
    const accepted = answers.filter((a): a is PromiseFulfilledResult<Awaited<ReturnType<typeof decideQuote>>> => a.status === "fulfilled");
    expect(accepted.length).toBeGreaterThanOrEqual(1);
    expect(new Set(accepted.map((a) => a.value.jobNumber)).size).toBe(1);
    for (const a of answers) if (a.status === "rejected") expect((a.reason as { code?: string }).code).toBe("bad_request");

    const jobsAfter = await db.select({ id: jobs.id, cylinderCount: jobs.cylinderCount, customerId: jobs.customerId }).from(jobs).where(eq(jobs.shopId, shop.shopId));
    expect(jobsAfter.length).toBe(jobsBefore.length + 1);
    const booked = (await getQuote({ actor: shop.actors.owner, quoteId: id }))!;
    const newJob = jobsAfter.find((j) => j.id === booked.bookedJobId)!;
    expect(newJob.cylinderCount).toBe(3);
    expect(await db.select({ id: plans.id }).from(plans).where(eq(plans.jobId, newJob.id))).toHaveLength(1);
    await expectAppError(decideQuote({ token, decision: "accept" }), "bad_request");
  });

  it("refuses a declined, an expired, a superseded and a malformed link, changing nothing", async () => {
    const shop = await pricedShop("quote-refuse");
    const mk = async () => {
      const id = randomUUID();
      await createQuote({ actor: shop.actors.machinist, input: { id, customerName: "Demo customer", customerEmail: `quote-refuse-${id}@example.test`, quick: quick(shop, 2) } });
      await sendQuote({ actor: shop.actors.machinist, quoteId: id });
      return { id, token: await linkOf(shop.shopId) };
    };
    const declined = await mk();
    expect(await decideQuote({ token: declined.token, decision: "decline" })).toEqual({ outcome: "declined", jobNumber: null });
    await expectAppError(decideQuote({ token: declined.token, decision: "accept" }), "bad_request");
    expect((await getQuote({ actor: shop.actors.owner, quoteId: declined.id }))!.status).toBe("declined");

    const expired = await mk();
    await db.update(quotes).set({ tokenExpiresAt: new Date(Date.now() - 1000) }).where(eq(quotes.id, expired.id));
    await expect(decideQuote({ token: expired.token, decision: "accept" })).rejects.toThrow(/expired/);
    expect((await getQuote({ actor: shop.actors.owner, quoteId: expired.id }))!).toMatchObject({ status: "sent", bookedJobId: null });

    const resent = await mk();
    await sendQuote({ actor: shop.actors.machinist, quoteId: resent.id });
    await expectAppError(decideQuote({ token: resent.token, decision: "accept" }), "bad_request"); // the older link is spent
    await expectAppError(decideQuote({ token: "not-a-token", decision: "accept" }), "bad_request");
    expect(await quoteForLink("0".repeat(40))).toBeNull();
    const jobsOfShop = await db.select({ id: jobs.id }).from(jobs).where(eq(jobs.shopId, shop.shopId));
    expect(jobsOfShop).toHaveLength(0);
  });

  it("answers another shop's quote as not found and refuses a quote of another shop's job", async () => {
    const shop = await pricedShop("quote-scope");
    const other = await createPlanShop("quote-scope-other");
    const job = await createPlanJob(other.actors.machinist, 1);
    await expectAppError(createQuote({ actor: shop.actors.machinist, input: { id: randomUUID(), customerName: "X", customerEmail: "x@example.test", jobId: job.jobId } }), "not_found");
    const id = randomUUID();
    await createQuote({ actor: shop.actors.machinist, input: { id, customerName: "X", customerEmail: "x@example.test", quick: quick(shop, 1) } });
    expect(await getQuote({ actor: other.actors.owner, quoteId: id })).toBeNull();
    await expectAppError(sendQuote({ actor: other.actors.owner, quoteId: id }), "not_found");
  });
});
