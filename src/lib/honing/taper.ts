import { estimateStrokes, removalPerDoubleStroke } from "./strokes";
import type { BoreGeometry } from "./geometry";
import type { DwellBlock, StoneInput } from "./plan-types";
import type { StrokeSetup } from "./stroke-setup";

/** Default end-to-end taper that calls for a dwell block: 10 µm [C, DESIGN §5.2 tolerance]. */
export const DEFAULT_TAPER_TOLERANCE_UM = 10;

export const DWELL_RULE =
  "dwell: short strokes at the tight end for the taper (largest level mean − tight-end mean), sized from the stone's rate [DESIGN §5.3; C]";

/** Extra stock the tight end needs: the largest level mean minus the tight end's mean [D]. */
export function dwellStockUm(geometry: BoreGeometry): number {
  if (geometry.tightEnd === null) return 0;
  const means = geometry.levelMeansUm;
  const endMean = geometry.tightEnd === "top" ? means[0]! : means[means.length - 1]!;
  return Math.max(...means) - endMean;
}

/** The taper a dwell block must take out, or null when it is within the tolerance [C, DESIGN §5.3]. */
export function taperToCorrect(geometry: BoreGeometry | null, toleranceUm: number): { end: "top" | "bottom"; stockUm: number } | null {
  if (!geometry || geometry.tightEnd === null) return null;
  const stockUm = dwellStockUm(geometry);
  return stockUm > toleranceUm ? { end: geometry.tightEnd, stockUm } : null;
}

/** A block of short strokes at the tight end, sized from the taper and the stone's rate [C rule, D sizing]. */
export function planDwell(input: {
  end: "top" | "bottom";
  stockUm: number;
  stone: StoneInput;
  pressure: number;
  setup: StrokeSetup;
  dwellStrokeLengthUm?: number;
}): DwellBlock {
  const { stone, setup, stockUm } = input;
  const strokeLengthUm = Math.min(input.dwellStrokeLengthUm ?? stone.stoneLengthUm / 2, setup.strokeLengthUm);
  const removal = removalPerDoubleStroke({ stone, pressure: input.pressure, strokeLengthUm });
  const shift = setup.strokeLengthUm - strokeLengthUm;
  const moved = (r: StrokeSetup["upperReversal"], by: number) => ({
    stoneTopFromDeckUm: r.stoneTopFromDeckUm + by,
    stoneBottomFromDeckUm: r.stoneBottomFromDeckUm + by,
  });
  const atBottom = input.end === "bottom";
  return {
    end: input.end,
    stockUm,
    strokeLengthUm,
    doubleStrokes: estimateStrokes(stockUm, removal.removalPerDoubleStrokeUm, stone.rate.uncertaintyFraction),
    removalPerDoubleStrokeUm: removal.removalPerDoubleStrokeUm,
    upperReversal: atBottom ? moved(setup.upperReversal, shift) : setup.upperReversal,
    lowerReversal: atBottom ? setup.lowerReversal : moved(setup.lowerReversal, -shift),
    measureAfter: true,
    rule: DWELL_RULE,
  };
}
