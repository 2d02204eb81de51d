import { HoningInputError, requireNonNegative, requirePositive } from "./errors";

export interface ChooseOversizeInput {
  /** One entry per cylinder: all its readings (levels × directions), µm. */
  boresUm: ReadonlyArray<readonly number[]>;
  /** Oversize steps above the standard bore, e.g. [0, 250, 500, 750, 1000] (0 = standard). */
  stepsUm: readonly number[];
  /** Standard (nominal) bore the steps add to. */
  standardBoreUm: number;
  honingAllowanceUm: number;
  /** Thinnest wall found by the ultrasonic check, measured at the current bore. */
  wallThicknessUm?: number;
  minWallUm?: number;
}

export type ChooseOversizeResult =
  | {
      ok: true;
      stepUm: number;
      finishedBoreUm: number;
      boreToUm: number;
      worstCylinderIndex: number;
      worstReadingUm: number;
      /** Wall left at the thinnest point, assuming it sits at the smallest reading (the most metal removed). */
      wallAfterUm: number | null;
      rule: string;
    }
  | {
      ok: false;
      reason: "NO_STEP_CLEANS_UP" | "WALL_TOO_THIN";
      worstCylinderIndex: number;
      worstReadingUm: number;
      /** Largest step tried and, for WALL_TOO_THIN, the wall it would leave. */
      largestStepUm: number | null;
      wallAfterUm: number | null;
      message: string;
    };

export const OVERSIZE_RULE =
  "smallest step whose bore-to (standard + step − honing allowance) reaches the worst bore's largest reading; all cylinders one oversize [V S17]";

function worstBore(boresUm: ChooseOversizeInput["boresUm"]) {
  let worstCylinderIndex = -1;
  let worstReadingUm = -Infinity;
  boresUm.forEach((readings, i) => {
    if (readings.length === 0) throw new HoningInputError(`boresUm[${i}]`, "has no readings");
    const max = Math.max(...readings);
    if (max > worstReadingUm) [worstCylinderIndex, worstReadingUm] = [i, max];
  });
  return { worstCylinderIndex, worstReadingUm };
}

/** The smallest oversize that cleans up the worst bore within the minimum wall [V S17, S28; DESIGN §5.6]. */
export function chooseOversize(input: ChooseOversizeInput): ChooseOversizeResult {
  requirePositive("standardBoreUm", input.standardBoreUm);
  requireNonNegative("honingAllowanceUm", input.honingAllowanceUm);
  if (input.boresUm.length === 0) throw new HoningInputError("boresUm", "at least one bore is needed");
  input.boresUm.forEach((readings, i) => readings.forEach((r, k) => requirePositive(`boresUm[${i}][${k}]`, r)));
  input.stepsUm.forEach((s, i) => requireNonNegative(`stepsUm[${i}]`, s));
  if (input.wallThicknessUm !== undefined) requirePositive("wallThicknessUm", input.wallThicknessUm);
  if (input.minWallUm !== undefined) requireNonNegative("minWallUm", input.minWallUm);
  const { worstCylinderIndex, worstReadingUm } = worstBore(input.boresUm);
  const smallestReading = Math.min(...input.boresUm.flat());
  const steps = [...input.stepsUm].sort((a, b) => a - b);
  const step = steps.find((s) => input.standardBoreUm + s - input.honingAllowanceUm >= worstReadingUm);
  const base = { worstCylinderIndex, worstReadingUm };
  if (step === undefined) {
    return { ok: false, reason: "NO_STEP_CLEANS_UP", ...base, largestStepUm: steps.at(-1) ?? null, wallAfterUm: null,
      message: "No listed oversize cleans up the worst bore: sleeve it or find a larger step." };
  }
  const finishedBoreUm = input.standardBoreUm + step;
  const wallAfterUm = input.wallThicknessUm === undefined ? null : input.wallThicknessUm - (finishedBoreUm - smallestReading) / 2;
  if (wallAfterUm !== null && input.minWallUm !== undefined && wallAfterUm < input.minWallUm) {
    return { ok: false, reason: "WALL_TOO_THIN", ...base, largestStepUm: step, wallAfterUm,
      message: "The smallest oversize that cleans up would leave the wall thinner than the minimum." };
  }
  return { ok: true, stepUm: step, finishedBoreUm, boreToUm: finishedBoreUm - input.honingAllowanceUm, ...base, wallAfterUm, rule: OVERSIZE_RULE };
}
