import { HoningInputError, requireFinite, requireNonNegative, requirePositive } from "./errors";

export interface FinishedBoreInput {
  pistonDiameterUm: number;
  clearanceMinUm: number;
  clearanceMaxUm: number;
  /** Defaults to the middle of the band. */
  clearanceTargetUm?: number;
  /** Extra clearance the machinist chooses; moves the target only, inside the maker's band. */
  performanceAllowanceUm?: number;
  /** Widening of the band's upper limit the machinist chooses explicitly (never implied by the allowance). */
  bandWideningUm?: number;
}

export interface FinishedBore {
  targetUm: number;
  minUm: number;
  maxUm: number;
  pistonDiameterUm: number;
  clearanceTargetUm: number;
  clearanceMinUm: number;
  clearanceMaxUm: number;
  performanceAllowanceUm: number;
  bandWideningUm: number;
  rule: string;
}

export const SIZING_RULE = "finished bore = piston at sizing point + clearance [V S17]";

/** Finished bore = piston + clearance, band = piston + [c_min, c_max], plus any performance allowance [V S17]. */
export function finishedBore(input: FinishedBoreInput): FinishedBore {
  const { pistonDiameterUm, clearanceMinUm, clearanceMaxUm } = input;
  requirePositive("pistonDiameterUm", pistonDiameterUm);
  requireFinite("clearanceMinUm", clearanceMinUm);
  requireFinite("clearanceMaxUm", clearanceMaxUm);
  if (clearanceMinUm > clearanceMaxUm) {
    throw new HoningInputError("clearanceMinUm", "the smallest clearance is larger than the largest");
  }
  const clearanceTargetUm = input.clearanceTargetUm ?? (clearanceMinUm + clearanceMaxUm) / 2;
  requireFinite("clearanceTargetUm", clearanceTargetUm);
  if (clearanceTargetUm < clearanceMinUm || clearanceTargetUm > clearanceMaxUm) {
    throw new HoningInputError("clearanceTargetUm", "the target clearance lies outside the band");
  }
  const allowance = input.performanceAllowanceUm ?? 0;
  requireNonNegative("performanceAllowanceUm", allowance);
  const widening = input.bandWideningUm ?? 0;
  requireNonNegative("bandWideningUm", widening);
  const targetUm = pistonDiameterUm + clearanceTargetUm + allowance;
  const maxUm = pistonDiameterUm + clearanceMaxUm + widening;
  if (targetUm > maxUm + 1e-9) {
    throw new HoningInputError("performanceAllowanceUm", "the allowance puts the target past the maker's band; lower it or widen the band explicitly");
  }
  const rule = [SIZING_RULE, allowance > 0 && "+ performance allowance (machinist's choice)", widening > 0 && "; band widened by the machinist"].filter(Boolean).join(" ");
  return {
    targetUm, minUm: pistonDiameterUm + clearanceMinUm, maxUm, pistonDiameterUm, clearanceTargetUm, clearanceMinUm, clearanceMaxUm,
    performanceAllowanceUm: allowance, bandWideningUm: widening, rule,
  };
}

export type ClearanceVerdict = "in band" | "tight" | "loose";

/** Clearance = bore − piston, judged against the maker's band [V S17]. */
export function checkClearance(input: {
  boreDiameterUm: number;
  pistonDiameterUm: number;
  clearanceMinUm: number;
  clearanceMaxUm: number;
}): { clearanceUm: number; verdict: ClearanceVerdict } {
  requirePositive("boreDiameterUm", input.boreDiameterUm);
  requirePositive("pistonDiameterUm", input.pistonDiameterUm);
  requireFinite("clearanceMinUm", input.clearanceMinUm);
  requireFinite("clearanceMaxUm", input.clearanceMaxUm);
  if (input.clearanceMinUm > input.clearanceMaxUm) throw new HoningInputError("clearanceMinUm", "the smallest clearance is larger than the largest");
  const clearanceUm = input.boreDiameterUm - input.pistonDiameterUm;
  if (clearanceUm < input.clearanceMinUm) return { clearanceUm, verdict: "tight" };
  if (clearanceUm > input.clearanceMaxUm) return { clearanceUm, verdict: "loose" };
  return { clearanceUm, verdict: "in band" };
}

export interface ClearanceBand {
  clearanceMinUm: number;
  clearanceMaxUm: number;
}

/**
 * The band every piston of a job allows: the largest minimum and the smallest maximum. Null with no
 * pistons or when their bands do not overlap (the machinist types the band). The intake and the
 * wizard's default both use it, so they size the same finished bore.
 */
export function commonClearanceBand(bands: readonly ClearanceBand[]): ClearanceBand | null {
  if (bands.length === 0) return null;
  bands.forEach((b, i) => {
    requireFinite(`bands[${i}].clearanceMinUm`, b.clearanceMinUm);
    requireFinite(`bands[${i}].clearanceMaxUm`, b.clearanceMaxUm);
  });
  const band = { clearanceMinUm: Math.max(...bands.map((b) => b.clearanceMinUm)), clearanceMaxUm: Math.min(...bands.map((b) => b.clearanceMaxUm)) };
  return band.clearanceMinUm <= band.clearanceMaxUm ? band : null;
}
