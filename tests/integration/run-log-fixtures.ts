// Bulk runs and final checks for the run log tests and the route bench (INVENTED test inputs): rows
// written straight into the tables, shaped like the floor's, against a released plan of the fixtures.
import { randomUUID } from "node:crypto";
import { db } from "@/server/db";
import { and, eq, isNotNull } from "drizzle-orm";
import { finalInspections, planStages, plans, runs } from "@/server/db/schema";
import type { FloorPlan } from "./floor-fixtures";

export type BulkRun = { machineId?: string; stoneId?: string | null; loggedBy: string; doneAt: Date; strokesDone?: number };

/** The plan's machine and its first stage's stone and id. */
export async function planParts(planId: string) {
  const [plan] = await db.select({ machineId: plans.machineId, createdBy: plans.createdBy }).from(plans).where(eq(plans.id, planId));
  const [stage] = await db.select({ id: planStages.id, stoneId: planStages.stoneId, position: planStages.position }).from(planStages)
    .where(and(eq(planStages.planId, planId), isNotNull(planStages.stoneId))).limit(1);
  return { machineId: plan!.machineId, createdBy: plan!.createdBy, stageId: stage!.id, stoneId: stage!.stoneId!, position: stage!.position };
}

/** Inserts runs in chunks of 1000 on the plan's first cylinder and honing stage. */
export async function insertRuns(shopId: string, floor: FloorPlan, list: BulkRun[]) {
  const cyl = floor.job.cylinders[0]!;
  const parts = await planParts(floor.planId);
  const rows = list.map((r) => ({
    id: randomUUID(), shopId, planId: floor.planId, planStageId: parts.stageId, jobId: floor.job.jobId, cylinderId: cyl.id, cylinderNumber: 1,
    stagePosition: parts.position, block: "full" as const, outcome: "done" as const, stoneId: r.stoneId === undefined ? parts.stoneId : r.stoneId,
    machineId: r.machineId ?? parts.machineId, strokesDone: r.strokesDone ?? 10, stoneWearUm: 0, loggedBy: r.loggedBy, doneAt: r.doneAt,
  }));
  for (let i = 0; i < rows.length; i += 1000) await db.insert(runs).values(rows.slice(i, i + 1000));
  return rows;
}

/** One final check per deviation (µm from the cylinder's target), each on a cylinder of its own id. */
export async function insertFinals(shopId: string, floor: FloorPlan, targetUm: number, deviationsUm: number[], at = Date.now()) {
  const { createdBy } = await planParts(floor.planId);
  const rows = deviationsUm.map((d, i) => {
    const levels = ["top", "middle", "bottom"].map((name) => ({ name, aUm: targetUm + d, bUm: targetUm + d }));
    return {
      id: randomUUID(), shopId, planId: floor.planId, jobId: floor.job.jobId, cylinderId: randomUUID(), cylinderNumber: 1, readingsRaw: levels, readings: levels,
      status: "pass" as const, verdict: {}, inspectedBy: createdBy, inspectedAt: new Date(at - i * 60_000),
    };
  });
  await db.insert(finalInspections).values(rows);
}
