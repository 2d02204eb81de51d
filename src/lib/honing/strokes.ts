import { HoningInputError, MIN_POSITIVE_INPUT, requireFinite, requireNonNegative, requirePositive } from "./errors";
import type { Checkpoint, StoneInput, StoneWear, StrokeEstimate } from "./plan-types";
import { afterStrokes, tightestUm, type Profile } from "./profile";
import { ceilStrokes } from "./sequence";

export const STROKES_RULE = "strokes = whole strokes to the stage's goal at every level; range from the rate's uncertainty [D, DESIGN §5.4]";
export const DEFAULT_CHECKPOINT_FRACTION = 0.75;
/** A block with more stock than this gets a checkpoint: "a few µm" [C, DESIGN §5.3]. */
export const DEFAULT_CHECKPOINT_MIN_STOCK_UM = 5;

/**
 * The reading inside a block of strokes: at the fraction of the estimate (default 0.75 [C, DESIGN §5.3]) and
 * before the fast end of the range could take the last of the stock; null when the block is too short for one.
 */
export function planCheckpoint(input: { before: Profile; byLevelUm: readonly number[]; strokes: StrokeEstimate; fraction?: number }): Checkpoint | null {
  const fraction = input.fraction ?? DEFAULT_CHECKPOINT_FRACTION;
  const afterCount = Math.min(Math.floor(fraction * input.strokes.nominal), input.strokes.low - 1);
  if (afterCount < 1) return null;
  const expectedByLevel = afterStrokes(input.before, input.byLevelUm, afterCount);
  return {
    afterStrokes: afterCount, expectedDiameterUm: tightestUm(expectedByLevel), expectedByLevel,
    rule: `stop at ${Math.round(fraction * 100)} % of the estimate and before the fast end of the range [C, DESIGN §5.3]`,
  };
}

/** How far the stone's rate may be off: the learned interval once there are runs, else the table's uncertainty [D, DESIGN §5.7]. */
export function rateUncertainty(stone: { rate: { uncertaintyFraction: number }; learnedUncertaintyFraction?: number }): number {
  return stone.learnedUncertaintyFraction ?? stone.rate.uncertaintyFraction;
}

/** Strokes = ceil(stock / removal), with the low–high range from the uncertainty [D, DESIGN §5.4]. */
export function estimateStrokes(stockUm: number, removalUm: number, uncertaintyFraction: number): StrokeEstimate {
  requireNonNegative("stockUm", stockUm);
  requirePositive("removalUm", removalUm);
  requireFinite("uncertaintyFraction", uncertaintyFraction);
  const u = Math.min(Math.max(uncertaintyFraction, 0), 0.95);
  return {
    nominal: ceilStrokes(stockUm / removalUm),
    low: ceilStrokes(stockUm / (removalUm * (1 + u))),
    high: ceilStrokes(stockUm / (removalUm * (1 - u))),
    rule: STROKES_RULE,
  };
}

/** Strokes still needed after a checkpoint, from the rate the checkpoint reading shows [D]. */
export function remainingStrokes(input: {
  strokesDone: number;
  removedSoFarUm: number;
  stockLeftUm: number;
}): { strokes: number; observedRemovalUm: number } | null {
  requireNonNegative("strokesDone", input.strokesDone);
  requireFinite("removedSoFarUm", input.removedSoFarUm);
  requireFinite("stockLeftUm", input.stockLeftUm);
  if (input.strokesDone < 1 || input.removedSoFarUm < MIN_POSITIVE_INPUT) return null;
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
  for (const key of ["fullStrokeStockUm", "boreLengthUm", "dwellStockUm", "dwellZoneLengthUm"] as const) requireNonNegative(key, input[key]);
  requireFinite("heightBeforeUm", input.heightBeforeUm);
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
  if (surface.cleanupStockUm !== undefined) requireNonNegative("cleanupStockUm", surface.cleanupStockUm);
  if (surface.rzUm !== undefined) requireNonNegative("rzUm", surface.rzUm);
  if (surface.cleanupRzMultiple !== undefined && !(surface.cleanupRzMultiple >= 0 && surface.cleanupRzMultiple <= 20)) throw new HoningInputError("cleanupRzMultiple", "must be 0 to 20");
  if (surface.cleanupStockUm !== undefined) return { cleanupUm: surface.cleanupStockUm, rule: "clean-up stock from the rate table" };
  const multiple = surface.cleanupRzMultiple ?? 3;
  return { cleanupUm: 2 * multiple * (surface.rzUm ?? 0), rule: `2 sides × ${multiple} × Rz [C]` };
}
