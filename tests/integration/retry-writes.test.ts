// Issue 15 §6: a create sent twice with one device-made id makes one row; release checks its stones and
// rates under lock and marks the job in the same transaction; sign-out clears the cookie with its flags;
// the purge removes what no longer counts.
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { jobs, plans, rateLimitBuckets, sessions } from "@/server/db/schema";
import { createJob } from "@/server/jobs/mutations";
import { releasePlan, savePlanDraft, saveQuickPlan } from "@/server/plans/mutations";
import { setStoneActive } from "@/server/stones/mutations";
import { endCurrentSession, SESSION_COOKIE_FLAGS } from "@/server/auth/session";
import { SESSION_COOKIE_NAME } from "@/server/auth/cookie";
import { purgeExpired } from "@/server/maintenance/purge";
import { newClientId } from "@/shared/client-id";
import { cookieJar } from "../support/next-request-mock";
import { asUser } from "../support/session";
import { jobInput } from "./jobs-support";
import { BORE_LENGTH_UM, CLEARANCE, PISTON_UM, baseRequest, changeRateRow, createPlanJob, createPlanShop, type PlanShop } from "./plans-fixtures";

let shop: PlanShop;
beforeAll(async () => {
  shop = await createPlanShop("retry-writes");
});

describe("one id, one row", () => {
  it("a job created twice at once with one id is one job with one number", async () => {
    const clientId = newClientId();
    const input = jobInput({ cylinderCount: 2, clientId });
    const [a, b] = await Promise.all([createJob({ actor: shop.actors.machinist, input }), createJob({ actor: shop.actors.machinist, input })]);
    const again = await createJob({ actor: shop.actors.machinist, input });
    expect([a, b, again].map((r) => r.id)).toEqual([clientId, clientId, clientId]);
    expect(new Set([a.number, b.number, again.number]).size).toBe(1);
    expect(await db.select().from(jobs).where(eq(jobs.id, clientId))).toHaveLength(1);
  });

  it("a job id of another shop is refused, not answered", async () => {
    const other = await createPlanShop("retry-writes other");
    const clientId = newClientId();
    await createJob({ actor: shop.actors.machinist, input: jobInput({ cylinderCount: 1, clientId }) });
    await expect(createJob({ actor: other.actors.machinist, input: jobInput({ cylinderCount: 1, clientId }) })).rejects.toMatchObject({ code: "conflict" });
  });

  it("a plan saved twice with one id is one plan", async () => {
    const job = await createPlanJob(shop.actors.machinist, 2);
    const clientId = newClientId();
    const input = { ...baseRequest(shop, job.jobId), clientId };
    const [a, b] = await Promise.all([savePlanDraft({ actor: shop.actors.machinist, input }), savePlanDraft({ actor: shop.actors.machinist, input })]);
    expect([a.planId, b.planId]).toEqual([clientId, clientId]);
    expect(await db.select({ id: plans.id }).from(plans).where(eq(plans.jobId, job.jobId))).toHaveLength(1);
  });

  it("a quick plan sent twice books in one job with one plan", async () => {
    const plan = { mode: "quick", boreMaterial: "grey_iron", boreLengthUm: BORE_LENGTH_UM, pistonDiameterUm: PISTON_UM, bore: { kind: "stock", stockUm: 70 }, machineId: shop.machineId, clearance: CLEARANCE };
    const input = { plan, job: { engineDescription: "Quick plan retry (invented)", cylinderCount: 2, standardBoreUm: 94_000 }, clientId: newClientId(), jobClientId: newClientId() };
    const first = await saveQuickPlan({ actor: shop.actors.machinist, input });
    const second = await saveQuickPlan({ actor: shop.actors.machinist, input });
    expect(second).toEqual(first);
    expect(first.jobId).toBe(input.jobClientId);
    expect(await db.select({ id: plans.id }).from(plans).where(eq(plans.jobId, first.jobId))).toHaveLength(1);
  });
});

