import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import type { HoneStage, ReadingLevel } from "@/lib/honing";
import { learnFromRun, lockRateForLearning } from "@/server/learning/store";
import { db, type Tx } from "@/server/db";
import { jobs, runs, stones, type RunRow } from "@/server/db/schema";
import type { Actor } from "@/shared/auth/policy";
import { AppError, notFound } from "@/server/errors";
import { blockOutcome, correctedLevels, isHone } from "@/shared/floor/outcome";
import { runSubmissionSchema } from "@/shared/floor/schemas";
import { assertMayLog, loadFloorCylinder, runView, type LoadedCylinder, type RunView } from "./load";
import { queueFloorNotice } from "./notices";
import { writeOnce } from "./exactly-once";

// A block of strokes is written exactly once: its id is made on the device, the insert uses it as the
// primary key, and a retried, doubled or concurrent submission reads back the stored row and gets the
// same answer as the first (DESIGN.md §8). Everything the block changes is written in one transaction.

/** Stone wear of a block: the stage's planned wear shared over its planned strokes, dwell included [D, strokes.ts stoneWear]. */
export function blockWearUm(stage: HoneStage, strokes: number): number {
  const planned = stage.strokes.nominal + (stage.dwell?.doubleStrokes.nominal ?? 0);
  return planned > 0 ? (stage.stoneWear.wearUm * strokes) / planned : 0;
}

async function storedAnswer(actor: Actor, id: string): Promise<RunView | null> {
  const [row] = await db.select().from(runs).where(eq(runs.id, id)).limit(1);
  if (!row) return null;
  // An id another shop used is not ours to read back.
  if (row.shopId !== actor.shopId) throw new AppError("conflict", "This entry's device id is already taken; make the entry again.");
  return runView(row);
}

function stageAt(loaded: LoadedCylinder, position: number) {
  const stage = loaded.stages[position];
  const row = loaded.stageRows[position];
  if (!stage || !row || !isHone(stage)) throw notFound("That stage");
  return { stage, stageId: row.id, rateRowId: row.rateRowId, rateRowVersion: row.rateRowVersion };
}

/** The reading right before this block: the cylinder's previous run's, when that run took one. */
const readingJustBefore = (rows: readonly RunRow[]) => (rows.at(-1)?.readingsAfter ?? null) as ReadingLevel[] | null;

async function write(tx: Tx, actor: Actor, input: ReturnType<typeof runSubmissionSchema.parse>) {
  const loaded = await loadFloorCylinder({ actor, planId: input.planId, cylinder: input.cylinder, tx, forUpdate: true });
  assertMayLog(actor, loaded.job, loaded.cylinderRow);
  if (loaded.plan.status !== "released") throw new AppError("conflict", `This plan is ${loaded.plan.status}; only a released plan takes runs.`);
  const { stage, stageId, rateRowId, rateRowVersion } = stageAt(loaded, input.stagePosition);
  // Read (share-locked) before the writes below: see lockRateForLearning.
  const rate = await lockRateForLearning(tx, actor.shopId, rateRowId);
  const mine = loaded.runRows.filter((r) => r.stagePosition === input.stagePosition);
  if (mine.some((r) => r.outcome === "done")) throw new AppError("conflict", "This stage is already logged as done.");
  if (loaded.runRows.some((r) => r.outcome === "stopped")) throw new AppError("conflict", "This cylinder was stopped for the machinist; they decide how it goes on.");
  const levels20C = input.readings ? correctedLevels(input.readings, input.temperatures, loaded.boreMaterial) : null;
  const { outcome, reestimate } = blockOutcome(
    { stages: loaded.stages, position: input.stagePosition, finalCheck: loaded.finalCheck, strokesBefore: mine.filter((r) => r.block === "full").reduce((n, r) => n + r.strokesDone, 0) },
    { kind: input.block, strokesDone: input.strokesDone, levels20C },
  );
  const wearUm = Math.round(blockWearUm(stage, input.strokesDone) * 10) / 10;
  const speeds = input.block === "dwell" && stage.dwell ? stage.dwell.speeds : stage.speeds;
  const pressure = input.pressure ?? stage.pressure;
  const learning = await learnFromRun(tx, {
    key: { shopId: actor.shopId, stoneId: stage.stoneId, boreMaterial: loaded.plan.boreMaterial, machineId: loaded.plan.machineId },
    rate, plannedRateVersion: rateRowVersion, stage, block: input.block, strokes: input.strokesDone, pressure,
    before: readingJustBefore(loaded.runRows), after: levels20C, doneAt: new Date(input.doneAt),
  });
  const row: typeof runs.$inferInsert = {
    id: input.id, shopId: actor.shopId, planId: loaded.plan.id, planStageId: stageId, jobId: loaded.job.id, cylinderId: loaded.cylinderRow.id,
    cylinderNumber: input.cylinder, stagePosition: input.stagePosition, block: input.block, outcome, stoneId: stage.stoneId, machineId: loaded.plan.machineId,
    pressure, spindleRpm: input.spindleRpm ?? speeds.spindleRpm, doubleStrokesPerMin: input.doubleStrokesPerMin ?? speeds.doubleStrokesPerMin,
    strokesDone: input.strokesDone, readingsRaw: input.readings, readingsAfter: levels20C, readingsBefore: lastReading(loaded.runRows),
    blockTemperatureC: input.temperatures?.blockC ?? null, gaugeTemperatureC: input.temperatures?.gaugeC ?? null, reestimate, learning,
    stoneWearUm: wearUm, notes: input.notes, loggedBy: actor.userId, doneAt: new Date(input.doneAt),
  };
  await tx.insert(runs).values(row);
  if (wearUm > 0) {
    await tx.update(stones).set({ currentHeightUm: sql`greatest(0, ${stones.currentHeightUm} - ${wearUm})`, updatedAt: sql`CURRENT_TIMESTAMP(3)` })
      .where(and(eq(stones.id, stage.stoneId), eq(stones.shopId, actor.shopId)));
  }
  await tx.update(jobs).set({ status: "in_work", updatedAt: sql`CURRENT_TIMESTAMP(3)` })
    .where(and(eq(jobs.id, loaded.job.id), eq(jobs.shopId, actor.shopId), inArray(jobs.status, ["received", "measured", "planned"])));
  const mail = outcome === "stopped"
    ? await queueFloorNotice(tx, loaded.plan, input.cylinder, {
      kind: "floor.stage_stopped", subject: `Job #${loaded.job.number}, cylinder ${input.cylinder}: stage stopped at a reading`,
      lines: [`The ${stage.kind} stage of cylinder ${input.cylinder} (job #${loaded.job.number}) was stopped after ${input.strokesDone} strokes.`, reestimate?.reason ?? ""],
    })
    : null;
  return { mail };
}

function lastReading(rows: readonly RunRow[]): unknown {
  return [...rows].reverse().find((r) => r.readingsAfter !== null)?.readingsAfter ?? null;
}

/** Logs one block of strokes on a cylinder (apprentice on their own cylinder, machinist and above on any). */
export async function submitRun({ actor, input }: { actor: Actor; input: unknown }): Promise<RunView> {
  const parsed = runSubmissionSchema.parse(input);
  return writeOnce({ read: () => storedAnswer(actor, parsed.id), write: async (tx) => (await write(tx, actor, parsed)).mail, what: "run" });
}
