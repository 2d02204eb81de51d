import type { BoreGeometry } from "./geometry";
import { DEFAULT_FINISHED_TOLERANCES } from "./geometry";
import type { DwellBlock, HoneStage, PlanHoneInput } from "./plan-types";
import { profileTaperUm, type Profile } from "./profile";
import { CLEANUP_SLACK_UM, type StageRun } from "./sequence";
import { stockBelowCleanup } from "./stages";
import type { FinishedBore } from "./sizing";
import type { PlanIssue } from "./warnings";

const EPS = 1e-6;
const um = (x: number) => `${x.toFixed(1)} µm`;

/** Every reading the plan expects after its last stage must lie in the band [DESIGN §5.4]. */
function bandIssues(expected: Profile, sizing: FinishedBore): PlanIssue[] {
  return expected.flatMap((l) =>
    (["A", "B"] as const).flatMap((direction) => {
      const value = direction === "A" ? l.aUm : l.bUm;
      if (value <= sizing.maxUm + EPS && value >= sizing.minUm - EPS) return [];
      const over = value > sizing.maxUm;
      return [{
        code: "LEVEL_OUTSIDE_BAND" as const, severity: "error" as const, level: l.level, direction, expectedUm: value, bandMinUm: sizing.minUm, bandMaxUm: sizing.maxUm,
        message: `At ${l.level} ${direction} the plan ends ${um(over ? value - sizing.maxUm : sizing.minUm - value)} ${over ? "over" : "under"} the band.`,
      }];
    }),
  );
}

function taperIssue(expected: Profile, toleranceUm: number, dwell: DwellBlock | null, input: PlanHoneInput, stones: HoneStage[]): PlanIssue[] {
  const taperUm = profileTaperUm(expected);
  if (taperUm <= toleranceUm + EPS) return [];
  const stoneLengthUm = Math.max(...stones.map((s) => s.strokeSetup.stoneLengthUm));
  return [{
    code: "TAPER_NOT_CORRECTED", severity: "error", expectedTaperUm: taperUm, toleranceUm, stoneLengthUm, boreLengthUm: input.boreLengthUm, dwellStrokes: dwell?.doubleStrokes.nominal ?? 0,
    message: `The plan ends with ${um(taperUm)} of taper (tolerance ${um(toleranceUm)}): a ${(stoneLengthUm / 1000).toFixed(0)} mm stone in a ${(input.boreLengthUm / 1000).toFixed(0)} mm bore cannot correct it locally. Use a shorter stone, bore first, or accept the taper by raising the tolerance for this job.`,
  }];
}

/** One stroke of the last cutting stage must fit between target and band limit [D]. */
function finishStepIssue(stages: HoneStage[], sizing: FinishedBore): PlanIssue[] {
  const last = [...stages].reverse().find((s) => s.kind !== "plateau");
  const roomUm = sizing.maxUm - sizing.targetUm;
  if (!last || last.removal.removalPerDoubleStrokeUm <= roomUm || roomUm <= 0) return [];
  return [{
    code: "FINISH_STEP_TOO_COARSE", severity: "warning", stage: last.kind, removalPerDoubleStrokeUm: last.removal.removalPerDoubleStrokeUm, roomUm,
    message: `One ${last.kind} stroke removes more than the ${roomUm.toFixed(1)} µm between target and band limit: lower the pressure near the end.`,
  }];
}

function unreached(runs: StageRun[]): PlanIssue[] {
  const run = runs.find((r) => !Number.isFinite(r.need));
  if (!run) return [];
  return [{ code: "LEVEL_NOT_REACHED", severity: "error", stage: run.spec.kind,
    message: `The ${run.spec.kind} stroke never reaches one reading level: check the bore length and the room below the bore.` }];
}

function roundIssue(geometry: BoreGeometry | null, toleranceUm: number): PlanIssue[] {
  if (!geometry || geometry.outOfRoundUm <= toleranceUm + EPS) return [];
  return [{ code: "OUT_OF_ROUND_REMAINS", severity: "warning", outOfRoundUm: geometry.outOfRoundUm, level: geometry.outOfRoundLevel, toleranceUm,
    message: `Out-of-round ${um(geometry.outOfRoundUm)} at the ${geometry.outOfRoundLevel} is over the ${um(toleranceUm)} finished tolerance; honing is not planned to take it out: bore first or check the block's distortion.` }];
}

/** Whole strokes can leave a stage short of the clean-up it owes; say so where the split did not [C, DESIGN §5.3]. */
function cleanupIssues(stages: HoneStage[], already: PlanIssue[]): PlanIssue[] {
  return stages.flatMap((s) => {
    if (s.kind === "plateau" || s.stockUm >= s.cleanup.requiredUm - CLEANUP_SLACK_UM) return [];
    if (already.some((i) => i.code === "STOCK_BELOW_CLEANUP" && i.stage === s.kind)) return [];
    return [stockBelowCleanup(s.kind, s.cleanup.marksOf, s.stockUm, s.cleanup.requiredUm)];
  });
}

export function finalIssues(args: {
  input: PlanHoneInput; stages: HoneStage[]; runs: StageRun[]; sizing: FinishedBore; expectedFinal: Profile; dwell: DwellBlock | null; toleranceUm: number; geometry: BoreGeometry | null;
  splitIssues: PlanIssue[];
}): PlanIssue[] {
  const { input, stages, runs, sizing, expectedFinal, dwell, toleranceUm } = args;
  if (stages.length === 0) return [];
  return [
    ...unreached(runs), ...cleanupIssues(stages, args.splitIssues), ...bandIssues(expectedFinal, sizing), ...taperIssue(expectedFinal, toleranceUm, dwell, input, stages),
    ...finishStepIssue(stages, sizing), ...roundIssue(args.geometry, input.outOfRoundToleranceUm ?? DEFAULT_FINISHED_TOLERANCES.outOfRoundUm),
  ];
}
