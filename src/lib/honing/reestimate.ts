import { HoningInputError, requireNonNegative } from "./errors";
import type { HoneStage } from "./plan-types";
import { afterStrokes, largestUm, profileOf, profileTaperUm, strokesToReach, tightEndOf, tightestUm, type Profile } from "./profile";
import { blockOf, contactShares, levelDepthsUm } from "./removal";
import { ceilStrokes, CLEANUP_SLACK_UM, wholeStrokes, type StrokeRounding } from "./sequence";
import { dwellSetup, DWELL_STROKE_FRACTIONS, MAX_DWELL_STROKES } from "./taper";
import type { Reversal } from "./stroke-setup";
import type { ReadingLevel } from "./types";

export const REESTIMATE_RULE =
  "strokes still to run = whole strokes until every level reaches the stage's goal, at the plan's own removal per level (same rate, pressure and multiplier) [D, DESIGN §5.4]";

export type CheckpointAction = "continue" | "stage_done" | "stop_call_machinist";

export interface CheckpointDwell {
  end: "top" | "bottom";
  strokeLengthUm: number;
  strokes: number;
  upperReversal: Reversal;
  lowerReversal: Reversal;
}

export interface Reestimate {
  action: CheckpointAction;
  /** Stock still to remove to the stage's goal at each level (0 where the level is already there). */
  remainingByLevel: { level: string; stockUm: number }[];
  /** Full strokes still to run in this stage, after the dwell when there is one. */
  strokesToRun: number;
  dwell: CheckpointDwell | null;
  expectedAfter: Profile;
  taperUm: number;
  /** Removal per double stroke the reading shows at the tightest level, when the stage's start is known. */
  observedRemovalUm: number | null;
  reason: string;
  rule: string;
}

export interface ReestimateInput {
  stage: HoneStage;
  /** The reading at the checkpoint, corrected to 20 °C, from the deck down. */
  levels: readonly ReadingLevel[];
  /** Strokes run in this stage so far. */
  strokesDone: number;
  /** Band the finished bore must lie in. */
  bandMaxUm: number;
  /** Clean-up stock the later stages of this cylinder still owe (they remove at least this). */
  laterStockUm: number;
  taperToleranceUm: number;
}

const um = (x: number) => `${x.toFixed(1)} µm`;

function validate(input: ReestimateInput): void {
  const { stage, levels } = input;
  if (levels.length !== stage.removalByLevelUm.length) throw new HoningInputError("levels", `must have ${stage.removalByLevelUm.length} levels, as the plan`);
  levels.forEach((l, i) => {
    requireNonNegative(`levels[${i}].aUm`, l.aUm);
    requireNonNegative(`levels[${i}].bUm`, l.bUm);
    if (l.aUm <= 0 || l.bUm <= 0) throw new HoningInputError(`levels[${i}]`, "must be greater than zero");
  });
  requireNonNegative("strokesDone", input.strokesDone);
  requireNonNegative("bandMaxUm", input.bandMaxUm);
  requireNonNegative("laterStockUm", input.laterStockUm);
  requireNonNegative("taperToleranceUm", input.taperToleranceUm);
}

/** Per-level removal of a short stroke at the tight end, from the stone's contact there [D, removal.ts]. */
function dwellRemoval(stage: HoneStage, end: "top" | "bottom", fraction: number) {
  const full = stage.strokeSetup;
  const setup = dwellSetup(full, end, Math.min(fraction * full.stoneLengthUm, full.strokeLengthUm));
  const depths = levelDepthsUm(stage.removalByLevelUm.length, full.boreLengthUm);
  const byLevelUm = contactShares(blockOf(setup), full.boreLengthUm, depths).map((share) => share * stage.removal.removalPerDoubleStrokeUm);
  return { setup, byLevelUm };
}

/** The dwell count that leaves the least taper once the stage's full strokes have brought every level to the goal [D]. */
function planDwell(stage: HoneStage, profile: Profile, goalUm: number, end: "top" | "bottom") {
  const endIndex = end === "top" ? 0 : profile.length - 1;
  const undwelled = afterStrokes(profile, stage.removalByLevelUm, ceilStrokes(strokesToReach(profile, stage.removalByLevelUm, goalUm - CLEANUP_SLACK_UM)));
  let best: { strokes: number; taperUm: number; setup: ReturnType<typeof dwellRemoval>["setup"]; byLevelUm: number[] } | null = null;
  for (const fraction of DWELL_STROKE_FRACTIONS) {
    const { setup, byLevelUm } = dwellRemoval(stage, end, fraction);
    const atEnd = byLevelUm[endIndex] ?? 0;
    if (atEnd <= 0) continue;
    const upper = Math.min(MAX_DWELL_STROKES, ceilStrokes((2 * profileTaperUm(profile)) / atEnd) + 2);
    for (let n = 1; n <= upper; n++) {
      const dwelled = afterStrokes(profile, byLevelUm, n);
      const finished = afterStrokes(dwelled, stage.removalByLevelUm, ceilStrokes(strokesToReach(dwelled, stage.removalByLevelUm, goalUm - CLEANUP_SLACK_UM)));
      const taperUm = profileTaperUm(finished);
      if (!best || taperUm < best.taperUm - 1e-6) best = { strokes: n, taperUm, setup, byLevelUm };
    }
  }
  // A dwell that does not leave less taper than the full strokes alone is no help.
  return best && best.taperUm < profileTaperUm(undwelled) - 1e-6 ? best : null;
}

