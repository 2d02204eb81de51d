import { DEFAULT_CROSSHATCH_DEG } from "./crosshatch";
import type { PlanHoneInput, RemovalRate, StoneInput } from "./plan-types";
import { afterStrokes, strokesToReach, tightestUm, type Profile } from "./profile";
import { blockOf, contactShares, removalPerDoubleStroke } from "./removal";
import { chooseSpeeds, type SpeedChoice } from "./speeds";
import { strokeSetup, type StrokeSetup } from "./stroke-setup";
import type { HoneStageKind } from "./types";
import type { PlanIssue } from "./warnings";

/** Pressure ratios to the rate row's reference that Preston's proportion is trusted over: ½–2× [C]. */
export const TRUSTED_PRESSURE_RATIO = { min: 0.5, max: 2 } as const;
/** Crosshatch angles away from the row's reference by more than this change the cut, not only its rate [C]. */
export const TRUSTED_ANGLE_DIFFERENCE_DEG = 20;

export interface StageSettings {
  setup: StrokeSetup;
  pressure: number;
  speeds: SpeedChoice;
  removal: RemovalRate;
  /** Removal per double stroke at each reading level, from the deck down. */
  byLevelUm: number[];
  issues: PlanIssue[];
}

/** The achieved angle, kept off 0° and 180° so a stalled stroke cannot divide by zero. */
const usableAngle = (deg: number) => Math.min(179, Math.max(1, deg));

function rangeIssues(stone: StoneInput, pressure: number, speeds: SpeedChoice, removal: RemovalRate): PlanIssue[] {
  const issues: PlanIssue[] = [];
  const ratio = pressure / stone.rate.referencePressure;
  if (ratio < TRUSTED_PRESSURE_RATIO.min || ratio > TRUSTED_PRESSURE_RATIO.max) {
    issues.push({
      code: "PRESSURE_OUTSIDE_RATE", severity: "warning", stoneId: stone.id, pressure, referencePressure: stone.rate.referencePressure, ratio,
      message: `Pressure ${pressure} is ${ratio.toFixed(2)}× the rate row's ${stone.rate.referencePressure}: outside ½–2× the estimate is a guess; run a test bore or log a rate at this pressure.`,
    });
  }
  if (Math.abs(speeds.includedAngleDeg - removal.referenceAngleDeg) > TRUSTED_ANGLE_DIFFERENCE_DEG) {
    issues.push({
      code: "ANGLE_OUTSIDE_RATE", severity: "warning", stoneId: stone.id, angleDeg: speeds.includedAngleDeg, referenceAngleDeg: removal.referenceAngleDeg,
      message: `The stroke gives ${speeds.includedAngleDeg.toFixed(0)}°, more than ${TRUSTED_ANGLE_DIFFERENCE_DEG}° from the ${removal.referenceAngleDeg}° the rate was measured at: the strokes are an estimate.`,
    });
  }
  return issues;
}

/** Speeds and per-level removal of a block of strokes with a given set-up [D, removal.ts]. */
export function blockSettings(input: PlanHoneInput, stone: StoneInput, boreDiameterUm: number, depthsUm: readonly number[], setup: StrokeSetup) {
  const pressure = input.pressures?.[stone.role] ?? stone.rate.referencePressure;
  const speeds = chooseSpeeds({
    boreDiameterUm, strokeLengthUm: Math.max(setup.strokeLengthUm, 1),
    targetAngleDeg: input.targetCrosshatchDeg ?? DEFAULT_CROSSHATCH_DEG, machine: input.machine,
  });
  const removal = removalPerDoubleStroke({ stone, pressure, angleDeg: usableAngle(speeds.includedAngleDeg), boreDiameterUm, boreLengthUm: input.boreLengthUm });
  const byLevelUm = contactShares(blockOf(setup), input.boreLengthUm, depthsUm).map((share) => share * removal.removalPerDoubleStrokeUm);
  return { pressure, speeds, removal, byLevelUm, issues: [...speeds.issues, ...rangeIssues(stone, pressure, speeds, removal)] };
}

