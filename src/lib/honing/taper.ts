import type { BoreGeometry } from "./geometry";
import type { DwellBlock, PlanHoneInput, StoneInput } from "./plan-types";
import { afterStrokes, profileTaperUm, tightEndOf, type Profile } from "./profile";
import { blockSettings, ceilStrokes, finalTaperUm, runSequence, type StageSettings, type StageSpec } from "./sequence";
import type { StrokeSetup } from "./stroke-setup";
import { DEFAULT_CHECKPOINT_MIN_STOCK_UM, planCheckpoint, rateUncertainty } from "./strokes";

/** Default end-to-end taper that calls for a dwell block: 10 µm [C, DESIGN §5.2 tolerance]. */
export const DEFAULT_TAPER_TOLERANCE_UM = 10;
/** Dwell strokes tried, longest first, when none is given: ½ [C], ⅓ and ¼ of the stone; shorter reaches less of the middle [D]. */
export const DWELL_STROKE_FRACTIONS = [1 / 2, 1 / 3, 1 / 4] as const;
/** Bound on a dwell block: more strokes than this is a bore to re-bore, not to dwell. */
export const MAX_DWELL_STROKES = 2_000;

export const DWELL_RULE =
  "dwell: short strokes at the tight end, the longest stroke that brings the bore after every stage within the taper tolerance (else the least taper), counted by playing the sequence; removal at each level from the stone's contact there [DESIGN §5.3; C, D]";

/** Extra stock the tight end needs: the largest level mean minus the tight end's mean [D]. */
export function dwellStockUm(geometry: BoreGeometry): number {
  if (geometry.tightEnd === null) return 0;
  const means = geometry.levelMeansUm;
  const endMean = geometry.tightEnd === "top" ? means[0]! : means[means.length - 1]!;
  return Math.max(...means) - endMean;
}

/** The taper a dwell block is expected to take out, or null when it is within the tolerance [C, DESIGN §5.3]. */
export function taperToCorrect(geometry: BoreGeometry | null, toleranceUm: number): { end: "top" | "bottom"; stockUm: number } | null {
  if (!geometry || geometry.tightEnd === null) return null;
  const stockUm = dwellStockUm(geometry);
  return stockUm > toleranceUm ? { end: geometry.tightEnd, stockUm } : null;
}

/** The full stroke shortened to `strokeLengthUm`, keeping the reversal at the dwelled end. */
export function dwellSetup(full: StrokeSetup, end: "top" | "bottom", strokeLengthUm: number): StrokeSetup {
  const shift = full.strokeLengthUm - strokeLengthUm;
  const moved = (r: StrokeSetup["upperReversal"], by: number) => ({ stoneTopFromDeckUm: r.stoneTopFromDeckUm + by, stoneBottomFromDeckUm: r.stoneBottomFromDeckUm + by });
  return {
    ...full, strokeLengthUm, warnings: [],
    upperReversal: end === "bottom" ? moved(full.upperReversal, shift) : full.upperReversal,
    lowerReversal: end === "bottom" ? full.lowerReversal : moved(full.lowerReversal, -shift),
  };
}

interface Candidate {
  strokes: number;
  finalTaperUm: number;
  setup: StrokeSetup;
  block: ReturnType<typeof blockSettings>;
}

/** Counts either side of the estimate tried first; a best strictly inside them is taken without the grid. */
const ESTIMATE_WINDOW = 4;

/**
 * The stroke count with the least final taper [D]. The final taper falls about linearly towards the
 * estimate and rises past it, so a best strictly inside a small window around the estimate is the
 * answer; otherwise a grid of nine counts is narrowed around the best until it is every count.
 */
function bestCount(taperAt: (n: number) => number, upper: number, estimate: number | null): { strokes: number; taperUm: number } {
  const seen = new Map<number, number>();
  const at = (n: number) => seen.get(n) ?? (seen.set(n, taperAt(n)), seen.get(n)!);
  if (estimate !== null) {
    const [from, to] = [Math.max(0, estimate - ESTIMATE_WINDOW), Math.min(upper, estimate + ESTIMATE_WINDOW)];
    let local = { strokes: from, taperUm: at(from) };
    for (let n = from + 1; n <= to; n++) if (at(n) < local.taperUm - 1e-9) local = { strokes: n, taperUm: at(n) };
    const inside = (local.strokes > from || from === 0) && (local.strokes < to || to === upper);
    if (inside && local.strokes > 0) return local;
  }
  let best = { strokes: 0, taperUm: at(0) };
  let [lo, hi] = [0, upper];
  for (;;) {
    const step = Math.max(1, Math.ceil((hi - lo) / 8));
    for (let n = lo; n <= hi; n += step) if (at(n) < best.taperUm - 1e-9) best = { strokes: n, taperUm: at(n) };
    if (step === 1) return best;
    [lo, hi] = [Math.max(0, best.strokes - step), Math.min(upper, best.strokes + step)];
  }
}

