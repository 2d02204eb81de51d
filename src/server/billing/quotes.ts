import "server-only";
import { createHash, timingSafeEqual } from "node:crypto";
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import { db, type Tx } from "@/server/db";
import { inTransaction } from "@/server/db/retry";
import { customers, jobs, quoteLines, quotes, shops, type Quote } from "@/server/db/schema";
import { newId } from "@/server/db/ids";
import { assertCan } from "@/server/auth/guard";
import { findMembership } from "@/server/auth/memberships";
import { hashToken, isWellFormedToken, newToken } from "@/server/auth/tokens";
import type { Actor } from "@/shared/auth/policy";
import { can } from "@/shared/auth/policy";
import { AppError, isDuplicateKey, notFound } from "@/server/errors";
import { loadJob } from "@/server/jobs/access";
import { enqueueMail } from "@/server/mail/outbox";
import { mailWithPdf } from "@/server/mail/pdf-mail";
import { quoteMessage } from "@/server/mail/messages";
import { saveQuickPlan } from "@/server/plans/mutations";
import { previewRequest } from "@/server/plans/preview";
import { formatMinor } from "@/lib/billing";
import { quoteCreateSchema, type QuoteCreate } from "@/shared/billing/schema";
import type { QuickSaveRequest } from "@/shared/plans/schema";
import { draftLines, estimatedMinutes, priced } from "./lines";
import { billingPdf, quotePdfDocument } from "./pdf";
import { readLogo } from "@/server/records/logo";
import { priceListFor, settingsFor } from "./settings";
import { plannedWorkFor, workFromPlans, type WorkDone } from "./work";
import { dateTimeText, knownTimeZone } from "@/shared/time";

// Quotes (issue 16 part 3): priced from a job's saved plan or a quick plan plus manual lines, sent by
// e-mail with a one-time link, accepted or declined through it without an account. Accepting books
// the job in exactly once: a quick plan's quote makes the job and its plan with ids derived from the
// quote, so a double click, a retry or two accepts at once all land on the same job.
export const QUOTE_LINK_DAYS = 30;

