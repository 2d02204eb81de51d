import type { BoreGeometry } from "./geometry";
import type { FinishedBore, FinishedBoreInput } from "./sizing";
import type { MachineInput, SpeedChoice } from "./speeds";
import type { Reversal, StrokeSetup } from "./stroke-setup";
import type { HoneStageKind, ReadingLevel, StoneRole } from "./types";
import type { PlanIssue } from "./warnings";
import type { Profile } from "./profile";
import type { StrokeRounding } from "./sequence";

/** The bore as it is now: a reading set, one diameter, or only the stock left to the target. */
export type BoreStateInput =
  | { kind: "readings"; levels: ReadingLevel[] }
  | { kind: "diameter"; diameterUm: number }
  | { kind: "stock"; stockUm: number };

/** One rate-table row: what the stone does at reference conditions on this bore material. */
export interface StoneRateInput {
  /** Reduction of diameter per double stroke at the reference pressure and bore length. */
  removalPerDoubleStrokeUm: number;
  /** Unit-agnostic (bar, psi, dial setting): only the ratio to the stage pressure is used. */
  referencePressure: number;
  referenceBoreLengthUm: number;
  /** e.g. 0.2 = the true rate may be 20 % above or below. Must be < 1. */
  uncertaintyFraction: number;
  raUm: number;
  rzUm: number;
  /** Stock (on diameter) the next stage must remove to clean up this stone's marks. */
  cleanupStockUm?: number;
  /** When cleanupStockUm is absent: cleanup = 2 sides × this × Rz (default 3) [C]. */
  cleanupRzMultiple?: number;
  /** Stone height lost per µm of diameter stock at the reference bore length. */
  wearUmPerUmStock: number;
  /** Included crosshatch angle the rate was measured at; default 45° [V S17]. */
  referenceAngleDeg?: number;
  /** Bore diameter the rate was measured at; absent = the rate is not scaled with diameter. */
  referenceDiameterUm?: number;
}

export interface StoneInput {
  id: string;
  role: StoneRole;
  stoneLengthUm: number;
  rate: StoneRateInput;
  currentHeightUm: number;
  wearLimitHeightUm: number;
  /** From the logged runs for stone × material × machine; 1 = the table. */
  learnedMultiplier?: number;
  /**
   * Relative half-width of the learned multiplier's interval, once there are runs: it replaces the
   * table's uncertainty in the stroke range (the runs say how far off the rate still may be).
   */
  learnedUncertaintyFraction?: number;
}

/** Surface the first honing stage must clean up when there is no boring stage in this plan. */
export interface IncomingSurfaceInput {
  rzUm?: number;
  cleanupStockUm?: number;
}

export interface BoringInput {
  /** Added to the stone sequence's minimum stocks to give the honing allowance (shop setting). */
  marginUm: number;
  /** Roughness the boring bar leaves; its cleanup = 2 × 3 × Rz unless cleanupStockUm is given [C]. */
  surfaceRzUm?: number;
  cleanupStockUm?: number;
  /** Bore only when the honing stock is above this (the shop's "bore first" threshold); absent = always bore. */
  onlyAboveStockUm?: number;
}

export interface PlanHoneInput {
  piston: FinishedBoreInput;
  bore: BoreStateInput;
  /** Stones available, in order of preference within a role. */
  stones: StoneInput[];
  machine: MachineInput;
  boreLengthUm: number;
  /** Room below the bore for the stone to pass (crank webs, blind end); absent = unlimited. */
  bottomClearanceUm?: number;
  overtravelFraction?: number;
  /** Pressure per stage, in the same unit as the stone's referencePressure; default = reference. */
  pressures?: Partial<Record<StoneRole, number>>;
  /** Where the checkpoint falls in a stage's estimated strokes; default 0.75 [C, DESIGN §5.3]. */
  checkpointFraction?: number;
  /** Included crosshatch angle, default 45° [V S17]. */
  targetCrosshatchDeg?: number;
  boring?: BoringInput;
  incomingSurface?: IncomingSurfaceInput;
  /** Plateau stock, default 2 µm (1–3 µm typical [C]). */
  plateauStockUm?: number;
  /** End-to-end taper above which a dwell block is planned; default 10 µm [C]. */
  taperToleranceUm?: number;
  /** Finished out-of-round tolerance for the final check; default 5 µm [C]. */
  outOfRoundToleranceUm?: number;
  /** Most stock honing should take; default 500 µm (S1's upper figure [V S1]); bore above it. */
  maxHoningStockUm?: number;
  /** A stage with more stock than this gets a checkpoint; default 5 µm ("a few µm" [C]). */
  checkpointMinStockUm?: number;
  /** Short stroke for the dwell block; default: the one of ½, ⅓ or ¼ of the stone that corrects best [C, D]. */
  dwellStrokeLengthUm?: number;
  /** A stage whose one stroke takes more than this share of its stock gets a warning; default 0.5. */
  maxStrokeShareOfStock?: number;
}