/** Strokes at which the tight end would catch up with the largest level, from their removal per stroke [D]. */
function estimatedCount(noDwell: Profile, byLevelUm: readonly number[], endIndex: number, taperUm: number, upper: number): number | null {
  const largest = noDwell.reduce((best, l, i) => (l.diameterUm > noDwell[best]!.diameterUm ? i : best), 0);
  const gain = (byLevelUm[endIndex] ?? 0) - (byLevelUm[largest] ?? 0);
  return gain > 0 ? Math.min(upper, Math.round(taperUm / gain)) : null;
}

export interface TaperContext {
  input: PlanHoneInput;
  stone: StoneInput;
  full: StageSettings;
  start: Profile;
  specs: readonly StageSpec[];
  depthsUm: readonly number[];
  boreDiameterUm: number;
  toleranceUm: number;
}

/** Sizes the dwell against the whole sequence so that no level is taken past the others [D, DESIGN §5.3]. */
export function planTaperCorrection(ctx: TaperContext): DwellBlock | null {
  const noDwell = runSequence(ctx.start, ctx.specs).at(-1)?.after ?? ctx.start;
  const taperUm = profileTaperUm(noDwell);
  if (taperUm <= ctx.toleranceUm + 1e-9) return null;
  const end = tightEndOf(noDwell);
  if (end === null) return null;
  const endIndex = end === "top" ? 0 : ctx.start.length - 1;
  const lengths = ctx.input.dwellStrokeLengthUm !== undefined ? [ctx.input.dwellStrokeLengthUm] : DWELL_STROKE_FRACTIONS.map((f) => f * ctx.stone.stoneLengthUm);
  let chosen: Candidate | null = null;
  for (const length of lengths) {
    const setup = dwellSetup(ctx.full.setup, end, Math.min(length, ctx.full.setup.strokeLengthUm));
    const block = blockSettings(ctx.input, ctx.stone, ctx.boreDiameterUm, ctx.depthsUm, setup);
    const atEnd = block.byLevelUm[endIndex] ?? 0;
    if (atEnd <= 0) continue;
    const upper = Math.min(MAX_DWELL_STROKES, ceilStrokes((2 * taperUm) / atEnd) + 2);
    const best = bestCount((n) => finalTaperUm(ctx.start, block.byLevelUm, n, ctx.specs), upper, estimatedCount(noDwell, block.byLevelUm, endIndex, taperUm, upper));
    if (best.strokes > 0 && (!chosen || best.taperUm < chosen.finalTaperUm - 1e-6)) chosen = { strokes: best.strokes, finalTaperUm: best.taperUm, setup, block };
    // The longest dwell stroke that brings the taper within tolerance blends best into the full stroke [C, from memory].
    if (chosen && chosen.finalTaperUm <= ctx.toleranceUm + 1e-9) break;
  }
  return chosen ? dwellBlock(ctx, end, endIndex, chosen) : null;
}

function dwellBlock(ctx: TaperContext, end: "top" | "bottom", endIndex: number, c: Candidate): DwellBlock {
  const atEnd = c.block.byLevelUm[endIndex]!;
  const u = Math.min(Math.max(rateUncertainty(ctx.stone), 0), 0.95);
  const stockUm = c.strokes * atEnd;
  const doubleStrokes = {
    nominal: c.strokes, low: ceilStrokes(c.strokes / (1 + u)), high: ceilStrokes(c.strokes / (1 - u)),
    rule: "dwell strokes from the sequence's least final taper; range from the rate's uncertainty [D]",
  };
  return {
    end, stoneId: ctx.stone.id, stockUm, strokeLengthUm: c.setup.strokeLengthUm, doubleStrokes,
    removalPerDoubleStrokeUm: atEnd, removalByLevelUm: c.block.byLevelUm,
    expectedByLevel: afterStrokes(ctx.start, c.block.byLevelUm, c.strokes), speeds: c.block.speeds,
    upperReversal: c.setup.upperReversal, lowerReversal: c.setup.lowerReversal,
    checkpoint: stockUm > (ctx.input.checkpointMinStockUm ?? DEFAULT_CHECKPOINT_MIN_STOCK_UM)
      ? planCheckpoint({ before: ctx.start, byLevelUm: c.block.byLevelUm, strokes: doubleStrokes, fraction: ctx.input.checkpointFraction })
      : null,
    measureAfter: true, rule: DWELL_RULE,
  };
}