describe("release", () => {
  it("refuses a plan whose rate table changed since it was saved", async () => {
    const job = await createPlanJob(shop.actors.machinist, 1);
    const { planId } = await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) });
    const own = await createPlanShop("retry-writes rates");
    const ownJob = await createPlanJob(own.actors.machinist, 1);
    const { planId: ownPlan } = await savePlanDraft({ actor: own.actors.machinist, input: baseRequest(own, ownJob.jobId) });
    await changeRateRow(own.actors.lead, own.rateRowIds.coarse);
    await expect(releasePlan({ actor: own.actors.lead, planId: ownPlan })).rejects.toMatchObject({ code: "conflict", message: expect.stringContaining("rate table") });
    // Released in the same transaction that marks the job planned.
    await releasePlan({ actor: shop.actors.lead, planId });
    const [row] = await db.select({ status: jobs.status }).from(jobs).where(eq(jobs.id, job.jobId));
    expect(row!.status).toBe("planned");
  });

  it("refuses a plan whose stone was retired, and a retirement never slips past a release", async () => {
    const own = await createPlanShop("retry-writes retire");
    const job = await createPlanJob(own.actors.machinist, 1);
    const { planId } = await savePlanDraft({ actor: own.actors.machinist, input: baseRequest(own, job.jobId) });
    const results = await Promise.allSettled([
      releasePlan({ actor: own.actors.lead, planId }),
      setStoneActive({ actor: own.actors.lead, input: { stoneId: own.stoneIds.finish, active: "false", reason: "Worn out (test)" } }),
    ]);
    // Exactly one wins: either the plan is released and the stone stays, or the stone is retired and the release refused.
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    const [plan] = await db.select({ status: plans.status }).from(plans).where(eq(plans.id, planId));
    if (plan!.status === "draft") {
      await expect(releasePlan({ actor: own.actors.lead, planId })).rejects.toMatchObject({ code: "conflict", message: expect.stringContaining("retired") });
    }
  });
});

describe("sessions and counters", () => {
  it("sign-out clears the session cookie with the flags it was set with", async () => {
    await asUser(shop.actors.machinist);
    await endCurrentSession();
    const cleared = cookieJar.get(SESSION_COOKIE_NAME)!;
    expect(cleared.value).toBe("");
    expect(cleared.options).toMatchObject({ ...SESSION_COOKIE_FLAGS, maxAge: 0 });
    expect(cleared.options.expires!.getTime()).toBe(0);
  });

  it("the purge deletes expired sessions and ended counters, and keeps live ones", async () => {
    const longAgo = new Date(Date.now() - 40 * 24 * 60 * 60 * 1000);
    const dead = randomUUID().replaceAll("-", "").padEnd(64, "0");
    const live = randomUUID().replaceAll("-", "").padEnd(64, "1");
    await db.insert(sessions).values([
      { id: dead, userId: shop.actors.owner.userId, expiresAt: longAgo, signedInAt: longAgo },
      { id: live, userId: shop.actors.owner.userId, expiresAt: new Date(Date.now() + 60_000), signedInAt: new Date() },
    ]);
    const oldKey = `purge-test:${randomUUID()}`;
    const newKey = `purge-test:${randomUUID()}`;
    await db.insert(rateLimitBuckets).values([
      { key: oldKey, windowStartedAt: longAgo, hits: 3, lastHitAt: longAgo },
      { key: newKey, windowStartedAt: new Date(), hits: 1, lastHitAt: new Date() },
    ]);
    await purgeExpired();
    expect(await db.select().from(sessions).where(eq(sessions.id, dead))).toHaveLength(0);
    expect(await db.select().from(sessions).where(eq(sessions.id, live))).toHaveLength(1);
    expect(await db.select().from(rateLimitBuckets).where(and(eq(rateLimitBuckets.key, oldKey)))).toHaveLength(0);
    expect(await db.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, newKey))).toHaveLength(1);
  });
});
