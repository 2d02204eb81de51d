import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/server/db";
import { planStages, plans, runs } from "@/server/db/schema";
import type { HonePlan } from "@/lib/honing";
import type { StageKind } from "@/shared/plans/constants";
import type { TimedStage } from "@/lib/billing";

// What a cylinder's work is, for pricing: its stages with the strokes and rate to time them.
// An invoice prices what was really done: the run log's blocks (strokes done at the rate logged),
// in the order they were run; a cylinder with no run has no work. A quote prices the plan instead
// (workFromPlans). The torque plate comes from the job itself (job.torquePlate). Boring is done off
// the honing machine and never logged as a run: a run cylinder whose plan bored it counts as bored.
export type WorkStage = TimedStage & { kind: StageKind };
export type WorkDone = { cylinders: { cylinder: number; stages: WorkStage[] }[]; source: "runs" | "plan" | "none" };

export async function workDoneFor(shopId: string, jobId: string): Promise<WorkDone> {
  const rows = await db
    .select({
      planId: runs.planId, cylinder: runs.cylinderNumber, kind: planStages.kind, stoneId: runs.stoneId, strokesDone: runs.strokesDone,
      loggedRate: runs.doubleStrokesPerMin, plannedRate: planStages.doubleStrokesPerMin,
    })
    .from(runs)
    .innerJoin(planStages, and(eq(planStages.id, runs.planStageId), eq(planStages.shopId, shopId)))
    .where(and(eq(runs.shopId, shopId), eq(runs.jobId, jobId)))
    .orderBy(asc(runs.cylinderNumber), asc(runs.doneAt), asc(runs.createdAt));
  if (rows.length === 0) return { cylinders: [], source: "none" };
  const bored = await db
    .select({ cylinder: planStages.cylinderNumber, planId: planStages.planId })
    .from(planStages)
    .where(and(eq(planStages.shopId, shopId), eq(planStages.kind, "bore"), inArray(planStages.planId, [...new Set(rows.map((r) => r.planId))])));
  const byCylinder = new Map<number, WorkStage[]>();
  for (const row of rows) {
    if (!byCylinder.has(row.cylinder) && bored.some((b) => b.cylinder === row.cylinder && b.planId === row.planId)) {
      byCylinder.set(row.cylinder, [{ kind: "bore", stoneId: null, doubleStrokes: 0, doubleStrokesPerMin: 1 }]);
    }
    const stages = byCylinder.get(row.cylinder) ?? [];
    stages.push({ kind: row.kind, stoneId: row.stoneId, doubleStrokes: row.strokesDone, doubleStrokesPerMin: row.loggedRate ?? row.plannedRate ?? 1 });
    byCylinder.set(row.cylinder, stages);
  }
  return { cylinders: [...byCylinder.entries()].map(([cylinder, stages]) => ({ cylinder, stages })), source: "runs" };
}

/** The same shape from a plan (a saved plan's cylinders, or a quick plan computed now). */
export function workFromPlans(cylinders: { cylinder: number; plan: HonePlan | null }[]): WorkDone {
  return {
    source: "plan",
    cylinders: cylinders.map(({ cylinder, plan }) => ({
      cylinder,
      stages: (plan?.stages ?? []).flatMap((s): WorkStage[] => {
        if (s.kind === "bore") return [{ kind: "bore", stoneId: null, doubleStrokes: 0, doubleStrokesPerMin: 1 }];
        const own: WorkStage = { kind: s.kind, stoneId: s.stoneId, doubleStrokes: s.strokes.nominal, doubleStrokesPerMin: s.speeds.doubleStrokesPerMin };
        if (!s.dwell) return [own];
        return [own, { kind: s.kind, stoneId: s.dwell.stoneId, doubleStrokes: s.dwell.doubleStrokes.nominal, doubleStrokesPerMin: s.dwell.speeds.doubleStrokesPerMin }];
      }),
    })),
  };
}

/** The job's saved plan as work (a quote prices the plan): the released or done plan, else the newest draft. */
export async function plannedWorkFor(shopId: string, jobId: string): Promise<WorkDone> {
  const [plan] = await db
    .select({ id: plans.id })
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.jobId, jobId), inArray(plans.status, ["released", "done", "draft"])))
    .orderBy(desc(plans.status), desc(plans.createdAt)) // enum order: released and done before draft
    .limit(1);
  if (!plan) return { cylinders: [], source: "none" };
  const rows = await db.select().from(planStages).where(and(eq(planStages.planId, plan.id), eq(planStages.shopId, shopId))).orderBy(asc(planStages.cylinderNumber), asc(planStages.position));
  const byCylinder = new Map<number, WorkStage[]>();
  for (const row of rows) {
    const stages = byCylinder.get(row.cylinderNumber) ?? [];
    stages.push({ kind: row.kind, stoneId: row.stoneId, doubleStrokes: row.strokesNominal ?? 0, doubleStrokesPerMin: row.doubleStrokesPerMin ?? 1 });
    const dwell = (row.detail as StageDetail | null)?.dwell;
    if (dwell) stages.push({ kind: row.kind, stoneId: dwell.stoneId, doubleStrokes: dwell.doubleStrokes.nominal, doubleStrokesPerMin: dwell.speeds.doubleStrokesPerMin });
    byCylinder.set(row.cylinderNumber, stages);
  }
  return { cylinders: [...byCylinder.entries()].map(([cylinder, stages]) => ({ cylinder, stages })), source: "plan" };
}

type StageDetail = { dwell?: { stoneId: string; doubleStrokes: { nominal: number }; speeds: { doubleStrokesPerMin: number } } | null };
