import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/server/db";
import { jobs, planStages, plans, rateRows, stones, users, type PlanRateVersion } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { notFound } from "@/server/errors";
import { loadJob } from "@/server/jobs/access";
import { fromJson, readCylinders, type PlanSummary } from "./store";
import type { PlanRequest } from "@/shared/plans/schema";

/** Draft plans free of errors, oldest first: the lead's queue of plans to release (dashboard). */
export async function listPlansAwaitingRelease({ actor, limit = 10 }: { actor: Actor; limit?: number }) {
  assertCan(actor, "plans.view");
  const rows = await db
    .select({ id: plans.id, jobId: plans.jobId, jobNumber: jobs.number, engineDescription: jobs.engineDescription, createdAt: plans.createdAt, createdByName: users.name })
    .from(plans)
    .innerJoin(jobs, and(eq(jobs.id, plans.jobId), eq(jobs.shopId, actor.shopId)))
    .leftJoin(users, eq(users.id, plans.createdBy))
    .where(and(eq(plans.shopId, actor.shopId), eq(plans.status, "draft"), eq(plans.canRelease, true)))
    .orderBy(asc(plans.createdAt))
    .limit(limit);
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}

/** The job's plans, newest first, without their numbers. */
export async function listPlansForJob({ actor, jobId }: { actor: Actor; jobId: string }) {
  assertCan(actor, "plans.view");
  const job = await loadJob({ actor, jobId });
  const rows = await db
    .select({ id: plans.id, status: plans.status, canRelease: plans.canRelease, createdAt: plans.createdAt, releasedAt: plans.releasedAt, createdByName: users.name })
    .from(plans)
    .leftJoin(users, eq(users.id, plans.createdBy))
    .where(and(eq(plans.jobId, job.id), eq(plans.shopId, actor.shopId)))
    .orderBy(desc(plans.createdAt));
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString(), releasedAt: r.releasedAt?.toISOString() ?? null }));
}

/** Rate rows (or stones) changed since the plan used them: the plan keeps its numbers and says so. */
async function changesSince(shopId: string, used: PlanRateVersion[]) {
  if (used.length === 0) return [];
  const rateIds = used.map((u) => u.rateRowId);
  const current = await db
    .select({ id: rateRows.id, version: rateRows.version, stoneCode: stones.code })
    .from(rateRows)
    .innerJoin(stones, eq(stones.id, rateRows.stoneId))
    .where(and(eq(rateRows.shopId, shopId), inArray(rateRows.id, rateIds)));
  return used.flatMap((u) => {
    const now = current.find((c) => c.id === u.rateRowId);
    if (now && now.version === u.rateRowVersion) return [];
    return [{ rateRowId: u.rateRowId, stoneCode: now?.stoneCode ?? null, usedVersion: u.rateRowVersion, currentVersion: now?.version ?? null }];
  });
}

async function userName(id: string | null): Promise<string | null> {
  if (!id) return null;
  const [row] = await db.select({ name: users.name }).from(users).where(eq(users.id, id)).limit(1);
  return row?.name ?? null;
}

/** A saved plan with the numbers it was saved with; another shop's plan is "not found". */
export async function getPlan({ actor, jobId, planId }: { actor: Actor; jobId: string; planId: string }) {
  assertCan(actor, "plans.view");
  const [plan] = await db.select().from(plans).where(and(eq(plans.id, planId), eq(plans.jobId, jobId), eq(plans.shopId, actor.shopId))).limit(1);
  if (!plan) throw notFound("That plan");
  const stages = await db
    .select({ cylinderNumber: planStages.cylinderNumber, position: planStages.position, detail: planStages.detail })
    .from(planStages)
    .where(and(eq(planStages.planId, plan.id), eq(planStages.shopId, actor.shopId)))
    .orderBy(asc(planStages.cylinderNumber), asc(planStages.position));
  const summary = fromJson<PlanSummary>(plan.summary);
  const rateVersions = fromJson<PlanRateVersion[]>(plan.rateVersions);
  return {
    id: plan.id, jobId: plan.jobId, status: plan.status, canRelease: plan.canRelease, boreMaterial: plan.boreMaterial,
    inputs: fromJson<PlanRequest>(plan.inputs), withdrawnReason: plan.withdrawnReason,
    createdAt: plan.createdAt.toISOString(), createdByName: await userName(plan.createdBy),
    releasedAt: plan.releasedAt?.toISOString() ?? null, releasedByName: await userName(plan.releasedBy),
    withdrawnAt: plan.withdrawnAt?.toISOString() ?? null, withdrawnByName: await userName(plan.withdrawnBy),
    job: summary.job, machine: summary.machine, stones: summary.stones, rateVersions,
    cylinders: readCylinders(summary, stages),
    tableChanges: await changesSince(actor.shopId, rateVersions),
  };
}
export type SavedPlan = Awaited<ReturnType<typeof getPlan>>;

/**
 * Whether a released plan uses this stone set (a stone in use may not be retired). Meant to replace
 * the body of src/server/stones/released-plans.ts when the lead merges.
 */
export async function isStoneInReleasedPlan(shopId: string, stoneId: string): Promise<boolean> {
  const [row] = await db
    .select({ id: planStages.id })
    .from(planStages)
    .innerJoin(plans, eq(plans.id, planStages.planId))
    .where(and(eq(planStages.shopId, shopId), eq(planStages.stoneId, stoneId), eq(plans.status, "released")))
    .limit(1);
  return row !== undefined;
}
