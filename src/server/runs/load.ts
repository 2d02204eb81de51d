import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import type { FinalCheck, FinishedBore, PlanStage } from "@/lib/honing";
import { db, type Db, type Tx } from "@/server/db";
import { cylinders, finalInspections, jobs, planStages, plans, runs, stones, type Plan, type RunRow } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import { can, type Actor } from "@/shared/auth/policy";
import { AppError, notFound } from "@/server/errors";
import { fromJson, type PlanSummary } from "@/server/plans/store";
import type { Reestimate } from "@/lib/honing";
import type { BoreMaterialCode } from "@/shared/floor/outcome";

// Everything the floor needs about one cylinder of one plan, scoped by the actor's shop: another
// shop's plan, or a cylinder the plan does not have, is "not found".

/** Machinists and above may log on any cylinder; an apprentice only on one assigned to them (DESIGN.md §2). */
export function mayLogOn(actor: Actor, job: { assignedUserId: string | null }, cylinder: { assignedUserId: string | null }): boolean {
  if (!can(actor, "runs.log")) return false;
  if (can(actor, "readings.edit")) return true;
  return cylinder.assignedUserId === actor.userId || job.assignedUserId === actor.userId;
}

export function assertMayLog(actor: Actor, job: { assignedUserId: string | null }, cylinder: { assignedUserId: string | null }): void {
  assertCan(actor, "runs.log");
  if (!mayLogOn(actor, job, cylinder)) throw new AppError("forbidden", "This cylinder is not assigned to you, so you cannot log work on it.");
}

export type RunView = {
  id: string; stagePosition: number; block: RunRow["block"]; outcome: RunRow["outcome"]; strokesDone: number;
  readingTaken: boolean; reestimate: Reestimate | null; stoneWearUm: number; doneAt: string;
};

export const runView = (r: RunRow): RunView => ({
  id: r.id, stagePosition: r.stagePosition, block: r.block, outcome: r.outcome, strokesDone: r.strokesDone,
  readingTaken: r.readingsAfter !== null, reestimate: fromJson<Reestimate | null>(r.reestimate), stoneWearUm: r.stoneWearUm, doneAt: r.doneAt.toISOString(),
});

export type LoadedCylinder = Awaited<ReturnType<typeof loadFloorCylinder>>;

/** The plan, job, cylinder and stages of one floor card set; `forUpdate` locks the plan row (one writer per plan). */
export async function loadFloorCylinder({ actor, planId, cylinder, tx = db, forUpdate = false }: { actor: Actor; planId: string; cylinder: number; tx?: Db | Tx; forUpdate?: boolean }) {
  assertCan(actor, "floor.view");
  const query = tx.select().from(plans).where(and(eq(plans.id, planId), eq(plans.shopId, actor.shopId))).limit(1);
  const [plan] = (forUpdate ? await query.for("update") : await query) as Plan[];
  if (!plan || plan.status === "draft") throw notFound("That plan");
  const [job] = await tx.select().from(jobs).where(and(eq(jobs.id, plan.jobId), eq(jobs.shopId, actor.shopId))).limit(1);
  const [cyl] = await tx.select().from(cylinders).where(and(eq(cylinders.jobId, plan.jobId), eq(cylinders.number, cylinder), eq(cylinders.shopId, actor.shopId))).limit(1);
  const summary = fromJson<PlanSummary>(plan.summary);
  const stored = summary.cylinders.find((c) => c.cylinder === cylinder);
  if (!job || !cyl || !stored) throw notFound("That cylinder");
  const stageRows = await tx
    .select({ id: planStages.id, position: planStages.position, stoneId: planStages.stoneId, rateRowId: planStages.rateRowId, rateRowVersion: planStages.rateRowVersion, detail: planStages.detail })
    .from(planStages)
    .where(and(eq(planStages.planId, plan.id), eq(planStages.shopId, actor.shopId), eq(planStages.cylinderNumber, cylinder)))
    .orderBy(asc(planStages.position));
  const stages = stageRows.map((s) => fromJson<PlanStage>(s.detail));
  const runRows = await tx.select().from(runs).where(and(eq(runs.shopId, actor.shopId), eq(runs.planId, plan.id), eq(runs.cylinderNumber, cylinder))).orderBy(asc(runs.doneAt), asc(runs.createdAt));
  const [inspection] = await tx
    .select({ id: finalInspections.id, status: finalInspections.status, verdict: finalInspections.verdict, inspectedAt: finalInspections.inspectedAt })
    .from(finalInspections)
    .where(and(eq(finalInspections.shopId, actor.shopId), eq(finalInspections.planId, plan.id), eq(finalInspections.cylinderNumber, cylinder)))
    .orderBy(desc(finalInspections.createdAt))
    .limit(1);
  const stoneIds = [...new Set(stageRows.map((s) => s.stoneId).filter((id): id is string => id !== null))];
  const stoneRows = stoneIds.length === 0 ? [] : await tx
    .select({ id: stones.id, code: stones.code, gritNumber: stones.gritNumber, gritScale: stones.gritScale, currentHeightUm: stones.currentHeightUm, wearLimitHeightUm: stones.wearLimitHeightUm })
    .from(stones)
    .where(and(eq(stones.shopId, actor.shopId), inArray(stones.id, stoneIds)));
  return {
    plan, job, cylinderRow: cyl, summary, stageRows, stages, runRows, inspection: inspection ?? null, stoneRows,
    sizing: stored.plan.sizing as FinishedBore, finalCheck: stored.plan.finalCheck as FinalCheck, piston: stored.piston,
    boreMaterial: plan.boreMaterial as BoreMaterialCode,
  };
}
