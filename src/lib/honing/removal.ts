import { DEFAULT_CROSSHATCH_DEG } from "./crosshatch";
import { HoningInputError, requireFinite, requireNonNegative, requirePositive } from "./errors";
import type { RemovalRate, StoneInput } from "./plan-types";
import type { StrokeSetup } from "./stroke-setup";

/**
 * The removal model along the bore.
 *
 * Preston: depth removed ∝ pressure × sliding distance [V S10]. A point on the wall at depth z
 * below the deck is under the stone while the stone's top is within [z − L_stone, z]; over a
 * double stroke the stone slides past it 2·c(z)/sin(θ/2), where c(z) is the length of stone-top
 * positions in the stroke that cover z and θ the included crosshatch angle [D, kinematics of a
 * constant-speed stroke]. The stones cover a fixed width of the circumference, so their share of
 * it, and the depth removed, scale with 1/diameter [D].
 *
 * The rate table gives the removal per double stroke at a fully swept level under the rule's
 * set-up (overtravel ⅓ of the stone at both ends), which by common practice hones a straight bore
 * [C, trade-facts §5]. So a block of strokes removes, at each level, the table rate times its
 * contact at that level over the rule set-up's contact there: short dwell strokes reach the middle
 * level in proportion to how far the stone still covers it, a short bottom overtravel leaves the
 * bottom level tight, and an overtravel past ⅓ opens the ends (bell mouth) [C, trade-facts §5].
 *
 * Assumed [D]: a constant-speed stroke (a crank drive lingers at the reversals), pressure even
 * along the stone, and no credit for a rigid stone taking the tight spots first: the plan errs
 * toward more strokes, and the checkpoint readings correct it.
 */
export const REMOVAL_RULE =
  "table rate × P/P_ref (Preston [V S10]) × sin(θ_ref/2)/sin(θ/2) (sliding per double stroke [D]) × D_ref/D (stone share of the circumference [D]) × contact at the level vs the ⅓-overtravel set-up [C, D] × learned multiplier";

/** Overtravel the rate table's reference set-up assumes: ⅓ of the stone at each end [C, trade-facts §5]. */
export const RULE_OVERTRAVEL_FRACTION = 1 / 3;

/** Where the stone's top travels in a block of strokes: from the upper reversal, down by the stroke. */
export interface StrokeBlock {
  /** Stone top at the upper reversal, from the deck (negative above the deck). */
  topAtUpperUm: number;
  strokeLengthUm: number;
  stoneLengthUm: number;
}

export const blockOf = (setup: Pick<StrokeSetup, "upperReversal" | "strokeLengthUm" | "stoneLengthUm">): StrokeBlock => ({
  topAtUpperUm: setup.upperReversal.stoneTopFromDeckUm,
  strokeLengthUm: setup.strokeLengthUm,
  stoneLengthUm: setup.stoneLengthUm,
});

/** The set-up the table rate describes, in this bore: ⅓ overtravel at both ends [C]. */
export function ruleBlock(boreLengthUm: number, stoneLengthUm: number): StrokeBlock {
  const o = RULE_OVERTRAVEL_FRACTION * stoneLengthUm;
  return { topAtUpperUm: -o, strokeLengthUm: Math.max(0, boreLengthUm + 2 * o - stoneLengthUm), stoneLengthUm };
}

/** Length of stone-top positions in the block that cover depth z [D]. */
export function contactLengthUm(block: StrokeBlock, depthUm: number): number {
  requireFinite("depthUm", depthUm);
  requireFinite("topAtUpperUm", block.topAtUpperUm);
  requireNonNegative("strokeLengthUm", block.strokeLengthUm);
  requirePositive("stoneLengthUm", block.stoneLengthUm);
  const lo = Math.max(depthUm - block.stoneLengthUm, block.topAtUpperUm);
  const hi = Math.min(depthUm, block.topAtUpperUm + block.strokeLengthUm);
  return Math.max(0, hi - lo);
}

/**
 * Depth of each reading level below the deck: the first and last about 10 mm in from the ends
 * (at most an eighth of the bore), the rest evenly between [from memory: usual gauging practice].
 */
