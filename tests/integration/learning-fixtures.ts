// Logged runs for the learning tests (INVENTED test inputs): on a released plan, the coarse stage is run
// to its checkpoint (reading as planned), then its rest with a reading that shows the stone cutting
// `factor` × the table's model; that second block is the observation (a reading before and after it).
import { and, eq } from "drizzle-orm";
import type { HoneStage } from "@/lib/honing";
import { db } from "@/server/db";
import { learnedRates, runs } from "@/server/db/schema";
import { submitRun } from "@/server/runs/submit-run";
import type { RunLearning } from "@/shared/learning/types";
import type { TestShop } from "../support/fixtures";
import { createFloorPlan, honeStages, runBody } from "./floor-fixtures";

export const checkpointLevels = (stage: HoneStage) => stage.checkpoint!.expectedByLevel.map((l) => ({ name: l.level, aUm: l.aUm, bUm: l.bUm }));

/** The rest of the stage after the checkpoint, removing `factor` × the model's (table) rate at every level. */
export function restLevels(stage: HoneStage, strokes: number, factor: number) {
  const m = stage.removal.learnedMultiplier;
  return stage.checkpoint!.expectedByLevel.map((l, i) => {
    const grow = (factor * strokes * stage.removalByLevelUm[i]!) / m;
    return { name: l.level, aUm: l.aUm + grow, bUm: l.bUm + grow };
  });
}

/** One plan whose coarse stage is logged at the checkpoint and then to its end at `factor` × the table. */
export async function logCoarseStage(shop: TestShop, factor: number, log: (body: Record<string, unknown>) => Promise<unknown> = (input) => submitRun({ actor: shop.actors.apprentice, input })) {
  const floor = await createFloorPlan(shop);
  const { s: coarse, position } = honeStages(floor.plan.cylinders[0]!.plan.stages)[0]!;
  const at = coarse.checkpoint!.afterStrokes;
  await log(runBody(floor.planId, { stagePosition: position, strokesDone: at, readings: checkpointLevels(coarse), doneAt: new Date().toISOString() }));
  const rest = Math.max(1, coarse.strokes.nominal - at);
  await log(runBody(floor.planId, { stagePosition: position, strokesDone: rest, readings: restLevels(coarse, rest, factor), doneAt: new Date().toISOString() }));
  return { ...floor, coarse };
}

export async function learnedRows(shopId: string) {
  const rows = await db.select().from(learnedRates).where(eq(learnedRates.shopId, shopId));
  return rows.map((r) => ({ ...r, updatedAt: null })).sort((a, b) => `${a.stoneId}${a.machineId}`.localeCompare(`${b.stoneId}${b.machineId}`));
}

export async function observations(shopId: string, stoneId: string) {
  const rows = await db.select({ learning: runs.learning, strokes: runs.strokesDone, doneAt: runs.doneAt }).from(runs).where(and(eq(runs.shopId, shopId), eq(runs.stoneId, stoneId)));
  return rows.filter((r) => r.learning !== null).map((r) => ({ ...(r.learning as RunLearning), strokes: r.strokes, loggedAt: r.doneAt.toISOString() }))
    .sort((a, b) => a.sequence - b.sequence);
}
