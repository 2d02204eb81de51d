import "server-only";
import type { HoneStage, ReadingLevel } from "@/lib/honing";

// The one way a run becomes an observation of its stone's rate (issue 13):
//   stock removed = mean over the levels the full strokes sweep of the diameter growth, from the reading
//                   taken right before the block (the cylinder's previous run) to the reading after it;
//   model rate    = mean of the plan's removal per double stroke at those levels, scaled to the run's
//                   pressure (Preston, as removal.ts) and divided by the multiplier the plan already used,
//                   so q = (stock / strokes) / model rate is always against the table itself.
// Only full-stroke blocks with both readings and some stock removed are observations: a dwell sweeps
// the levels unevenly, and a block after one without a reading has unmeasured strokes before it.

const mean = (values: readonly number[]) => values.reduce((a, b) => a + b, 0) / values.length;
const diameter = (l: ReadingLevel) => (l.aUm + l.bUm) / 2;

export function observeBlock(input: {
  stage: HoneStage;
  block: "full" | "dwell";
  strokes: number;
  pressure: number;
  before: readonly ReadingLevel[] | null;
  after: readonly ReadingLevel[] | null;
}): { stockRemovedUm: number; modelRatePerStrokeUm: number } | null {
  const { stage, before, after } = input;
  if (input.block !== "full" || !before || !after || input.strokes <= 0) return null;
  const levels = stage.removalByLevelUm;
  if (before.length !== levels.length || after.length !== levels.length) return null;
  const swept = levels.map((rate, i) => ({ rate, i })).filter((l) => l.rate > 0);
  if (swept.length === 0 || !(stage.pressure > 0) || !(input.pressure > 0)) return null;
  const stockRemovedUm = mean(swept.map(({ i }) => diameter(after[i]!) - diameter(before[i]!)));
  const scale = input.pressure / stage.pressure / (stage.removal.learnedMultiplier || 1);
  const modelRatePerStrokeUm = mean(swept.map((l) => l.rate)) * scale;
  if (!(stockRemovedUm > 0) || !(modelRatePerStrokeUm > 0) || !Number.isFinite(stockRemovedUm)) return null;
  return { stockRemovedUm, modelRatePerStrokeUm };
}