/** The full-stroke settings a stage runs with: set-up for its stone, pressure, speeds and removal. */
export function stageSettings(input: PlanHoneInput, stone: StoneInput, boreDiameterUm: number, depthsUm: readonly number[]): StageSettings {
  const setup = strokeSetup({
    boreLengthUm: input.boreLengthUm,
    stoneLengthUm: stone.stoneLengthUm,
    ...(input.overtravelFraction !== undefined && { overtravelFraction: input.overtravelFraction }),
    ...(input.bottomClearanceUm !== undefined && { maxBottomOvertravelUm: input.bottomClearanceUm }),
  });
  const block = blockSettings(input, stone, boreDiameterUm, depthsUm, setup);
  const issues: PlanIssue[] = [...setup.warnings, ...block.issues];
  if (setup.strokeLengthUm > input.machine.maxStrokeLengthUm) {
    issues.push({
      code: "STROKE_ABOVE_MACHINE", severity: "error", strokeLengthUm: setup.strokeLengthUm, maxStrokeLengthUm: input.machine.maxStrokeLengthUm,
      message: "The stroke this bore needs is longer than the machine's maximum stroke.",
    });
  }
  return { setup, ...block, issues };
}

/** One stage of the sequence: its stone, settings and the smallest reading it brings every level to. */
export interface StageSpec {
  kind: HoneStageKind;
  stone: StoneInput;
  settings: StageSettings;
  goalUm: number;
  /** Another cutting stage follows: stop one stroke short rather than pass the goal. */
  stopShort: boolean;
  /** Strokes the stage runs at least (the plateau's fixed stock). */
  minStrokes: number;
  /** Clean-up the stage owes the marks before it: stopping short must not leave it unpaid. */
  owedUm: number;
}

export interface StageRun {
  spec: StageSpec;
  before: Profile;
  /** Strokes to the goal, not rounded. */
  need: number;
  strokes: number;
  after: Profile;
}

/** A shortfall below this, to a goal or a clean-up, is gauge noise: 0.05 µm (bore gauges read to 1 µm at best) [C]. */
export const CLEANUP_SLACK_UM = 0.05;

/** Float noise guard so that 20 µm / 0.5 µm is 40 strokes, not 41. */
export const ceilStrokes = (x: number): number => Math.max(0, Math.ceil(x - 1e-9));
export const floorStrokes = (x: number): number => Math.max(0, Math.floor(x + 1e-9));

/** How a stage turns the strokes it needs into whole strokes; the plan keeps it on each stage for the re-estimate. */
export interface StrokeRounding {
  /** Another cutting stage follows: stop one stroke short rather than pass the goal. */
  stopShort: boolean;
  /** Clean-up the stage owes the marks before it, at the tightest reading, from the stage's start. */
  owedUm: number;
  /** Strokes the stage runs at least (the plateau's fixed stock). */
  minStrokes: number;
}

/**
 * The one rounding rule of a stage's strokes, for the plan and for the re-estimate at a checkpoint alike:
 * stop short of the goal when a stage follows, unless that would leave the clean-up it owes unpaid
 * [C, DESIGN §5.3]. `now` is the bore as it stands, `startTightestUm` its tightest reading when the stage
 * began and `strokesDone` the strokes already run in it (both the start and 0 for the plan itself).
 */
export function wholeStrokes(input: { now: Profile; byLevelUm: readonly number[]; need: number; rounding: StrokeRounding; startTightestUm: number; strokesDone: number }): number {
  const { now, byLevelUm, need, rounding } = input;
  const atLeast = Math.max(0, rounding.minStrokes - input.strokesDone);
  if (!Number.isFinite(need)) return atLeast;
  let strokes = ceilStrokes(need);
  if (rounding.stopShort) {
    const short = floorStrokes(need);
    const removedAtTightest = tightestUm(afterStrokes(now, byLevelUm, short)) - input.startTightestUm;
    if (removedAtTightest >= rounding.owedUm - CLEANUP_SLACK_UM) strokes = short;
  }
  return Math.max(strokes, atLeast);
}

