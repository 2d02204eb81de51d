// The e2e specs' set-ups. They run in a tsx child process (see set-up.ts), never in the Playwright
// runner: they write to the test database through the server functions. Each makes a fresh shop with
// its own uniquely named users, so runs never collide; the demo data comes from the demo seed.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db, pool } from "@/server/db";
import { jobs, memberships, shops, users } from "@/server/db/schema";
import type { Role } from "@/shared/auth/roles";
import type { UnitSystem } from "@/shared/units";
import { hashPassword } from "@/server/auth/password";
import type { DemoContext } from "@/server/demo/seed";
import { seedDemoJobs } from "@/server/demo/jobs";
import { seedDemoStones } from "@/server/demo/stones";
import { seedDemoFloor } from "@/server/demo/floor";
import { seedDemoRecordJob } from "@/server/demo/record";
import { seedDemoRunHistory } from "@/server/demo/runs";
import { learnedRates } from "@/server/db/schema";
import { listCylinders } from "@/server/jobs/queries";
import { createReadingSet } from "@/server/readings/mutations";
import { seedDemoBilling } from "@/server/demo/billing";
import { createQuote } from "@/server/billing/quotes";
import { createInvoiceDraft } from "@/server/billing/invoices";
import { hashToken, newToken } from "@/server/auth/tokens";
import { loadRecordSource } from "@/server/records/source";
import { buildRecordView } from "@/shared/records/view";
import { plans, quotes, recordLinks, recordVersions } from "@/server/db/schema";

type TestShop<R extends Role> = { shopId: string; ids: Record<R, string>; emails: Record<R, string>; context: DemoContext };

/** A shop with one user per role, named "E2E <role>", all with the password in E2E_PASSWORD. */
async function createTestShop<R extends Role>(label: string, roles: readonly R[], unitSystemOf: (role: R) => UnitSystem = () => "metric"): Promise<TestShop<R>> {
  const tag = randomUUID().slice(0, 8);
  const shopId = randomUUID();
  await db.insert(shops).values({ id: shopId, name: `E2E ${label} shop ${tag}` });
  const passwordHash = await hashPassword(process.env.E2E_PASSWORD ?? "");
  const ids = {} as Record<R, string>;
  const emails = {} as Record<R, string>;
  for (const role of roles) {
    ids[role] = randomUUID();
    emails[role] = `${role}-${label}-${tag}@example.test`;
    await db.insert(users).values({ id: ids[role], email: emails[role], name: `E2E ${role}`, passwordHash, unitSystem: unitSystemOf(role) });
    await db.insert(memberships).values({ id: randomUUID(), shopId, userId: ids[role], role });
  }
  return { shopId, ids, emails, context: { shopId, signIns: [], userIdsByRole: ids } };
}

async function demoJobId(shopId: string): Promise<string> {
  const [demo] = await db.select({ id: jobs.id }).from(jobs).where(and(eq(jobs.shopId, shopId), eq(jobs.number, 1)));
  if (!demo) throw new Error("The demo seed made no job #1");
  return demo.id;
}

/** A machinist and an apprentice with the demo jobs. */
async function intake() {
  const shop = await createTestShop("intake", ["machinist", "apprentice"] as const);
  await seedDemoJobs(shop.context);
  return { machinistEmail: shop.emails.machinist, apprenticeEmail: shop.emails.apprentice, demoJobId: await demoJobId(shop.shopId) };
}

/** A lead and an apprentice in mm and an owner in inches (DESIGN.md §5 units per user), with the demo library. */
async function stones() {
  const shop = await createTestShop("stones", ["lead", "apprentice", "owner"] as const, (role) => (role === "owner" ? "inch" : "metric"));
  await seedDemoStones(shop.context);
  return { leadEmail: shop.emails.lead, apprenticeEmail: shop.emails.apprentice, ownerEmail: shop.emails.owner };
}

/** A lead and a machinist, the demo library and jobs, and cylinder 5 of the demo job re-measured after boring with its top already too big. */
async function plan() {
  const shop = await createTestShop("plan", ["lead", "machinist"] as const);
  await seedDemoStones(shop.context);
  await seedDemoJobs(shop.context);
  const jobId = await demoJobId(shop.shopId);
  const actor = { userId: shop.ids.machinist, shopId: shop.shopId, role: "machinist" } as const;
  const five = (await listCylinders({ shopId: shop.shopId, jobId })).find((c) => c.number === 5);
  if (!five) throw new Error("The demo job has no cylinder 5");
  // Worn past the target at the top, but round and straight enough to hone to a larger piston.
  const levels = [{ name: "top", aUm: 92262, bUm: 92260 }, { name: "middle", aUm: 92258, bUm: 92257 }, { name: "bottom", aUm: 92256, bUm: 92255 }];
  await createReadingSet({ actor, jobId, input: { cylinderId: five.id, kind: "as_received", levels } });
  return { machinistEmail: shop.emails.machinist, leadEmail: shop.emails.lead, demoJobId: jobId };
}

/** A lead, a machinist and an apprentice with the demo library and the demo floor plan (both cylinders the apprentice's). */
async function floor() {
  const shop = await createTestShop("floor", ["lead", "machinist", "apprentice"] as const);
  await seedDemoStones(shop.context);
  const seeded = await seedDemoFloor(shop.context);
  return { apprenticeEmail: shop.emails.apprentice, machinistEmail: shop.emails.machinist, planId: seeded.planId };
}

