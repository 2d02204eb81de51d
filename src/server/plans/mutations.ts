import "server-only";
import { inTransaction } from "@/server/db/retry";
import { and, asc, eq, inArray, ne, sql } from "drizzle-orm";
import { db, type Db, type Tx } from "@/server/db";
import { clientIdOrNew } from "@/server/http/client-id";
import { jobs, plans, rateRows, stones, type Plan, type PlanRateVersion } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey, notFound } from "@/server/errors";
import { createJob } from "@/server/jobs/mutations";
import { loadJob } from "@/server/jobs/access";
import { buildJobPlanInput, buildQuickPlanInput } from "./inputs";
import { shapePreview, type ComputedPreview } from "./preview";
import { fromJson, insertPlan } from "./store";
import { jobPlanSchema, quickSaveSchema, withdrawSchema, type JobPlanRequest } from "@/shared/plans/schema";

/** A plan that still lacks a bore or a piston figure cannot be saved: say which cylinder and what. */
function assertComplete(preview: ComputedPreview): void {
  const needs = preview.cylinders.flatMap((c, i) => c.needs.map((n) => ({ key: `cylinders.${i}.${n.field === "bore" ? "bore" : "pistonDiameterUm"}`, message: n.message })));
  if (needs.length === 0) return;
  throw new AppError("bad_request", needs[0]!.message, { fieldErrors: Object.fromEntries(needs.map((n) => [n.key, [n.message]])) });
}

/** `clientId` is the device's id for this plan: a retried save answers with the plan saved first. */
async function saveRequest(actor: Actor, request: JobPlanRequest, clientId: unknown): Promise<{ planId: string; jobId: string }> {
  const planId = clientIdOrNew(clientId);
  const earlier = async () => {
    const [row] = await db.select({ id: plans.id, jobId: plans.jobId }).from(plans).where(and(eq(plans.id, planId), eq(plans.shopId, actor.shopId)));
    return row ? { planId: row.id, jobId: row.jobId } : null;
  };
  const first = await earlier();
  if (first) return first;
  const built = await buildJobPlanInput({ actor, request });
  const preview = shapePreview(request, built);
  assertComplete(preview);
  try {
    await inTransaction((tx) => insertPlan(tx, { id: planId, shopId: actor.shopId, jobId: request.jobId, userId: actor.userId, request, preview }));
  } catch (error) {
    if (!isDuplicateKey(error)) throw error;
    const saved = await earlier();
    if (saved) return saved;
    throw new AppError("conflict", "That plan id is already used. Reload the page and try again.");
  }
  return { planId, jobId: request.jobId };
}

const clientIdOf = (input: unknown, key = "clientId") => (input as Record<string, unknown> | null)?.[key];

/** Saves the wizard's choices as a draft; the numbers are recomputed here, never taken from the client. */
export async function savePlanDraft({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "plans.create");
  return saveRequest(actor, jobPlanSchema.parse(input), clientIdOf(input));
}

/**
 * A quick plan saved into a new job in ONE transaction: the job and its cylinders (through the jobs
 * domain), then the plan computed from what that transaction sees, so they commit or roll back together.
 * `jobClientId` and `clientId` (the device's ids for the job and the plan) make a retry after a failure,
 * or a twin sent at once, finish with the same job and plan instead of booking in another job.
 */
export async function saveQuickPlan({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "plans.create");
  assertCan(actor, "jobs.create");
  const { plan, job } = quickSaveSchema.parse(input);
  await buildQuickPlanInput({ actor, request: plan }); // refuse a bad machine or stone before anything is written
  const planId = clientIdOrNew(clientIdOf(input));
  const earlier = async (runner: Db | Tx) => {
    const [row] = await runner.select({ id: plans.id, jobId: plans.jobId }).from(plans).where(and(eq(plans.id, planId), eq(plans.shopId, actor.shopId)));
    return row ? { planId: row.id, jobId: row.jobId } : null;
  };
  const first = await earlier(db);
  if (first) return first;
  const jobInput = {
    engineDescription: job.engineDescription, customerName: job.customerName || undefined, boreMaterial: plan.boreMaterial, cylinderCount: job.cylinderCount,
    standardBoreUm: job.standardBoreUm, boreLengthUm: plan.boreLengthUm, bottomClearanceUm: plan.bottomClearanceUm ?? null, torquePlate: false,
    notes: "Booked in from a quick plan.",
    clientId: clientIdOf(input, "jobClientId"),
  };
  const { pistonDiameterUm, bore } = plan;
  const options = {
    machineId: plan.machineId, clearance: plan.clearance, stoneIds: plan.stoneIds, pressures: plan.pressures, checkpointFraction: plan.checkpointFraction,
    targetCrosshatchDeg: plan.targetCrosshatchDeg, overtravelFraction: plan.overtravelFraction, spindleRpm: plan.spindleRpm, boring: plan.boring,
  };
  const cylinders = Array.from({ length: job.cylinderCount }, (_, i) => ({ cylinder: i + 1, pistonDiameterUm, bore }));
  try {
    return await inTransaction(async (tx) => {
      // createJob locks the shop's planning counter first: a twin waits here, then finds this plan.
      const created = await createJob({ actor, input: jobInput, tx });
      const again = await earlier(tx);
      if (again) return again;
      const request = jobPlanSchema.parse({ ...options, mode: "job", jobId: created.id, cylinders });
      const preview = shapePreview(request, await buildJobPlanInput({ actor, request, tx }));
      assertComplete(preview);
      await insertPlan(tx, { id: planId, shopId: actor.shopId, jobId: created.id, userId: actor.userId, request, preview });
      return { planId, jobId: created.id };
    });
  } catch (error) {
    if (!isDuplicateKey(error)) throw error;
    const saved = await earlier(db);
    if (saved) return saved;
    throw new AppError("conflict", "That plan id is already used. Reload the page and try again.");
  }
}

