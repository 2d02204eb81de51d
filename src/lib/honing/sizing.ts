import { HoningInputError, requireFinite, requirePositive } from "./errors";

export interface FinishedBoreInput {
  pistonDiameterUm: number;
  clearanceMinUm: number;
  clearanceMaxUm: number;
  /** Defaults to the middle of the band. */
  clearanceTargetUm?: number;
  /** Extra clearance the machinist chooses; shifts target and band alike. */
  performanceAllowanceUm?: number;
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
  requireFinite("performanceAllowanceUm", allowance);
  return {
    targetUm: pistonDiameterUm + clearanceTargetUm + allowance,
    minUm: pistonDiameterUm + clearanceMinUm + allowance,
    maxUm: pistonDiameterUm + clearanceMaxUm + allowance,
    pistonDiameterUm,
    clearanceTargetUm,
    clearanceMinUm,
    clearanceMaxUm,
    performanceAllowanceUm: allowance,
    rule: allowance === 0 ? SIZING_RULE : `${SIZING_RULE} + performance allowance (machinist's choice)`,
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
  const clearanceUm = input.boreDiameterUm - input.pistonDiameterUm;
  if (clearanceUm < input.clearanceMinUm) return { clearanceUm, verdict: "tight" };
  if (clearanceUm > input.clearanceMaxUm) return { clearanceUm, verdict: "loose" };
  return { clearanceUm, verdict: "in band" };
}
