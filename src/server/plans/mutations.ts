import "server-only";
import { and, eq, ne, sql } from "drizzle-orm";
import { db, type Tx } from "@/server/db";
import { plans, type Plan } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey, notFound } from "@/server/errors";
import { createJob, setJobStatus } from "@/server/jobs/mutations";
import { loadJob } from "@/server/jobs/access";
import { buildJobPlanInput, buildQuickPlanInput } from "./inputs";
import { shapePreview, type ComputedPreview } from "./preview";
import { insertPlan } from "./store";
import { jobPlanSchema, quickSaveSchema, withdrawSchema, type JobPlanRequest } from "@/shared/plans/schema";

/** A plan that still lacks a bore or a piston figure cannot be saved: say which cylinder and what. */
function assertComplete(preview: ComputedPreview): void {
  const needs = preview.cylinders.flatMap((c, i) => c.needs.map((n) => ({ key: `cylinders.${i}.${n.field === "bore" ? "bore" : "pistonDiameterUm"}`, message: n.message })));
  if (needs.length === 0) return;
  throw new AppError("bad_request", needs[0]!.message, { fieldErrors: Object.fromEntries(needs.map((n) => [n.key, [n.message]])) });
}

async function saveRequest(actor: Actor, request: JobPlanRequest): Promise<{ planId: string; jobId: string }> {
  const built = await buildJobPlanInput({ actor, request });
  const preview = shapePreview(request, built);
  assertComplete(preview);
  const planId = await db.transaction((tx) => insertPlan(tx, { shopId: actor.shopId, jobId: request.jobId, userId: actor.userId, request, preview }));
  return { planId, jobId: request.jobId };
}

/** Saves the wizard's choices as a draft; the numbers are recomputed here, never taken from the client. */
export async function savePlanDraft({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "plans.create");
  return saveRequest(actor, jobPlanSchema.parse(input));
}

/** A quick plan saved into a new job: the job (through the jobs domain), then the plan on every cylinder. */
export async function saveQuickPlan({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "plans.create");
  assertCan(actor, "jobs.create");
  const { plan, job } = quickSaveSchema.parse(input);
  await buildQuickPlanInput({ actor, request: plan }); // refuse a bad machine or stone before a job is booked in
  const created = await createJob({
    actor,
    input: {
      engineDescription: job.engineDescription, customerName: job.customerName || undefined, boreMaterial: plan.boreMaterial, cylinderCount: job.cylinderCount,
      standardBoreUm: job.standardBoreUm, boreLengthUm: plan.boreLengthUm, bottomClearanceUm: plan.bottomClearanceUm ?? null, torquePlate: false,
      notes: "Booked in from a quick plan.",
    },
  });
  const { pistonDiameterUm, bore } = plan;
  const options = {
    machineId: plan.machineId, clearance: plan.clearance, stoneIds: plan.stoneIds, pressures: plan.pressures, checkpointFraction: plan.checkpointFraction,
    targetCrosshatchDeg: plan.targetCrosshatchDeg, overtravelFraction: plan.overtravelFraction, spindleRpm: plan.spindleRpm, boring: plan.boring,
  };
  const cylinders = Array.from({ length: job.cylinderCount }, (_, i) => ({ cylinder: i + 1, pistonDiameterUm, bore }));
  return saveRequest(actor, jobPlanSchema.parse({ ...options, mode: "job", jobId: created.id, cylinders }));
}

async function lockPlan(tx: Tx, actor: Actor, planId: string): Promise<Plan> {
  const [plan] = await tx.select().from(plans).where(and(eq(plans.id, planId), eq(plans.shopId, actor.shopId))).for("update");
  if (!plan) throw notFound("That plan");
  return plan;
}

/** Releases a draft to the floor (lead or owner). One released plan per job: checked under the job's lock. */
export async function releasePlan({ actor, planId }: { actor: Actor; planId: string }) {
  assertCan(actor, "plans.release");
  const jobId = await db
    .transaction(async (tx) => {
      const plan = await lockPlan(tx, actor, planId);
      if (plan.status !== "draft") throw new AppError("conflict", `This plan is ${plan.status}; only a draft can be released.`);
      if (!plan.canRelease) throw new AppError("conflict", "This plan has errors: open it in the wizard, resolve them and save again.");
      await loadJob({ actor, jobId: plan.jobId, tx, forUpdate: true });
      const [released] = await tx.select({ id: plans.id }).from(plans).where(and(eq(plans.jobId, plan.jobId), eq(plans.status, "released"), ne(plans.id, plan.id))).limit(1);
      if (released) throw new AppError("conflict", "Another plan of this job is released: withdraw it first.");
      await tx.update(plans).set({ status: "released", releasedBy: actor.userId, releasedAt: new Date(), updatedAt: sql`CURRENT_TIMESTAMP(3)` }).where(eq(plans.id, plan.id));
      return plan.jobId;
    })
    .catch((error: unknown) => {
      if (isDuplicateKey(error)) throw new AppError("conflict", "Another plan of this job is released: withdraw it first.");
      throw error;
    });
  await markJobPlanned(actor, jobId);
  return { planId, status: "released" as const };
}

/** The job's status follows the work: a released plan makes a received or measured job "planned". */
async function markJobPlanned(actor: Actor, jobId: string): Promise<void> {
  const job = await loadJob({ actor, jobId });
  if (job.status === "received" || job.status === "measured") await setJobStatus({ actor, jobId, input: { status: "planned" } });
}

/** Withdraws a draft or released plan with a reason (lead or owner); a done plan stays as it is. */
export async function withdrawPlan({ actor, planId, input }: { actor: Actor; planId: string; input: unknown }) {
  assertCan(actor, "plans.withdraw");
  const { reason } = withdrawSchema.parse(input);
  await db.transaction(async (tx) => {
    const plan = await lockPlan(tx, actor, planId);
    if (plan.status === "withdrawn" || plan.status === "done") throw new AppError("conflict", `This plan is ${plan.status} already.`);
    await tx
      .update(plans)
      .set({ status: "withdrawn", withdrawnReason: reason, withdrawnBy: actor.userId, withdrawnAt: new Date(), updatedAt: sql`CURRENT_TIMESTAMP(3)` })
      .where(eq(plans.id, plan.id));
  });
  return { planId, status: "withdrawn" as const };
}
