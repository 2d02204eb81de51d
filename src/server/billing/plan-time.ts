import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { jobs, plans, runs } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { cylinderMinutes, stageMinutes, type CylinderTime, type TimeAllowances } from "@/lib/billing";
import type { HonePlan } from "@/lib/honing";
import type { StageKind } from "@/shared/plans/constants";
import { settingsFor } from "./settings";
import { workFromPlans } from "./work";

// Machine time of a saved plan (issue 16 part 1): spindle time per stage from its double strokes and
// rate, per cylinder with its set-up and stone changes, per job with its own set-up; and beside it what
// the run log says was really run, once runs exist.
export type StageTimeRow = { position: number; kind: StageKind; plannedStrokes: number; plannedMin: number; loggedStrokes: number | null; loggedMin: number | null };
export type CylinderTimeRow = { cylinder: number; stages: StageTimeRow[]; planned: CylinderTime; logged: CylinderTime | null };
export type PlanTime = { allowances: TimeAllowances; cylinders: CylinderTimeRow[]; plannedTotalMin: number; loggedTotalMin: number | null };

export async function planTimeFor({ actor, planId, cylinders }: { actor: Actor; planId: string; cylinders: { cylinder: number; plan: HonePlan }[] }): Promise<PlanTime> {
  assertCan(actor, "plans.view");
  const settings = await settingsFor(actor.shopId);
  const [job] = await db.select({ torquePlate: jobs.torquePlate }).from(plans).innerJoin(jobs, eq(jobs.id, plans.jobId)).where(and(eq(plans.id, planId), eq(plans.shopId, actor.shopId))).limit(1);
  const torquePlate = job?.torquePlate ?? false;
  const allowances = { cylinderSetUpMin: settings.cylinderSetUpMin, stoneChangeMin: settings.stoneChangeMin, jobSetUpMin: torquePlate ? settings.jobSetUpMin : 0 };
  const logged = await db
    .select({ cylinder: runs.cylinderNumber, position: runs.stagePosition, stoneId: runs.stoneId, strokes: runs.strokesDone, rate: runs.doubleStrokesPerMin })
    .from(runs)
    .where(and(eq(runs.shopId, actor.shopId), eq(runs.planId, planId)))
    .orderBy(asc(runs.cylinderNumber), asc(runs.doneAt), asc(runs.createdAt));
  const planned = workFromPlans(cylinders);
  const rows = cylinders.map(({ cylinder, plan }, i): CylinderTimeRow => {
    const mine = logged.filter((r) => r.cylinder === cylinder);
    const stages = plan.stages.map((s, position): StageTimeRow => {
      const plannedRuns = s.kind === "bore" ? [] : [{ doubleStrokes: s.strokes.nominal, doubleStrokesPerMin: s.speeds.doubleStrokesPerMin }, ...(s.dwell ? [{ doubleStrokes: s.dwell.doubleStrokes.nominal, doubleStrokesPerMin: s.dwell.speeds.doubleStrokesPerMin }] : [])];
      const ran = mine.filter((r) => r.position === position);
      const rateOf = (r: (typeof ran)[number]) => r.rate ?? (s.kind === "bore" ? 1 : s.speeds.doubleStrokesPerMin);
      return {
        position, kind: s.kind,
        plannedStrokes: plannedRuns.reduce((n, r) => n + r.doubleStrokes, 0),
        plannedMin: plannedRuns.reduce((n, r) => n + stageMinutes(r), 0),
        loggedStrokes: ran.length ? ran.reduce((n, r) => n + r.strokes, 0) : null,
        loggedMin: ran.length ? ran.reduce((n, r) => n + stageMinutes({ doubleStrokes: r.strokes, doubleStrokesPerMin: rateOf(r) }), 0) : null,
      };
    });
    const loggedStages = mine.map((r) => ({ stoneId: r.stoneId, doubleStrokes: r.strokes, doubleStrokesPerMin: r.rate ?? 1 }));
    return { cylinder, stages, planned: cylinderMinutes(planned.cylinders[i]!.stages, allowances), logged: mine.length ? cylinderMinutes(loggedStages, allowances) : null };
  });
  const anyLogged = rows.some((r) => r.logged);
  return {
    allowances, cylinders: rows,
    plannedTotalMin: allowances.jobSetUpMin + rows.reduce((n, r) => n + r.planned.totalMin, 0),
    loggedTotalMin: anyLogged ? allowances.jobSetUpMin + rows.reduce((n, r) => n + (r.logged?.totalMin ?? 0), 0) : null,
  };
}
