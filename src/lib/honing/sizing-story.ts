import { honingAllowance, type HoningAllowance, type HoningAllowanceInput } from "./allowance";
import { chooseOversize, type ChooseOversizeResult } from "./oversize";

/**
 * One sizing story for the intake summary, the wizard and the quick plan: the oversize, the bore-to
 * size and the honing allowance all come from the same stone sequence and shop settings [DESIGN §5.1, §5.6].
 */
export interface JobSizingInput {
  /** Per cylinder, its readings before machining (as received or after boring) only: later sets never move the oversize. */
  boresUm: ReadonlyArray<readonly number[]>;
  standardBoreUm: number;
  stepsUm: readonly number[];
  allowance: HoningAllowanceInput;
  wallThicknessUm?: number;
  minWallUm?: number;
}

export interface JobSizing {
  allowance: HoningAllowance;
  oversize: ChooseOversizeResult;
}

export function sizeJob(input: JobSizingInput): JobSizing {
  const allowance = honingAllowance(input.allowance);
  const oversize = chooseOversize({
    boresUm: input.boresUm, stepsUm: input.stepsUm, standardBoreUm: input.standardBoreUm, honingAllowanceUm: allowance.allowanceUm,
    ...(input.wallThicknessUm !== undefined && { wallThicknessUm: input.wallThicknessUm }),
    ...(input.minWallUm !== undefined && { minWallUm: input.minWallUm }),
  });
  return { allowance, oversize };
}

/** "Bore first" is on when the honing stock is above the shop's threshold [C, trade-facts §3.3]. */
export const boreFirst = (honingStockUm: number, thresholdUm: number): boolean => honingStockUm > thresholdUm;
