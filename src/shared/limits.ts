// The physical limits of every number the forms and routes accept (µm unless the name says otherwise).
// Outside them is a typing slip, not a bore; one table so the intake, the wizard, the library and the
// machine screens refuse the same values.
import type { PressureUnit } from "@/shared/stones/constants";

export type Limits = { readonly min: number; readonly max: number };

export const LIMITS = {
  // Cylinder bores (and pistons, and readings) from small single-cylinder engines to large diesels.
  diameterUm: { min: 20_000, max: 400_000 },
  boreLengthUm: { min: 20_000, max: 1_000_000 },
  bottomClearanceUm: { min: 0, max: 500_000 },
  wallUm: { min: 500, max: 60_000 },
  cylinders: { min: 1, max: 16 },

  // Piston-to-bore clearance: a few µm (tight cast pistons) to 0.5 mm (nothing runs looser).
  clearanceUm: { min: 0, max: 500 },
  // Sizing point height above the skirt bottom: 0 to 150 mm.
  sizingHeightUm: { min: 0, max: 150_000 },
  performanceAllowanceUm: { min: 0, max: 200 },
  // Widening the band past the maker's limit is the machinist's explicit choice, and a small one.
  bandWideningUm: { min: 0, max: 100 },
  // Stock left in a bore: honing only to a boring cut of 3 mm on diameter.
  stockUm: { min: 0, max: 3_000 },
  boringMarginUm: { min: 0, max: 200 },
  // Included crosshatch: about 20–80° covers every figure quoted in trade-facts §1.3.
  crosshatchDeg: { min: 15, max: 80 },
  checkpointFraction: { min: 0.5, max: 0.95 },
  overtravelFraction: { min: 0.1, max: 0.5 },
  // A feed pressure in whatever unit the stone's rate row or the machine uses (bar, dial, N).
  pressure: { min: 0.01, max: 20_000 },
  feedPressure: { min: 0.1, max: 20_000 },

  // Honing machines.
  spindleRpm: { min: 10, max: 3_000 },
  doubleStrokesPerMin: { min: 1, max: 400 },
  maxStrokeLengthUm: { min: 20_000, max: 800_000 },
  headStoneLengthUm: { min: 10_000, max: 300_000 },

  // Stone sets.
  stoneLengthUm: { min: 10_000, max: 300_000 },
  stoneWidthUm: { min: 1_000, max: 40_000 },
  stoneHeightUm: { min: 500, max: 40_000 },
  stonesPerHead: { min: 1, max: 16 },

  // Rate rows: what a stone removes and leaves.
  removalPerDoubleStrokeUm: { min: 0.01, max: 50 },
  referenceBoreLengthUm: { min: 20_000, max: 600_000 },
  raUm: { min: 0.02, max: 12 },
  rzUm: { min: 0.1, max: 80 },
  rkFamilyUm: { min: 0.01, max: 20 },
  cleanupStockUm: { min: 0.5, max: 200 },
  cleanupRzMultiple: { min: 1, max: 10 },
  wearUmPerUmStock: { min: 0.0001, max: 20 },
  uncertaintyFraction: { min: 0, max: 0.9 },
  // The included crosshatch the rate was measured at: the wizard's 15–80° range (trade-facts §1.3).
  referenceAngleDeg: { min: 15, max: 80 },
} as const satisfies Record<string, Limits>;

/** Sane bounds of a feed pressure as a machine expresses it; anything outside is a typing slip. */
export const PRESSURE_LIMITS: Record<PressureUnit, Limits> = {
  bar: { min: 0.1, max: 100 },
  dial: { min: 0.1, max: 100 },
  N: { min: 1, max: 20_000 },
};