/** An owner whose address is confirmed (so the shop may mail customers), a machinist and an apprentice, with the demo job that passed final inspection. */
async function record() {
  const shop = await createTestShop("record", ["owner", "lead", "machinist", "apprentice"] as const);
  await db.update(users).set({ emailConfirmedAt: new Date() }).where(eq(users.id, shop.ids.owner));
  await seedDemoStones(shop.context);
  const { jobId } = await seedDemoRecordJob(shop.context);
  return { machinistEmail: shop.emails.machinist, apprenticeEmail: shop.emails.apprentice, jobId };
}


/** A lead and a machinist with the demo library and the demo run history; the stone with the most learned runs. */
async function learning() {
  const shop = await createTestShop("learning", ["lead", "machinist"] as const);
  await seedDemoStones(shop.context);
  await seedDemoRunHistory(shop.context);
  const rows = await db.select({ stoneId: learnedRates.stoneId, state: learnedRates.state }).from(learnedRates).where(eq(learnedRates.shopId, shop.shopId));
  const best = rows.sort((a, b) => b.state.runsUsed - a.state.runsUsed)[0];
  if (!best) throw new Error("The demo run history learned nothing");
  return { leadEmail: shop.emails.lead, machinistEmail: shop.emails.machinist, stoneId: best.stoneId };
}

/** An owner (and the machinist the demo jobs need) with the demo jobs and their customers, for the settings and customer forms. */
async function settings() {
  const shop = await createTestShop("settings", ["owner", "machinist"] as const);
  await seedDemoJobs(shop.context);
  return { ownerEmail: shop.emails.owner };
}

/** An owner, a lead and a machinist with the demo library and jobs: the file pickers, the confirmations, the pairing. */
async function pickers() {
  const shop = await createTestShop("pickers", ["owner", "lead", "machinist"] as const);
  await seedDemoStones(shop.context);
  await seedDemoJobs(shop.context);
  return { ownerEmail: shop.emails.owner, leadEmail: shop.emails.lead, machinistEmail: shop.emails.machinist, demoJobId: await demoJobId(shop.shopId) };
}


/**
 * Every page's data for the fit e2e (issue 17): one user per role; the demo library, jobs, floor plan,
 * record job, price list and run history; a draft quote of the floor job with a live customer link, a
 * draft invoice of the record job, and the record sent once (its version and link written directly: the
 * mail renderer cannot load here, and the public page reads only the stored view).
 */
async function fit() {
  const shop = await createTestShop("fit", ["owner", "lead", "machinist", "apprentice"] as const);
  await db.update(users).set({ emailConfirmedAt: new Date() }).where(eq(users.id, shop.ids.owner));
  await seedDemoStones(shop.context);
  await seedDemoJobs(shop.context);
  const { planId } = await seedDemoFloor(shop.context);
  const { jobId: recordJobId } = await seedDemoRecordJob(shop.context);
  await seedDemoBilling(shop.context);
  const owner = { userId: shop.ids.owner, shopId: shop.shopId, role: "owner" } as const;
  const [planned] = await db.select({ jobId: plans.jobId }).from(plans).where(eq(plans.id, planId));
  const { id: quoteId } = await createQuote({ actor: owner, input: { id: randomUUID(), customerName: "Fit demo customer (demo)", customerEmail: `customer-fit-${shop.shopId.slice(0, 8)}@example.test`, jobId: planned!.jobId! } });
  const quoteToken = newToken();
  await db.update(quotes).set({ status: "sent", acceptTokenHash: hashToken(quoteToken), tokenExpiresAt: new Date(Date.now() + 86_400_000), sentAt: new Date() }).where(eq(quotes.id, quoteId));
  const { id: invoiceId } = await createInvoiceDraft({ actor: owner, input: { id: randomUUID(), jobId: recordJobId } });
  const versionId = randomUUID();
  const record = buildRecordView(await loadRecordSource({ actor: owner, jobId: recordJobId }), "metric");
  await db.insert(recordVersions).values({ id: versionId, shopId: shop.shopId, jobId: recordJobId, version: 1, unitSystem: "metric", data: record, pdfStoredName: `${versionId}.pdf`, pdfBytes: 0, sentTo: "record-fit@example.test", sentBy: shop.ids.owner });
  const recordToken = newToken();
  await db.insert(recordLinks).values({ id: randomUUID(), shopId: shop.shopId, jobId: recordJobId, versionId, tokenHash: hashToken(recordToken), expiresAt: new Date(Date.now() + 86_400_000) });
  return { emails: shop.emails, demoJobId: await demoJobId(shop.shopId), planJobId: planned!.jobId!, planId, recordJobId, quoteId, invoiceId, quoteToken, recordToken };
}



/** An owner and a lead in a shop with the demo run history, its time zone still the default UTC. */
async function timeZone() {
  const shop = await createTestShop("time-zone", ["owner", "lead", "machinist"] as const);
  await seedDemoStones(shop.context);
  await seedDemoRunHistory(shop.context);
  return { ownerEmail: shop.emails.owner, leadEmail: shop.emails.lead };
}


export const TEST_SHOPS = { intake, stones, plan, floor, record, learning, settings, pickers, fit, timeZone };
export type TestShopName = keyof typeof TEST_SHOPS;

/** Runs one set-up and prints its result as the last line of stdout for the runner. */
export async function runTestShop(name: TestShopName): Promise<void> {
  try {
    console.log(JSON.stringify(await TEST_SHOPS[name]()));
  } finally {
    await pool.end();
  }
}
