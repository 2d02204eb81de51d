import "server-only";
import { and, asc, desc, eq, inArray, or } from "drizzle-orm";
import type { PlanStage } from "@/lib/honing";
import { db } from "@/server/db";
import { cylinders, finalInspections, jobs, planStages, plans, runs, users } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import { can, type Actor } from "@/shared/auth/policy";
import { fromJson } from "@/server/plans/store";
import { cylinderProgress, type CylinderProgress } from "@/shared/floor/outcome";

export type QueueCylinder = { number: number; assignee: string | null; progress: CylinderProgress };
export type QueueJob = { planId: string; jobId: string; jobNumber: number; engineDescription: string; cylinders: QueueCylinder[] };

/**
 * Released plans with cylinders for the floor: the ones assigned to the actor (a cylinder, or the whole
 * job), or every cylinder for a lead and above, with where each stands.
 */
export async function listFloorQueue({ actor }: { actor: Actor }): Promise<QueueJob[]> {
  assertCan(actor, "floor.view");
  const seesAll = can(actor, "plans.release");
  const rows = await db
    .select({ planId: plans.id, jobId: jobs.id, jobNumber: jobs.number, engineDescription: jobs.engineDescription, number: cylinders.number, assignee: users.name })
    .from(plans)
    .innerJoin(jobs, and(eq(jobs.id, plans.jobId), eq(jobs.shopId, actor.shopId)))
    .innerJoin(cylinders, and(eq(cylinders.jobId, jobs.id), eq(cylinders.shopId, actor.shopId)))
    .leftJoin(users, eq(users.id, cylinders.assignedUserId))
    .where(and(
      eq(plans.shopId, actor.shopId), eq(plans.status, "released"),
      seesAll ? undefined : or(eq(cylinders.assignedUserId, actor.userId), eq(jobs.assignedUserId, actor.userId)),
    ))
    .orderBy(asc(jobs.number), asc(cylinders.number));
  const planIds = [...new Set(rows.map((r) => r.planId))];
  if (planIds.length === 0) return [];
  const [stageRows, runRows, inspections] = await Promise.all([
    db.select({ planId: planStages.planId, cylinder: planStages.cylinderNumber, position: planStages.position, detail: planStages.detail })
      .from(planStages).where(and(eq(planStages.shopId, actor.shopId), inArray(planStages.planId, planIds))).orderBy(asc(planStages.position)),
    db.select({ planId: runs.planId, cylinder: runs.cylinderNumber, stagePosition: runs.stagePosition, outcome: runs.outcome, readingsAfter: runs.readingsAfter })
      .from(runs).where(and(eq(runs.shopId, actor.shopId), inArray(runs.planId, planIds))).orderBy(asc(runs.doneAt)),
    db.select({ planId: finalInspections.planId, cylinder: finalInspections.cylinderNumber, status: finalInspections.status })
      .from(finalInspections).where(and(eq(finalInspections.shopId, actor.shopId), inArray(finalInspections.planId, planIds))).orderBy(desc(finalInspections.createdAt)),
  ]);
  const byJob = new Map<string, QueueJob>();
  for (const r of rows) {
    const mine = (x: { planId: string; cylinder: number }) => x.planId === r.planId && x.cylinder === r.number;
    const stages = stageRows.filter(mine).map((s) => fromJson<PlanStage>(s.detail));
    if (stages.length === 0) continue;
    const progress = cylinderProgress(stages, runRows.filter(mine).map((x) => ({ stagePosition: x.stagePosition, outcome: x.outcome, readingTaken: x.readingsAfter !== null })), inspections.find(mine)?.status ?? null);
    const job = byJob.get(r.planId) ?? { planId: r.planId, jobId: r.jobId, jobNumber: r.jobNumber, engineDescription: r.engineDescription, cylinders: [] };
    job.cylinders.push({ number: r.number, assignee: r.assignee, progress });
    byJob.set(r.planId, job);
  }
  return [...byJob.values()];
}
