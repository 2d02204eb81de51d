import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/server/db";
import { planStages, plans } from "@/server/db/schema";
import type { HonePlan } from "@/lib/honing";
import type { StageKind } from "@/shared/plans/constants";
import type { TimedStage } from "@/lib/billing";

// What a cylinder's work is, for pricing: its stages with the strokes and rate to time them.
// Until the floor's run log lands (issue 12) "what was actually done" is the job's saved plan;
// workDoneFor is the one place to point at the run log then.
export type WorkStage = TimedStage & { kind: StageKind };
export type WorkDone = { cylinders: { cylinder: number; stages: WorkStage[] }[]; source: "plan" | "none" };

type StageDetail = { dwell?: { stoneId: string; doubleStrokes: { nominal: number }; speeds: { doubleStrokesPerMin: number } } | null };

export async function workDoneFor(shopId: string, jobId: string): Promise<WorkDone> {
  const [plan] = await db
    .select({ id: plans.id })
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.jobId, jobId), inArray(plans.status, ["released", "done", "draft"])))
    .orderBy(desc(plans.status), desc(plans.createdAt)) // enum order: released and done before draft
    .limit(1);
  if (!plan) return { cylinders: [], source: "none" };
  const rows = await db
    .select()
    .from(planStages)
    .where(and(eq(planStages.planId, plan.id), eq(planStages.shopId, shopId)))
    .orderBy(asc(planStages.cylinderNumber), asc(planStages.position));
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

/** The same shape from a plan computed now (a quick plan's preview). */
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