export const roundingOf = (spec: StageSpec): StrokeRounding => ({ stopShort: spec.stopShort, owedUm: spec.owedUm, minStrokes: spec.minStrokes });

/** Whole strokes to the stage's goal: expected sizes follow whole strokes × rate [DESIGN §5.4]. */
export function runStage(before: Profile, spec: StageSpec): StageRun {
  const need = strokesToReach(before, spec.settings.byLevelUm, spec.goalUm - CLEANUP_SLACK_UM);
  const strokes = wholeStrokes({ now: before, byLevelUm: spec.settings.byLevelUm, need, rounding: roundingOf(spec), startTightestUm: tightestUm(before), strokesDone: 0 });
  return { spec, before, need, strokes, after: afterStrokes(before, spec.settings.byLevelUm, strokes) };
}

export function runSequence(start: Profile, specs: readonly StageSpec[]): StageRun[] {
  const runs: StageRun[] = [];
  let profile = start;
  for (const spec of specs) {
    const run = runStage(profile, spec);
    runs.push(run);
    profile = run.after;
  }
  return runs;
}

/**
 * The worst taper after `strokes` double strokes at `byLevelUm` followed by the whole sequence: what
 * `profileTaperUm(runSequence(afterStrokes(start, byLevelUm, strokes), specs).at(-1).after)` gives, to the
 * last bit, played on two number arrays instead of profiles. The dwell search asks it tens of times per
 * cylinder on every preview; the plan itself keeps runSequence. Every sum is formed in the same order as
 * there (`sequence.property.test.ts` compares them exactly).
 */
export function finalTaperUm(start: Profile, byLevelUm: readonly number[], strokes: number, specs: readonly StageSpec[]): number {
  const count = start.length;
  const a = new Float64Array(count);
  const b = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    const removed = strokes * (byLevelUm[i] ?? 0);
    a[i] = start[i]!.aUm + removed;
    b[i] = start[i]!.bUm + removed;
  }
  if (specs.length === 0) return spreadUm(start, count);
  for (const spec of specs) {
    const by = spec.settings.byLevelUm;
    const stageStrokes = playedStrokes(a, b, by, spec);
    for (let i = 0; i < count; i++) {
      const removed = stageStrokes * (by[i] ?? 0);
      a[i]! += removed;
      b[i]! += removed;
    }
  }
  return Math.max(rangeOf(a), rangeOf(b));
}

/** runStage's whole strokes (strokesToReach, then wholeStrokes from the stage's start) on number arrays. */
function playedStrokes(a: Float64Array, b: Float64Array, by: readonly number[], spec: StageSpec): number {
  const goalUm = spec.goalUm - CLEANUP_SLACK_UM;
  let need = 0;
  let startTightestUm = Infinity;
  for (let i = 0; i < a.length; i++) {
    const tightest = Math.min(a[i]!, b[i]!);
    startTightestUm = Math.min(startTightestUm, tightest);
    const short = goalUm - tightest;
    if (short <= 0) continue;
    const rate = by[i] ?? 0;
    need = Math.max(need, rate > 0 ? short / rate : Infinity);
  }
  const atLeast = Math.max(0, spec.minStrokes);
  if (!Number.isFinite(need)) return atLeast;
  let strokes = ceilStrokes(need);
  if (spec.stopShort) {
    const short = floorStrokes(need);
    let tightestAfterUm = Infinity;
    for (let i = 0; i < a.length; i++) {
      const removed = short * (by[i] ?? 0);
      tightestAfterUm = Math.min(tightestAfterUm, Math.min(a[i]! + removed, b[i]! + removed));
    }
    if (tightestAfterUm - startTightestUm >= spec.owedUm - CLEANUP_SLACK_UM) strokes = short;
  }
  return Math.max(strokes, atLeast);
}

function rangeOf(values: Float64Array): number {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return hi - lo;
}

function spreadUm(profile: Profile, count: number): number {
  const a = new Float64Array(count);
  const b = new Float64Array(count);
  profile.forEach((l, i) => ((a[i] = l.aUm), (b[i] = l.bUm)));
  return Math.max(rangeOf(a), rangeOf(b));
}
