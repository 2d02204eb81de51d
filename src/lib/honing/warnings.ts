import type { Direction, HoneStageKind } from "./types";

/**
 * Every warning or error of the honing computation: a typed code with its numbers and a plain
 * message. Errors mean the plan must not be released as it stands; warnings need a look.
 */
export type PlanIssue =
  | {
      code: "BORE_OVER_TARGET";
      severity: "error";
      level: string;
      direction: Direction;
      readingUm: number;
      targetUm: number;
      overByUm: number;
      bandMaxUm: number;
      /** What the machinist can do: the next oversize, another piston, or a larger clearance within the band. */
      choices: BoreOverTargetChoice[];
      message: string;
    }
  | {
      code: "STOCK_BELOW_CLEANUP";
      severity: "error";
      stage: HoneStageKind;
      /** What leaves the marks that must be cleaned up: "boring", "incoming surface" or a stone id. */
      marksOf: string;
      stockUm: number;
      cleanupUm: number;
      shortByUm: number;
      message: string;
    }
  | { code: "STOCK_ABOVE_HONING_LIMIT"; severity: "error"; stockUm: number; limitUm: number; message: string }
  | {
      code: "STONE_WEAR_LIMIT";
      severity: "warning";
      stoneId: string;
      stage: HoneStageKind;
      heightBeforeUm: number;
      heightAfterUm: number;
      wearLimitHeightUm: number;
      message: string;
    }
  | { code: "CUTTING_SPEED_OUT_OF_RANGE"; severity: "warning"; cuttingSpeedMPerMin: number; minMPerMin: number; maxMPerMin: number; message: string }
  | {
      code: "SPEED_OUTSIDE_MACHINE";
      severity: "warning";
      targetAngleDeg: number;
      achievedAngleDeg: number;
      spindleRpm: number;
      doubleStrokesPerMin: number;
      message: string;
    }
  | { code: "BOTTOM_OVERTRAVEL_LIMITED"; severity: "warning"; overtravelBottomUm: number; wantedUm: number; message: string }
  | { code: "STROKE_ABOVE_MACHINE"; severity: "error"; strokeLengthUm: number; maxStrokeLengthUm: number; message: string }
  | { code: "STONE_LONGER_THAN_TRAVEL"; severity: "error"; stoneLengthUm: number; travelUm: number; message: string }
  | { code: "NO_HONING_STONE"; severity: "error"; message: string }
  | { code: "STONE_RATE_INVALID"; severity: "error"; stoneId: string; field: string; message: string }
  | { code: "BORING_NOT_NEEDED"; severity: "warning"; boreToUm: number; smallestReadingUm: number; message: string }
  | { code: "COARSE_SKIPPED"; severity: "info"; reason: string; message: string }
  | { code: "FINISH_STEP_TOO_COARSE"; severity: "warning"; stage: HoneStageKind; removalPerDoubleStrokeUm: number; roomUm: number; message: string }
  | { code: "CHECKPOINT_NOT_POSSIBLE"; severity: "warning"; stage: HoneStageKind; stockUm: number; message: string }
  | { code: "INVALID_INPUT"; severity: "error"; field: string; message: string }
  | { code: "LEVEL_OUTSIDE_BAND"; severity: "error"; level: string; direction: Direction; expectedUm: number; bandMinUm: number; bandMaxUm: number; message: string }
  | {
      code: "TAPER_NOT_CORRECTED";
      severity: "error";
      expectedTaperUm: number;
      toleranceUm: number;
      stoneLengthUm: number;
      boreLengthUm: number;
      dwellStrokes: number;
      message: string;
    }
  | { code: "LEVEL_NOT_REACHED"; severity: "error"; stage: HoneStageKind; message: string }
  | { code: "STONE_LONGER_THAN_BORE"; severity: "error"; stoneLengthUm: number; boreLengthUm: number; message: string }
  | { code: "STROKE_TOO_COARSE"; severity: "warning"; stage: HoneStageKind; removalPerDoubleStrokeUm: number; stockUm: number; maxShare: number; message: string }
  | { code: "PRESSURE_OUTSIDE_RATE"; severity: "warning"; stoneId: string; pressure: number; referencePressure: number; ratio: number; message: string }
  | { code: "ANGLE_OUTSIDE_RATE"; severity: "warning"; stoneId: string; angleDeg: number; referenceAngleDeg: number; message: string }
  | { code: "OUT_OF_ROUND_REMAINS"; severity: "warning"; outOfRoundUm: number; level: string; toleranceUm: number; message: string };

export type PlanIssueCode = PlanIssue["code"];

export type BoreOverTargetChoice =
  | { kind: "NEXT_OVERSIZE" }
  | { kind: "OTHER_PISTON"; pistonAtLeastUm: number }
  | { kind: "LARGER_CLEARANCE"; newTargetUm: number };

/** Errors block release of a plan; warnings and info do not (DESIGN §5). */
export const isError = (issue: PlanIssue): boolean => issue.severity === "error";
