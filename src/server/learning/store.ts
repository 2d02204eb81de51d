import "server-only";
import { and, eq } from "drizzle-orm";
import { emptyLearnedState, multiplierFromState, updateLearnedState, type HoneStage, type LearnedState, type ReadingLevel } from "@/lib/honing";
import type { BoreMaterial } from "@/lib/bore-materials";
import type { Tx } from "@/server/db";
import { learnedRates, rateRows } from "@/server/db/schema";
import { raisePlanningVersion } from "@/server/plans/planning-version";
import type { RunLearning } from "@/shared/learning/types";
import { observeBlock } from "./observation";

// The learned state's one write path for a logged run: O(1) from the stored state, its row locked, in
// the transaction that logs the run. The state is learned against the rate row's current version: a
// run planned on an older version is kept in the log (runs.learning) but not learned from, and the
// first run after a new version (an edit, an Adopt) starts from the table again. learned_rates has no
// planning triggers, so this raises the planning counter itself (cached previews see the new rate).

export type LearningKey = { shopId: string; stoneId: string; boreMaterial: BoreMaterial; machineId: string };

export const keyWhere = (k: LearningKey) =>
  and(eq(learnedRates.shopId, k.shopId), eq(learnedRates.stoneId, k.stoneId), eq(learnedRates.boreMaterial, k.boreMaterial), eq(learnedRates.machineId, k.machineId));

/** Rate rows start at version 1: a learned row at 0 holds only the replay order, no learning. */
export const NO_RATE_VERSION = 0;

/** The learned state that counts: learned against the rate row's current version, from one run at least. */
export function effectiveState(row: { rateVersion: number; state: LearnedState } | null | undefined, currentRateVersion: number | null): LearnedState | null {
  if (!row || currentRateVersion === null || row.rateVersion !== currentRateVersion) return null;
  return row.state.runsUsed + row.state.runsIgnored > 0 ? row.state : null;
}

export type RateRowRef = { id: string; version: number; uncertaintyFraction: number };

/**
 * The rate row a stage's learning is against, locked (MariaDB has no FOR SHARE; one short lock per run): read before the run's other writes, so a
 * rate edit (which locks the row, then the planning counter) and a run never wait on each other in a circle.
 */
export async function lockRateForLearning(tx: Tx, shopId: string, rateRowId: string | null): Promise<RateRowRef | null> {
  if (!rateRowId) return null;
  const [row] = await tx
    .select({ id: rateRows.id, version: rateRows.version, uncertaintyFraction: rateRows.uncertaintyFraction })
    .from(rateRows)
    .where(and(eq(rateRows.id, rateRowId), eq(rateRows.shopId, shopId)))
    .for("update");
  return row ?? null;
}

/** The starting state for a rate row: the table, with the row's own uncertainty as the prior spread. */
export const startingState = (rate: Pick<RateRowRef, "uncertaintyFraction">): LearnedState => emptyLearnedState({ tableUncertainty: Math.max(rate.uncertaintyFraction, 0.01) });

/** Works out the run's observation and moves the learned state on; answers what the run row stores. */
export async function learnFromRun(tx: Tx, args: {
  key: LearningKey; rate: RateRowRef | null; plannedRateVersion: number | null;
  stage: HoneStage; block: "full" | "dwell"; strokes: number; pressure: number;
  before: readonly ReadingLevel[] | null; after: readonly ReadingLevel[] | null; doneAt: Date;
}): Promise<RunLearning | null> {
  const { key, rate } = args;
  if (!rate || args.plannedRateVersion === null) return null;
  const seen = observeBlock(args);
  if (!seen) return null;
  // The counter before the learned row, as every planning write does (one lock order with the rebuild).
  await raisePlanningVersion(tx, key.shopId);
  const [row] = await tx.select().from(learnedRates).where(keyWhere(key)).for("update");
  const sequence = (row?.sequence ?? 0) + 1;
  const current = args.plannedRateVersion === rate.version;
  const base = row && row.rateVersion === rate.version ? row.state : startingState(rate);
  const multiplierBefore = current ? multiplierFromState(base).multiplier : 1;
  const learning: RunLearning = { boreMaterial: key.boreMaterial, rateRowId: rate.id, rateVersion: args.plannedRateVersion, tableRateUm: args.stage.removal.tableRateUm, sequence, multiplierBefore, ...seen };
  const state = current ? updateLearnedState(base, { ...seen, strokes: args.strokes, loggedAt: args.doneAt.toISOString() }) : null;
  if (!row) {
    await tx.insert(learnedRates).values({ ...key, rateVersion: state ? rate.version : NO_RATE_VERSION, sequence, state: state ?? base });
  } else {
    await tx.update(learnedRates).set(state ? { rateVersion: rate.version, sequence, state, updatedAt: new Date() } : { sequence }).where(keyWhere(key));
  }
  return learning;
}
