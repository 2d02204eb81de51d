import { HoningInputError, requireNonNegative, requirePositive } from "./errors";
import type { PlanIssue } from "./warnings";

/** Overtravel at each end ≈ 1/3 of the stone length [C, trade-facts §5]. */
export const DEFAULT_OVERTRAVEL_FRACTION = 1 / 3;
/** Overtravel past half the stone leaves it unsupported at the reversal (bell mouth) [C, trade-facts §5]. */
export const MAX_OVERTRAVEL_FRACTION = 0.5;
export const OVERTRAVEL_RULE = "overtravel 1/3 stone length per end [C]; head stroke = L_bore + o_top + o_bottom − L_stone [D]";

export interface StrokeSetupInput {
  boreLengthUm: number;
  stoneLengthUm: number;
  overtravelFraction?: number;
  /** Room below the bore (crank webs, blind end): the most the stone may pass the bottom. */
  maxBottomOvertravelUm?: number;
}

/** Positions measured from the deck, positive down into the bore (negative = above the deck). */
export interface Reversal {
  stoneTopFromDeckUm: number;
  stoneBottomFromDeckUm: number;
}

export interface StrokeSetup {
  strokeLengthUm: number;
  overtravelTopUm: number;
  overtravelBottomUm: number;
  /** Stop positions the operator sets: where the stone's ends are at each reversal. */
  upperReversal: Reversal;
  lowerReversal: Reversal;
  boreLengthUm: number;
  stoneLengthUm: number;
  warnings: PlanIssue[];
  rule: string;
}

/** Head stroke and stop positions: S = L_bore + o_top + o_bottom − L_stone, o = 1/3 stone [C rule, D arithmetic]. */
export function strokeSetup(input: StrokeSetupInput): StrokeSetup {
  const { boreLengthUm, stoneLengthUm } = input;
  requirePositive("boreLengthUm", boreLengthUm);
  requirePositive("stoneLengthUm", stoneLengthUm);
  const fraction = input.overtravelFraction ?? DEFAULT_OVERTRAVEL_FRACTION;
  requireNonNegative("overtravelFraction", fraction);
  if (fraction > MAX_OVERTRAVEL_FRACTION) throw new HoningInputError("overtravelFraction", `must be at most ${MAX_OVERTRAVEL_FRACTION} of the stone: past that the stone tips out of the bore`);
  if (input.maxBottomOvertravelUm !== undefined) requireNonNegative("maxBottomOvertravelUm", input.maxBottomOvertravelUm);
  const wanted = fraction * stoneLengthUm;
  const limit = input.maxBottomOvertravelUm === undefined ? Infinity : Math.max(0, input.maxBottomOvertravelUm);
  const overtravelTopUm = wanted;
  const overtravelBottomUm = Math.min(wanted, limit);
  const travelUm = boreLengthUm + overtravelTopUm + overtravelBottomUm;
  const warnings: PlanIssue[] = [];
  if (overtravelBottomUm < wanted) {
    warnings.push({
      code: "BOTTOM_OVERTRAVEL_LIMITED", severity: "warning", overtravelBottomUm, wantedUm: wanted,
      message: "The stone cannot pass the bottom by a third of its length: the bottom will stay tight; plan dwell strokes there.",
    });
  }
  if (stoneLengthUm >= travelUm) {
    warnings.push({
      code: "STONE_LONGER_THAN_TRAVEL", severity: "error", stoneLengthUm, travelUm,
      message: "The stone is as long as the bore plus its overtravel: there is no stroke left.",
    });
  }
  const strokeLengthUm = Math.max(0, travelUm - stoneLengthUm);
  return {
    strokeLengthUm,
    overtravelTopUm,
    overtravelBottomUm,
    upperReversal: { stoneTopFromDeckUm: -overtravelTopUm, stoneBottomFromDeckUm: stoneLengthUm - overtravelTopUm },
    lowerReversal: {
      stoneTopFromDeckUm: boreLengthUm + overtravelBottomUm - stoneLengthUm,
      stoneBottomFromDeckUm: boreLengthUm + overtravelBottomUm,
    },
    boreLengthUm,
    stoneLengthUm,
    warnings,
    rule: OVERTRAVEL_RULE,
  };
}
