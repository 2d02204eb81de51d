import type { StoneInput } from "./plan-types";
import type { StoneRole } from "./types";
import type { PlanIssue } from "./warnings";

export type ChosenStones = Record<StoneRole, StoneInput | null>;

const positive = (x: number) => Number.isFinite(x) && x > 0;

/** Rate rows the computation cannot use, as typed issues. */
export function invalidStoneRates(stones: readonly StoneInput[]): PlanIssue[] {
  const issues: PlanIssue[] = [];
  const flag = (stone: StoneInput, field: string, message: string) =>
    issues.push({ code: "STONE_RATE_INVALID", severity: "error", stoneId: stone.id, field, message: `Stone ${stone.id}: ${message}` });
  for (const stone of stones) {
    const { rate } = stone;
    if (!positive(stone.stoneLengthUm)) flag(stone, "stoneLengthUm", "stone length must be above zero.");
    if (!positive(rate.removalPerDoubleStrokeUm)) flag(stone, "rate.removalPerDoubleStrokeUm", "removal per double stroke must be above zero.");
    if (!positive(rate.referencePressure)) flag(stone, "rate.referencePressure", "reference pressure must be above zero.");
    if (!(rate.referenceBoreLengthUm > stone.stoneLengthUm / 3)) {
      flag(stone, "rate.referenceBoreLengthUm", "reference bore length must be longer than a third of the stone.");
    }
    if (!(rate.uncertaintyFraction >= 0 && rate.uncertaintyFraction < 1)) flag(stone, "rate.uncertaintyFraction", "uncertainty must be from 0 to below 1.");
    if (!(rate.wearUmPerUmStock >= 0)) flag(stone, "rate.wearUmPerUmStock", "wear figure must not be negative.");
    if (stone.learnedMultiplier !== undefined && !positive(stone.learnedMultiplier)) flag(stone, "learnedMultiplier", "learned multiplier must be above zero.");
    if (stone.learnedUncertaintyFraction !== undefined && !(stone.learnedUncertaintyFraction >= 0 && stone.learnedUncertaintyFraction < 1)) {
      flag(stone, "learnedUncertaintyFraction", "learned uncertainty must be from 0 to below 1.");
    }
    if (rate.referenceAngleDeg !== undefined && !(rate.referenceAngleDeg > 0 && rate.referenceAngleDeg < 180)) flag(stone, "rate.referenceAngleDeg", "reference angle must be between 0° and 180°.");
    if (rate.referenceDiameterUm !== undefined && !positive(rate.referenceDiameterUm)) flag(stone, "rate.referenceDiameterUm", "reference diameter must be above zero.");
    if (!(stone.currentHeightUm >= 0) || !(stone.wearLimitHeightUm >= 0)) flag(stone, "currentHeightUm", "stone heights must be numbers from zero up.");
  }
  return issues;
}

/** Per role, the first listed stone still above its wear limit, else the first listed (its wear is then flagged). */
export function chooseStones(stones: readonly StoneInput[]): ChosenStones {
  const pick = (role: StoneRole) => {
    const ofRole = stones.filter((s) => s.role === role);
    return ofRole.find((s) => s.currentHeightUm > s.wearLimitHeightUm) ?? ofRole[0] ?? null;
  };
  return { coarse: pick("coarse"), finish: pick("finish"), plateau: pick("plateau") };
}
