import { DEFAULT_OVERTRAVEL_FRACTION } from "./stroke-setup";
import type { Checkpoint, RemovalRate, StoneInput, StoneWear, StrokeEstimate } from "./plan-types";

export const REMOVAL_RULE =
  "table rate × P/P_ref (Preston [V S10]) × (S_head/swept length)/(same at reference) [D] × learned multiplier";
export const STROKES_RULE = "strokes = ceil(stock / removal per double stroke); range from the rate's uncertainty [D, DESIGN §5.4]";
export const DEFAULT_CHECKPOINT_FRACTION = 0.75;

/**
 * Fraction of a double stroke's sliding that lands on each part of the swept length.
 * At a fixed crosshatch angle the sliding per double stroke is 2·S/sin(θ/2) [D], so the
 * diameter removed per stroke scales with S_head / (S_head + L_stone).
 */
export function coverage(strokeLengthUm: number, stoneLengthUm: number): number {
  return strokeLengthUm / (strokeLengthUm + stoneLengthUm);
}

/** The stroke the reference bore length implies under the default 1/3 overtravel [C]. */
export function referenceCoverage(stone: Pick<StoneInput, "stoneLengthUm" | "rate">): number {
  const o = DEFAULT_OVERTRAVEL_FRACTION * stone.stoneLengthUm;
  const stroke = stone.rate.referenceBoreLengthUm + 2 * o - stone.stoneLengthUm;
  return stroke > 0 ? coverage(stroke, stone.stoneLengthUm) : NaN;
}

/** Removal per double stroke scaled by pressure (Preston [V S10]), coverage [D] and the learned multiplier. */
export function removalPerDoubleStroke(input: {
  stone: StoneInput;
  pressure: number;
  strokeLengthUm: number;
}): RemovalRate {
  const { stone, pressure, strokeLengthUm } = input;
  const pressureFactor = pressure / stone.rate.referencePressure;
  const coverageFactor = coverage(strokeLengthUm, stone.stoneLengthUm) / referenceCoverage(stone);
  const learnedMultiplier = stone.learnedMultiplier ?? 1;
  const tableRateUm = stone.rate.removalPerDoubleStrokeUm;
  return {
    removalPerDoubleStrokeUm: tableRateUm * pressureFactor * coverageFactor * learnedMultiplier,
    tableRateUm,
    pressureFactor,
    coverageFactor,
    learnedMultiplier,
    rule: REMOVAL_RULE,
  };
}

/** Float noise guard so that 20 µm / 0.5 µm is 40 strokes, not 41. */
const ceilStrokes = (x: number): number => Math.max(0, Math.ceil(x - 1e-9));

/** Strokes = ceil(stock / removal), with the low–high range from the uncertainty [D, DESIGN §5.4]. */
export function estimateStrokes(stockUm: number, removalUm: number, uncertaintyFraction: number): StrokeEstimate {
  const u = Math.min(Math.max(uncertaintyFraction, 0), 0.95);
  return {
    nominal: ceilStrokes(stockUm / removalUm),
    low: ceilStrokes(stockUm / (removalUm * (1 + u))),
    high: ceilStrokes(stockUm / (removalUm * (1 - u))),
    rule: STROKES_RULE,
  };
}

/**
 * Checkpoint at the fraction of the estimate (default 0.75 [C, DESIGN §5.3]) and before the fast
 * end of the range could take the last of the stock, so the last stock is never taken unmeasured.
 */
export function planCheckpoint(input: {
  strokes: StrokeEstimate;
  fraction: number;
  diameterBeforeUm: number;
  removalUm: number;
}): Checkpoint | null {
  const { strokes, fraction, diameterBeforeUm, removalUm } = input;
  const afterStrokes = Math.min(Math.floor(fraction * strokes.nominal), strokes.low - 1);
  if (afterStrokes < 1) return null;
  return {
    afterStrokes,
    expectedDiameterUm: diameterBeforeUm + afterStrokes * removalUm,
    rule: `stop at ${Math.round(fraction * 100)} % of the estimate and before the fast end of the range [C, DESIGN §5.3]`,
  };
}

/** Strokes still needed after a checkpoint, from the rate the checkpoint reading shows [D]. */
export function remainingStrokes(input: {
  strokesDone: number;
  removedSoFarUm: number;
  stockLeftUm: number;
}): { strokes: number; observedRemovalUm: number } | null {
  if (input.strokesDone <= 0 || input.removedSoFarUm <= 0) return null;
  const observedRemovalUm = input.removedSoFarUm / input.strokesDone;
  return { strokes: ceilStrokes(Math.max(0, input.stockLeftUm) / observedRemovalUm), observedRemovalUm };
}

/** Stone wear = stock × wear figure × stock volume vs reference (bore length ratio) [D, trade-facts §4]. */
export function stoneWear(input: {
  stone: StoneInput;
  fullStrokeStockUm: number;
  boreLengthUm: number;
  dwellStockUm: number;
  dwellZoneLengthUm: number;
  heightBeforeUm: number;
}): StoneWear {
  const { stone } = input;
  const volumeLength = input.fullStrokeStockUm * input.boreLengthUm + input.dwellStockUm * input.dwellZoneLengthUm;
  const wearUm = (stone.rate.wearUmPerUmStock * volumeLength) / stone.rate.referenceBoreLengthUm;
  return {
    stoneId: stone.id,
    wearUm,
    heightBeforeUm: input.heightBeforeUm,
    heightAfterUm: input.heightBeforeUm - wearUm,
    wearLimitHeightUm: stone.wearLimitHeightUm,
    rule: "wear = wear figure × stock × bore length / reference bore length [D, stock volume ∝ length]",
  };
}

/** Cleanup a stone's marks need from the next stage: the row's figure, else 2 sides × 3 × Rz [C, DESIGN §5.3]. */
export function cleanupStockOf(surface: { cleanupStockUm?: number; rzUm?: number; cleanupRzMultiple?: number }): {
  cleanupUm: number;
  rule: string;
} {
  if (surface.cleanupStockUm !== undefined) return { cleanupUm: surface.cleanupStockUm, rule: "clean-up stock from the rate table" };
  const multiple = surface.cleanupRzMultiple ?? 3;
  return { cleanupUm: 2 * multiple * (surface.rzUm ?? 0), rule: `2 sides × ${multiple} × Rz [C]` };
}