/** A version-4-shaped id derived from the quote, so every booking of one quote names the same plan. */
function derivedId(quoteId: string, what: string): string {
  const h = createHash("sha256").update(`${quoteId}:${what}`).digest("hex");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-4${h.slice(13, 16)}-${"89ab"[parseInt(h[16]!, 16) % 4]}${h.slice(17, 20)}-${h.slice(20, 32)}`;
}

async function workToQuote(actor: Actor, q: QuoteCreate): Promise<{ work: WorkDone; torquePlate: boolean }> {
  if (q.jobId) {
    const job = await loadJob({ actor, jobId: q.jobId });
    return { work: await plannedWorkFor(actor.shopId, job.id), torquePlate: job.torquePlate };
  }
  const quick = q.quick!;
  const preview = await previewRequest({ actor, request: quick.plan });
  const plan = preview.cylinders[0]?.plan ?? null;
  if (!plan || !plan.canRelease) throw new AppError("bad_request", "The quick plan has errors: resolve them before quoting it.");
  return { work: workFromPlans(Array.from({ length: quick.job.cylinderCount }, (_, i) => ({ cylinder: i + 1, plan }))), torquePlate: false };
}

async function existingOf(actor: Actor, id: string): Promise<{ id: string } | null> {
  const [row] = await db.select({ id: quotes.id, shopId: quotes.shopId }).from(quotes).where(eq(quotes.id, id)).limit(1);
  if (!row) return null;
  if (row.shopId !== actor.shopId) throw new AppError("conflict", "That id is taken.");
  return { id: row.id };
}

/** Drafts a quote; the device's id makes a retried submission answer with the first quote. */
export async function createQuote({ actor, input }: { actor: Actor; input: unknown }): Promise<{ id: string }> {
  assertCan(actor, "quotes.edit");
  const q = quoteCreateSchema.parse(input);
  const earlier = await existingOf(actor, q.id);
  if (earlier) return earlier;
  const { work, torquePlate } = await workToQuote(actor, q);
  const settings = await settingsFor(actor.shopId);
  const drafted = draftLines({ work, priceList: await priceListFor(actor.shopId), settings, torquePlate, source: "plan", manual: q.lines });
  const { rows, totals } = priced(drafted);
  try {
    await inTransaction(async (tx) => {
      await tx.insert(quotes).values({
        id: q.id, shopId: actor.shopId, jobId: q.jobId ?? null, quickRequest: q.quick ?? null, customerName: q.customerName, customerEmail: q.customerEmail,
        note: q.note, currency: settings.currency, netMinor: totals.netMinor, taxMinor: totals.taxMinor, totalMinor: totals.totalMinor,
        estimatedMinutes: Math.round(estimatedMinutes(work, settings, torquePlate) * 10) / 10, createdBy: actor.userId,
      });
      if (rows.length > 0) await tx.insert(quoteLines).values(rows.map((r) => ({ ...r, id: newId(), shopId: actor.shopId, quoteId: q.id })));
    });
  } catch (error) {
    if (!isDuplicateKey(error)) throw error;
    const again = await existingOf(actor, q.id);
    if (again) return again;
    throw error;
  }
  return { id: q.id };
}

async function lockQuote(tx: Tx, where: ReturnType<typeof eq>): Promise<Quote | null> {
  const [row] = await tx.select().from(quotes).where(where).for("update");
  return row ?? null;
}

const money = (minor: number) => formatMinor(minor);
const milli = (q: number) => String(q / 1000);

function assertSendable(quote: Quote) {
  if (quote.status !== "draft" && quote.status !== "sent") throw new AppError("conflict", `This quote was ${quote.status} already.`);
  if (quote.totalMinor <= 0) throw new AppError("bad_request", "A quote needs a total above zero to be sent: add the shop's prices or a line.");
}

/** Sends (or re-sends) the quote: a fresh one-time link (only its hash kept; an earlier link stops working) through the outbox. */
export async function sendQuote({ actor, quoteId }: { actor: Actor; quoteId: string }): Promise<{ sentTo: string }> {
  assertCan(actor, "quotes.edit");
  const [quote] = await db.select().from(quotes).where(and(eq(quotes.id, quoteId), eq(quotes.shopId, actor.shopId))).limit(1);
  if (!quote) throw notFound("That quote");
  assertSendable(quote);
  const token = newToken();
  const sentAt = new Date();
  const expires = new Date(sentAt.getTime() + QUOTE_LINK_DAYS * 86_400_000);
  const [shop] = await db.select({ name: shops.name, timeZone: shops.timeZone }).from(shops).where(eq(shops.id, actor.shopId)).limit(1);
  const shopName = shop?.name ?? "The shop";
  const timeZone = knownTimeZone(shop?.timeZone);
  const lines = await db.select().from(quoteLines).where(and(eq(quoteLines.quoteId, quoteId), eq(quoteLines.shopId, actor.shopId))).orderBy(asc(quoteLines.position));
  const jobId = quote.bookedJobId ?? quote.jobId;
  const [job] = jobId ? await db.select({ number: jobs.number }).from(jobs).where(and(eq(jobs.id, jobId), eq(jobs.shopId, actor.shopId))).limit(1) : [];
  const mail = await quoteMessage({
    token, shopName, customerName: quote.customerName, note: quote.note, currency: quote.currency,
    lines: lines.map((l) => ({ description: l.description, quantity: milli(l.quantityMilli), unitPrice: money(l.unitPriceMinor), net: money(l.netMinor), taxRate: String(l.taxRateBp / 100) })),
    net: money(quote.netMinor), tax: money(quote.taxMinor), total: money(quote.totalMinor),
    estimatedHours: quote.estimatedMinutes ? (quote.estimatedMinutes / 60).toFixed(2) : null, expiresOn: dateTimeText(expires, timeZone),
  });
  const { doc, filename } = quotePdfDocument({
    quote: { ...quote, sentAt }, lines, shopName, timeZone, jobNumber: job?.number ?? null,
    closing: [`Accept or decline this quote from the link in its e-mail, valid until ${dateTimeText(expires, timeZone)}.`], logo: await readLogo(actor.shopId),
  });
  await mailWithPdf({ shopId: actor.shopId, filename, render: () => billingPdf(doc) }, async ({ attachment }) => ({
    value: null,
    outboxId: await inTransaction(async (tx) => {
      const locked = await lockQuote(tx, and(eq(quotes.id, quoteId), eq(quotes.shopId, actor.shopId))!);
      if (!locked) throw notFound("That quote");
      assertSendable(locked);
      await tx.update(quotes).set({ status: "sent", acceptTokenHash: hashToken(token), tokenExpiresAt: expires, sentAt, updatedAt: new Date() }).where(eq(quotes.id, quoteId));
      return enqueueMail(tx, { ...mail, to: quote.customerEmail, kind: "quote", shopId: actor.shopId, attachments: [attachment] });
    }),
  }));
  return { sentTo: "the customer" };
}

export type QuoteDecision = { outcome: "accepted" | "declined"; jobNumber: number | null };

const refused = (message: string) => new AppError("bad_request", message);
const LINK_REFUSED = "That link is not valid: it may have been used already, or the shop sent a newer one.";

function sameHash(stored: string | null, token: string): boolean {
  if (!stored) return false;
  const a = Buffer.from(stored, "utf8");
  const b = Buffer.from(hashToken(token), "utf8");
  return a.length === b.length && timingSafeEqual(a, b);
}

/** The quote behind a link, for the public page; null when the link is unknown, used or expired. */
export async function quoteForLink(token: string) {
  if (!isWellFormedToken(token)) return null;
  const [quote] = await db.select().from(quotes).where(eq(quotes.acceptTokenHash, hashToken(token))).limit(1);
  if (!quote || !sameHash(quote.acceptTokenHash, token)) return null;
  const [shop] = await db.select({ name: shops.name, timeZone: shops.timeZone }).from(shops).where(eq(shops.id, quote.shopId)).limit(1);
  const lines = await db.select().from(quoteLines).where(eq(quoteLines.quoteId, quote.id)).orderBy(asc(quoteLines.position));
  const expired = !quote.tokenExpiresAt || quote.tokenExpiresAt.getTime() <= Date.now();
  return {
    shopName: shop?.name ?? "", customerName: quote.customerName, note: quote.note, currency: quote.currency, status: quote.status, expired,
    netMinor: quote.netMinor, taxMinor: quote.taxMinor, totalMinor: quote.totalMinor, estimatedMinutes: quote.estimatedMinutes,
    expiresAt: quote.tokenExpiresAt?.toISOString() ?? null, timeZone: knownTimeZone(shop?.timeZone),
    lines: lines.map((l) => ({ description: l.description, quantityMilli: l.quantityMilli, unitPriceMinor: l.unitPriceMinor, taxRateBp: l.taxRateBp, netMinor: l.netMinor })),
  };
}

/**
 * The customer's answer through the link. One transaction decides (the quote row locked: of two
 * accepts at once, one decides and the other sees it decided); booking follows with ids derived from
 * the quote, and the link is spent only once the job is booked, so a failed booking can be retried
 * through the same link and never books twice.
 */
export async function decideQuote({ token, decision }: { token: string; decision: "accept" | "decline" }): Promise<QuoteDecision> {
  if (!isWellFormedToken(token)) throw refused(LINK_REFUSED);
  const decided = await inTransaction(async (tx) => {
    const quote = await lockQuote(tx, eq(quotes.acceptTokenHash, hashToken(token)));
    if (!quote || !sameHash(quote.acceptTokenHash, token)) throw refused(LINK_REFUSED);
    if (!quote.tokenExpiresAt || quote.tokenExpiresAt.getTime() <= Date.now()) throw refused("This quote's link has expired. Ask the shop for a new quote.");
    const resumable = quote.status === "accepted" && !quote.bookedJobId && decision === "accept";
    if (quote.status !== "sent" && !resumable) throw refused(LINK_REFUSED);
    if (decision === "decline") {
      await tx.update(quotes).set({ status: "declined", decidedAt: new Date(), acceptTokenHash: null, updatedAt: new Date() }).where(eq(quotes.id, quote.id));
      return null;
    }
    if (!resumable) await tx.update(quotes).set({ status: "accepted", decidedAt: new Date(), updatedAt: new Date() }).where(eq(quotes.id, quote.id));
    return quote;
  });
  if (!decided) return { outcome: "declined", jobNumber: null };
  const jobId = await bookIn(decided);
  await db.update(quotes).set({ bookedJobId: jobId, acceptTokenHash: null, updatedAt: new Date() }).where(eq(quotes.id, decided.id));
  const [job] = await db.select({ number: jobs.number }).from(jobs).where(eq(jobs.id, jobId)).limit(1);
  return { outcome: "accepted", jobNumber: job?.number ?? null };
}

/** The job an accepted quote books in: its own job, or a new one from the quick plan (as the quote's author, or whoever books it by hand). */
async function bookIn(quote: Quote, byHand: Actor | null = null): Promise<string> {
  if (quote.jobId) return quote.jobId;
  const membership = byHand ? null : await findMembership(quote.createdBy, quote.shopId);
  const actor: Actor | null = byHand ?? (membership ? { userId: quote.createdBy, shopId: quote.shopId, role: membership.role } : null);
  if (!actor || !can(actor, "plans.create") || !can(actor, "jobs.create")) throw new AppError("conflict", "The shop has to book this job in by hand; they have your acceptance.");
  const request = quote.quickRequest as QuickSaveRequest;
  const job = { ...request.job, customerName: request.job.customerName || quote.customerName };
  const { jobId } = await saveQuickPlan({ actor, input: { ...request, job, jobClientId: derivedId(quote.id, "job"), clientId: derivedId(quote.id, "plan") } });
  return jobId;
}

/**
 * Books in an accepted quote whose booking failed (machinist or above, as the one who books). The same
 * derived ids as the customer's link, so it books once whoever gets there first; a quote already booked
 * is answered as it is and nothing changes.
 */
export async function bookQuoteByHand({ actor, quoteId }: { actor: Actor; quoteId: string }): Promise<{ jobId: string; jobNumber: number | null; alreadyBooked: boolean }> {
  assertCan(actor, "quotes.edit");
  const [quote] = await db.select().from(quotes).where(and(eq(quotes.id, quoteId), eq(quotes.shopId, actor.shopId))).limit(1);
  if (!quote) throw notFound("That quote");
  if (quote.status !== "accepted") throw new AppError("conflict", "Only an accepted quote is booked in.");
  const alreadyBooked = quote.bookedJobId !== null;
  const jobId = quote.bookedJobId ?? (await bookIn(quote, actor));
  if (!alreadyBooked) await db.update(quotes).set({ bookedJobId: jobId, acceptTokenHash: null, updatedAt: new Date() }).where(and(eq(quotes.id, quote.id), isNull(quotes.bookedJobId)));
  const [job] = await db.select({ number: jobs.number }).from(jobs).where(and(eq(jobs.id, jobId), eq(jobs.shopId, actor.shopId))).limit(1);
  return { jobId, jobNumber: job?.number ?? null, alreadyBooked };
}

export async function getQuote({ actor, quoteId }: { actor: Actor; quoteId: string }) {
  assertCan(actor, "billing.view");
  const [quote] = await db.select().from(quotes).where(and(eq(quotes.id, quoteId), eq(quotes.shopId, actor.shopId))).limit(1);
  if (!quote) return null;
  const lines = await db.select().from(quoteLines).where(eq(quoteLines.quoteId, quoteId)).orderBy(asc(quoteLines.position));
  const jobIds = [quote.jobId, quote.bookedJobId].filter((x): x is string => !!x);
  const [job] = jobIds.length ? await db.select({ id: jobs.id, number: jobs.number }).from(jobs).where(and(eq(jobs.id, jobIds[jobIds.length - 1]!), eq(jobs.shopId, actor.shopId))).limit(1) : [];
  const { acceptTokenHash, quickRequest, ...rest } = quote; // the link's hash never leaves the server
  return { ...rest, linkOpen: acceptTokenHash !== null, quick: quickRequest ? (quickRequest as QuickSaveRequest).job : null, job: job ?? null, lines };
}

export async function listQuotes({ actor }: { actor: Actor }) {
  assertCan(actor, "billing.view");
  return db
    .select({ id: quotes.id, status: quotes.status, customerName: quotes.customerName, currency: quotes.currency, totalMinor: quotes.totalMinor, sentAt: quotes.sentAt, createdAt: quotes.createdAt })
    .from(quotes)
    .where(eq(quotes.shopId, actor.shopId))
    .orderBy(desc(quotes.createdAt))
    .limit(200);
}

/** The customer of a job, to fill the quote form. */
export async function customerOfJob({ actor, jobId }: { actor: Actor; jobId: string }) {
  const job = await loadJob({ actor, jobId });
  const [customer] = job.customerId ? await db.select({ name: customers.name, email: customers.email }).from(customers).where(and(eq(customers.id, job.customerId), eq(customers.shopId, actor.shopId))).limit(1) : [];
  return { jobId: job.id, number: job.number, engine: job.engineDescription, name: customer?.name ?? "", email: customer?.email ?? "" };
}