export function levelDepthsUm(levelCount: number, boreLengthUm: number): number[] {
  requirePositive("boreLengthUm", boreLengthUm);
  if (!Number.isInteger(levelCount) || levelCount < 1 || levelCount > 20) throw new HoningInputError("levelCount", "must be 1 to 20 levels");
  if (levelCount === 1) return [boreLengthUm / 2];
  const margin = Math.min(10_000, boreLengthUm / 8);
  const step = (boreLengthUm - 2 * margin) / (levelCount - 1);
  return Array.from({ length: levelCount }, (_, i) => margin + i * step);
}

/** Share of the table rate a block gives at each depth: its contact there over the rule set-up's [C, D]. */
export function contactShares(block: StrokeBlock, boreLengthUm: number, depthsUm: readonly number[]): number[] {
  const rule = ruleBlock(boreLengthUm, block.stoneLengthUm);
  return depthsUm.map((z) => {
    const reference = contactLengthUm(rule, z);
    return reference > 0 ? contactLengthUm(block, z) / reference : 0;
  });
}

/** Contact of a fully swept level, which is the stroke itself when the stroke is shorter than the stone. */
const fullContact = (strokeUm: number, stoneUm: number) => Math.min(stoneUm, strokeUm);

/** Removal per double stroke at a fully swept level of this bore, from the table row scaled per the model above. */
export function removalPerDoubleStroke(input: {
  stone: StoneInput;
  pressure: number;
  /** The included crosshatch angle the stage's speeds give. */
  angleDeg: number;
  boreDiameterUm: number;
  boreLengthUm: number;
}): RemovalRate {
  const { stone, pressure, angleDeg, boreDiameterUm, boreLengthUm } = input;
  requirePositive("pressure", pressure);
  requirePositive("boreDiameterUm", boreDiameterUm);
  requirePositive("boreLengthUm", boreLengthUm);
  requireFinite("angleDeg", angleDeg);
  // Below 1° the stone barely strokes and the sliding per stroke grows without bound.
  if (!(angleDeg >= 1 && angleDeg <= 179)) throw new HoningInputError("angleDeg", "must be from 1° to 179°");
  const { rate } = stone;
  requirePositive("stone.stoneLengthUm", stone.stoneLengthUm);
  requirePositive("stone.rate.referencePressure", rate.referencePressure);
  requireNonNegative("stone.rate.removalPerDoubleStrokeUm", rate.removalPerDoubleStrokeUm);
  if (!(rate.referenceBoreLengthUm > RULE_OVERTRAVEL_FRACTION * stone.stoneLengthUm)) throw new HoningInputError("stone.rate.referenceBoreLengthUm", "must be longer than a third of the stone");
  if (rate.referenceDiameterUm !== undefined) requirePositive("stone.rate.referenceDiameterUm", rate.referenceDiameterUm);
  if (rate.referenceAngleDeg !== undefined && !(rate.referenceAngleDeg > 0 && rate.referenceAngleDeg < 180)) throw new HoningInputError("stone.rate.referenceAngleDeg", "must be between 0° and 180°");
  if (stone.learnedMultiplier !== undefined) requirePositive("stone.learnedMultiplier", stone.learnedMultiplier);
  const referenceAngleDeg = rate.referenceAngleDeg ?? DEFAULT_CROSSHATCH_DEG;
  const half = (deg: number) => Math.sin(((deg / 2) * Math.PI) / 180);
  const pressureFactor = pressure / rate.referencePressure;
  const angleFactor = half(referenceAngleDeg) / half(angleDeg);
  const diameterFactor = rate.referenceDiameterUm ? rate.referenceDiameterUm / boreDiameterUm : 1;
  const here = ruleBlock(boreLengthUm, stone.stoneLengthUm);
  const reference = ruleBlock(rate.referenceBoreLengthUm, stone.stoneLengthUm);
  const strokeFactor = fullContact(here.strokeLengthUm, stone.stoneLengthUm) / fullContact(reference.strokeLengthUm, stone.stoneLengthUm);
  const learnedMultiplier = stone.learnedMultiplier ?? 1;
  const tableRateUm = rate.removalPerDoubleStrokeUm;
  return {
    removalPerDoubleStrokeUm: tableRateUm * pressureFactor * angleFactor * diameterFactor * strokeFactor * learnedMultiplier,
    tableRateUm, pressureFactor, angleFactor, diameterFactor, strokeFactor, learnedMultiplier, referenceAngleDeg,
    rule: REMOVAL_RULE,
  };
}