/** The tightest reading the stage's full strokes start from (after the plan's dwell, when it has one), as in the plan. */
const fullStrokesFrom = (stage: HoneStage): number => (stage.dwell ? tightestUm(stage.dwell.expectedByLevel) : stage.diameterBeforeUm);

/** The stage's own rounding; a plan saved before stages carried it stopped short whenever a stage followed. */
function roundingOf(stage: HoneStage, laterStockUm: number): StrokeRounding {
  const kept = (stage as Partial<HoneStage>).rounding;
  return kept ?? { stopShort: laterStockUm > 0, owedUm: stage.kind === "plateau" ? 0 : stage.cleanup.requiredUm, minStrokes: 0 };
}

/**
 * What a checkpoint reading means for the rest of the stage: the stock left per level, the strokes still
 * to run at the plan's removal per level, a dwell when the reading shows taper past the tolerance, or a
 * stop when the reading is already past what the band allows [D, DESIGN §5.3–5.4].
 */
export function reestimateAtCheckpoint(input: ReestimateInput): Reestimate {
  validate(input);
  const { stage } = input;
  const profile = profileOf(input.levels);
  const goalUm = stage.goalUm;
  const remainingByLevel = profile.map((l) => ({ level: l.level, stockUm: Math.max(0, goalUm - Math.min(l.aUm, l.bUm)) }));
  const taperUm = profileTaperUm(profile);
  const tightest = Math.min(...profile.map((l) => Math.min(l.aUm, l.bUm)));
  const observedRemovalUm = input.strokesDone >= 1 ? Math.max(0, tightest - stage.diameterBeforeUm) / input.strokesDone : null;
  const base = { remainingByLevel, taperUm, observedRemovalUm, rule: REESTIMATE_RULE };
  const largest = largestUm(profile);
  if (largest + input.laterStockUm > input.bandMaxUm + CLEANUP_SLACK_UM) {
    return {
      ...base, action: "stop_call_machinist", strokesToRun: 0, dwell: null, expectedAfter: profile,
      reason: `The largest reading ${um(largest)}${input.laterStockUm > 0 ? ` plus the ${um(input.laterStockUm)} the next stages must still take` : ""} is past the band's ${um(input.bandMaxUm)}: stop and call the machinist.`,
    };
  }
  const end = taperUm > input.taperToleranceUm + 1e-9 ? tightEndOf(profile) : null;
  const dwell = end ? planDwell(stage, profile, goalUm, end) : null;
  const afterDwell = dwell ? afterStrokes(profile, dwell.byLevelUm, dwell.strokes) : profile;
  const need = strokesToReach(afterDwell, stage.removalByLevelUm, goalUm - CLEANUP_SLACK_UM);
  if (!Number.isFinite(need)) throw new HoningInputError("levels", "a level below the goal is never reached by this stage's stroke");
  const strokesToRun = wholeStrokes({
    now: afterDwell, byLevelUm: stage.removalByLevelUm, need, rounding: roundingOf(stage, input.laterStockUm), startTightestUm: fullStrokesFrom(stage), strokesDone: input.strokesDone,
  });
  const expectedAfter = afterStrokes(afterDwell, stage.removalByLevelUm, strokesToRun);
  const dwellOut = dwell && end
    ? { end, strokeLengthUm: dwell.setup.strokeLengthUm, strokes: dwell.strokes, upperReversal: dwell.setup.upperReversal, lowerReversal: dwell.setup.lowerReversal }
    : null;
  if (strokesToRun === 0 && !dwellOut) {
    return { ...base, action: "stage_done", strokesToRun: 0, dwell: null, expectedAfter, reason: `Every level is at the stage's goal of ${um(goalUm)}: go on to the next card.` };
  }
  const tight = remainingByLevel.reduce((a, b) => (b.stockUm > a.stockUm ? b : a));
  const reason = [
    `${um(tight.stockUm)} left at ${tight.level}`,
    dwellOut ? `taper ${um(taperUm)} is past ${um(input.taperToleranceUm)}: ${dwellOut.strokes} short strokes at the ${dwellOut.end} first` : null,
    `then ${strokesToRun} full strokes at the plan's rate`,
  ].filter(Boolean).join("; ");
  return { ...base, action: "continue", strokesToRun, dwell: dwellOut, expectedAfter, reason: `${reason}.` };
}
