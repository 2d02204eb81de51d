// Plain words for every issue the honing computation raises: what is wrong with its numbers, and the
// way out. Wording only; the numbers are the issue's own.
import type { PlanIssue, PlanIssueCode } from "@/lib/honing";
import { fixed, setup, size, small, type DisplayUnits } from "@/shared/units";
import { userText } from "@/shared/words/user-text";

export type IssueText = { title: string; detail: string; wayOut: string | null };
type StoneNames = (id: string) => string;

function boreOver(i: Extract<PlanIssue, { code: "BORE_OVER_TARGET" }>, u: DisplayUnits): IssueText {
  const ways = i.choices.map((c) =>
    c.kind === "NEXT_OVERSIZE" ? "bore to the next oversize with matching pistons"
      : c.kind === "OTHER_PISTON" ? `fit a piston of at least ${size(c.pistonAtLeastUm, u)}`
        : `raise the target clearance so the finished size is ${size(c.newTargetUm, u)} (still inside the band)`,
  );
  return {
    title: `Bore already over target at ${i.level} ${i.direction}`,
    detail: `Reading ${size(i.readingUm, u)} is ${small(i.overByUm, u)} over the ${size(i.targetUm, u)} target (band up to ${size(i.bandMaxUm, u)}).`,
    wayOut: ways.length ? `Either ${ways.join("; or ")}.` : null,
  };
}

export function issueText(issue: PlanIssue, u: DisplayUnits, stoneName: StoneNames): IssueText {
  switch (issue.code) {
    case "BORE_OVER_TARGET":
      return boreOver(issue, u);
    case "STOCK_BELOW_CLEANUP": {
      const marks = issue.marksOf === "boring" || issue.marksOf === "incoming surface" ? `the ${issue.marksOf}` : stoneName(issue.marksOf);
      return {
        title: `Too little stock for the ${issue.stage} stage`,
        detail: `It has ${small(issue.stockUm, u)} but must take ${small(issue.cleanupUm, u)} to clean up the marks of ${marks}: short by ${small(issue.shortByUm, u)}.`,
        wayOut: "Bore a little further (boring in step 2), choose a larger clearance within the band, or pick a finer stone for the stage before.",
      };
    }
    case "STOCK_ABOVE_HONING_LIMIT":
      return { title: "Too much stock to hone", detail: `${small(issue.stockUm, u)} is more than the ${small(issue.limitUm, u)} honing can take.`, wayOut: "Turn on boring in step 2 and bore to the bore-to size first." };
    case "STONE_WEAR_LIMIT":
      return {
        title: `Stone ${stoneName(issue.stoneId)} past its wear limit`,
        detail: `The ${issue.stage} stage takes it from ${setup(issue.heightBeforeUm, u)} to ${setup(issue.heightAfterUm, u)}; its limit is ${setup(issue.wearLimitHeightUm, u)}.`,
        wayOut: "Fit a fresh set before this stage, or pick another stone of the same role in step 3.",
      };
    case "CUTTING_SPEED_OUT_OF_RANGE":
      return { title: "Cutting speed outside the usual range", detail: `${fixed(issue.cuttingSpeedMPerMin)} m/min; honing usually runs ${issue.minMPerMin}–${issue.maxMPerMin} m/min.`, wayOut: "Hold a different spindle speed or change the target angle in step 4." };
    case "SPEED_OUTSIDE_MACHINE":
      return {
        title: "The machine cannot reach the target angle",
        detail: `At ${fixed(issue.spindleRpm, 0)} rpm and ${fixed(issue.doubleStrokesPerMin)} double strokes/min it gives ${fixed(issue.achievedAngleDeg)}°, not ${issue.targetAngleDeg}°.`,
        wayOut: "Choose another machine, or a target angle this machine can reach.",
      };
    case "BOTTOM_OVERTRAVEL_LIMITED":
      return { title: "Short overtravel at the bottom", detail: `Only ${setup(issue.overtravelBottomUm, u)} below the bore instead of ${setup(issue.wantedUm, u)}.`, wayOut: "The bottom will stay tight: plan dwell strokes there and measure it first." };
    case "STROKE_ABOVE_MACHINE":
      return { title: "Stroke longer than the machine allows", detail: `${setup(issue.strokeLengthUm, u)} against the machine's ${setup(issue.maxStrokeLengthUm, u)}.`, wayOut: "Lower the overtravel in step 4 or choose a machine with a longer stroke." };
    default:
      return { title: TITLES[issue.code] ?? "Needs a look", detail: userText(issue.message), wayOut: null };
  }
}

const TITLES: Partial<Record<PlanIssueCode, string>> = {
  STONE_LONGER_THAN_TRAVEL: "Stone as long as the travel",
  NO_HONING_STONE: "No honing stone for this material",
  STONE_RATE_INVALID: "A rate row cannot be used",
  BORING_NOT_NEEDED: "No boring needed",
  COARSE_SKIPPED: "Coarse stage skipped",
  FINISH_STEP_TOO_COARSE: "Finish stroke coarser than the band",
  CHECKPOINT_NOT_POSSIBLE: "No room for a checkpoint",
  INVALID_INPUT: "An input does not fit",
  LEVEL_OUTSIDE_BAND: "A level would end outside the band",
  TAPER_NOT_CORRECTED: "Taper the stones cannot take out",
  LEVEL_NOT_REACHED: "A level the stroke never reaches",
  STONE_LONGER_THAN_BORE: "Stone longer than the bore",
  STROKE_TOO_COARSE: "One stroke takes most of a stage",
  PRESSURE_OUTSIDE_RATE: "Pressure far from the rate's",
  ANGLE_OUTSIDE_RATE: "Crosshatch far from the rate's",
  OUT_OF_ROUND_REMAINS: "Out-of-round left after honing",
};

/** Which step each issue belongs to, so it is shown where it arises. */
export const ISSUE_STEP: Record<PlanIssueCode, "pistons" | "readings" | "stones" | "stroke"> = {
  BORE_OVER_TARGET: "readings", STOCK_ABOVE_HONING_LIMIT: "readings", BORING_NOT_NEEDED: "readings", INVALID_INPUT: "pistons",
  STOCK_BELOW_CLEANUP: "stones", STONE_WEAR_LIMIT: "stones", NO_HONING_STONE: "stones", STONE_RATE_INVALID: "stones",
  COARSE_SKIPPED: "stones", FINISH_STEP_TOO_COARSE: "stones", CHECKPOINT_NOT_POSSIBLE: "stones",
  LEVEL_OUTSIDE_BAND: "stones", TAPER_NOT_CORRECTED: "stones", STROKE_TOO_COARSE: "stones", PRESSURE_OUTSIDE_RATE: "stones", OUT_OF_ROUND_REMAINS: "readings",
  LEVEL_NOT_REACHED: "stroke", STONE_LONGER_THAN_BORE: "stroke", ANGLE_OUTSIDE_RATE: "stroke",
  CUTTING_SPEED_OUT_OF_RANGE: "stroke", SPEED_OUTSIDE_MACHINE: "stroke", BOTTOM_OVERTRAVEL_LIMITED: "stroke", STROKE_ABOVE_MACHINE: "stroke", STONE_LONGER_THAN_TRAVEL: "stroke",
};