/** Removal per double stroke at a fully swept level, and the factors that make it (removal.ts). */
export interface RemovalRate {
  removalPerDoubleStrokeUm: number;
  tableRateUm: number;
  pressureFactor: number;
  angleFactor: number;
  diameterFactor: number;
  strokeFactor: number;
  learnedMultiplier: number;
  referenceAngleDeg: number;
  rule: string;
}

export interface StrokeEstimate {
  nominal: number;
  /** Strokes if the rate is at the fast end of its uncertainty. */
  low: number;
  /** Strokes if the rate is at the slow end of its uncertainty. */
  high: number;
  rule: string;
}

export interface Checkpoint {
  afterStrokes: number;
  /** The smallest reading expected at the checkpoint. */
  expectedDiameterUm: number;
  expectedByLevel: Profile;
  rule: string;
}

export interface StoneWear {
  stoneId: string;
  wearUm: number;
  heightBeforeUm: number;
  heightAfterUm: number;
  wearLimitHeightUm: number;
  rule: string;
}

export interface DwellBlock {
  end: "top" | "bottom";
  stoneId: string;
  /** Removal at the dwelled end's reading level. */
  stockUm: number;
  strokeLengthUm: number;
  doubleStrokes: StrokeEstimate;
  /** At the dwelled end's reading level. */
  removalPerDoubleStrokeUm: number;
  /** Per reading level, from the deck down: the short strokes reach the levels they still cover. */
  removalByLevelUm: number[];
  expectedByLevel: Profile;
  speeds: SpeedChoice;
  upperReversal: Reversal;
  lowerReversal: Reversal;
  /** A reading inside a long dwell. */
  checkpoint: Checkpoint | null;
  /** Always measure after the dwell block. */
  measureAfter: true;
  rule: string;
}

export interface BoreStage {
  kind: "bore";
  boreToUm: number;
  stockUm: number;
  diameterBeforeUm: number;
  honingAllowanceUm: number;
  rule: string;
}

export interface HoneStage {
  kind: HoneStageKind;
  stoneId: string;
  /** Stock on diameter at the tightest reading, dwell included, from the stage's whole strokes. */
  stockUm: number;
  /** Part of the stock taken with full strokes (stock − dwell). */
  fullStrokeStockUm: number;
  /** The smallest reading the stage brings every level to (it stops one stroke short when another stage follows). */
  goalUm: number;
  diameterBeforeUm: number;
  /** The smallest reading after the stage's whole strokes. */
  expectedDiameterAfterUm: number;
  /** Every reading level after the stage's whole strokes. */
  expectedByLevel: Profile;
  /** Full-stroke removal per double stroke at each reading level. */
  removalByLevelUm: number[];
  cleanup: { requiredUm: number; marksOf: string; rule: string };
  removal: RemovalRate;
  strokes: StrokeEstimate;
  checkpoint: Checkpoint | null;
  pressure: number;
  speeds: SpeedChoice;
  strokeSetup: StrokeSetup;
  dwell: DwellBlock | null;
  stoneWear: StoneWear;
  /** How the stage rounds to whole strokes (sequence.ts wholeStrokes); the re-estimate rounds the same way. */
  rounding: StrokeRounding;
  rule: string;
}

export type PlanStage = BoreStage | HoneStage;

export interface StockSummary {
  /** From the smallest reading to the target. */
  totalUm: number;
  boringUm: number;
  honingUm: number;
  startDiameterUm: number;
  rule: string;
}

export interface FinalCheck {
  targetUm: number;
  minUm: number;
  maxUm: number;
  /** The same size at every level and in both directions, within these tolerances [C]. */
  taperToleranceUm: number;
  outOfRoundToleranceUm: number;
  levels: string[];
}

export interface HonePlan {
  status: "ok" | "blocked";
  /** No errors: the plan may be released. */
  canRelease: boolean;
  sizing: FinishedBore | null;
  geometry: BoreGeometry | null;
  stock: StockSummary | null;
  stages: PlanStage[];
  taperCorrection: DwellBlock | null;
  /** Every reading level after the last stage. */
  expectedFinal: Profile | null;
  finalCheck: FinalCheck | null;
  issues: PlanIssue[];
  errors: PlanIssue[];
  warnings: PlanIssue[];
}