async function lockPlan(tx: Tx, actor: Actor, planId: string): Promise<Plan> {
  const [plan] = await tx.select().from(plans).where(and(eq(plans.id, planId), eq(plans.shopId, actor.shopId))).for("update");
  if (!plan) throw notFound("That plan");
  return plan;
}

/**
 * The stones and rate rows a plan was computed from, locked (in id order, one lock order for every
 * releaser) and checked: a retired stone or a rate row changed since the plan was saved refuses the
 * release. Retiring a stone locks the same row, so it cannot slip between this check and the commit.
 */
async function assertPlanBasisCurrent(tx: Tx, actor: Actor, plan: Plan): Promise<void> {
  const basis = fromJson<PlanRateVersion[]>(plan.rateVersions);
  const stoneIds = [...new Set(basis.map((b) => b.stoneId))].sort();
  if (stoneIds.length === 0) return;
  const locked = await tx.select({ id: stones.id, code: stones.code, active: stones.active }).from(stones)
    .where(and(inArray(stones.id, stoneIds), eq(stones.shopId, actor.shopId))).orderBy(asc(stones.id)).for("update");
  const retired = locked.find((s) => !s.active);
  if (retired || locked.length !== stoneIds.length) {
    const which = retired ? `Stone set ${retired.code}` : "A stone set of this plan";
    throw new AppError("conflict", `${which} is retired or gone: open the plan in the wizard, choose another stone and save again.`);
  }
  const rates = await tx.select({ id: rateRows.id, version: rateRows.version }).from(rateRows)
    .where(and(inArray(rateRows.id, basis.map((b) => b.rateRowId)), eq(rateRows.shopId, actor.shopId))).for("update");
  const changed = basis.find((b) => rates.find((r) => r.id === b.rateRowId)?.version !== b.rateRowVersion);
  if (changed) {
    const code = locked.find((s) => s.id === changed.stoneId)?.code ?? "";
    throw new AppError("conflict", `The rate table of stone set ${code} changed after this plan was worked out: open it in the wizard and save again to plan on today's figures.`);
  }
}

/**
 * Releases a draft to the floor (lead or owner), all in one transaction: one released plan per job
 * (checked under the job's lock), its stones and rates current, and the job marked planned.
 */
export async function releasePlan({ actor, planId }: { actor: Actor; planId: string }) {
  assertCan(actor, "plans.release");
  await inTransaction(async (tx) => {
    const plan = await lockPlan(tx, actor, planId);
    if (plan.status !== "draft") throw new AppError("conflict", `This plan is ${plan.status}; only a draft can be released.`);
    if (!plan.canRelease) throw new AppError("conflict", "This plan has errors: open it in the wizard, resolve them and save again.");
    const job = await loadJob({ actor, jobId: plan.jobId, tx, forUpdate: true });
    const [released] = await tx.select({ id: plans.id }).from(plans).where(and(eq(plans.jobId, plan.jobId), eq(plans.status, "released"), ne(plans.id, plan.id))).limit(1);
    if (released) throw new AppError("conflict", "Another plan of this job is released: withdraw it first.");
    await assertPlanBasisCurrent(tx, actor, plan);
    await tx.update(plans).set({ status: "released", releasedBy: actor.userId, releasedAt: new Date(), updatedAt: sql`CURRENT_TIMESTAMP(3)` }).where(eq(plans.id, plan.id));
    // The job's status follows the work: a released plan makes a received or measured job "planned".
    if (job.status === "received" || job.status === "measured") {
      await tx.update(jobs).set({ status: "planned", updatedAt: sql`CURRENT_TIMESTAMP(3)` }).where(and(eq(jobs.id, job.id), eq(jobs.shopId, actor.shopId)));
    }
  }).catch((error: unknown) => {
    if (isDuplicateKey(error)) throw new AppError("conflict", "Another plan of this job is released: withdraw it first.");
    throw error;
  });
  return { planId, status: "released" as const };
}

/** Withdraws a draft or released plan with a reason (lead or owner); a done plan stays as it is. */
export async function withdrawPlan({ actor, planId, input }: { actor: Actor; planId: string; input: unknown }) {
  assertCan(actor, "plans.withdraw");
  const { reason } = withdrawSchema.parse(input);
  await inTransaction(async (tx) => {
    const plan = await lockPlan(tx, actor, planId);
    if (plan.status === "withdrawn" || plan.status === "done") throw new AppError("conflict", `This plan is ${plan.status} already.`);
    await tx
      .update(plans)
      .set({ status: "withdrawn", withdrawnReason: reason, withdrawnBy: actor.userId, withdrawnAt: new Date(), updatedAt: sql`CURRENT_TIMESTAMP(3)` })
      .where(eq(plans.id, plan.id));
  });
  return { planId, status: "withdrawn" as const };
}
