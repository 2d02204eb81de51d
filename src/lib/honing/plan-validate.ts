import { HoningInputError, requireNonNegative, requirePositive } from "./errors";
import type { PlanHoneInput } from "./plan-types";
import { MAX_OVERTRAVEL_FRACTION } from "./stroke-setup";

function requireRange(field: string, lo: number, hi: number): void {
  requireNonNegative(`${field}Min`, lo);
  requirePositive(`${field}Max`, hi);
  if (lo > hi) throw new HoningInputError(`${field}Min`, "the minimum is above the maximum");
}

/** Physical sanity of the plan options; the server's zod schema should refuse these first. */
export function validatePlanOptions(input: PlanHoneInput): void {
  requirePositive("boreLengthUm", input.boreLengthUm);
  const { machine } = input;
  requireRange("machine.spindleRpm", machine.spindleRpmMin, machine.spindleRpmMax);
  requireRange("machine.doubleStrokesPerMin", machine.doubleStrokesPerMinMin, machine.doubleStrokesPerMinMax);
  requirePositive("machine.maxStrokeLengthUm", machine.maxStrokeLengthUm);
  const fraction = input.checkpointFraction ?? 0.75;
  if (!(fraction > 0 && fraction < 1)) throw new HoningInputError("checkpointFraction", "must be between 0 and 1");
  const angle = input.targetCrosshatchDeg ?? 45;
  if (!(angle > 0 && angle < 180)) throw new HoningInputError("targetCrosshatchDeg", "must be between 0° and 180°");
  for (const [role, pressure] of Object.entries(input.pressures ?? {})) requirePositive(`pressures.${role}`, pressure);
  const optionalLengths = ["plateauStockUm", "taperToleranceUm", "outOfRoundToleranceUm", "maxHoningStockUm", "checkpointMinStockUm", "bottomClearanceUm"] as const;
  for (const key of optionalLengths) if (input[key] !== undefined) requireNonNegative(key, input[key]);
  if (input.dwellStrokeLengthUm !== undefined) requirePositive("dwellStrokeLengthUm", input.dwellStrokeLengthUm);
  if (input.boring) requireNonNegative("boring.marginUm", input.boring.marginUm);
  if (input.boring?.surfaceRzUm !== undefined) requireNonNegative("boring.surfaceRzUm", input.boring.surfaceRzUm);
  if (input.boring?.onlyAboveStockUm !== undefined) requireNonNegative("boring.onlyAboveStockUm", input.boring.onlyAboveStockUm);
  if (input.overtravelFraction !== undefined && !(input.overtravelFraction >= 0 && input.overtravelFraction <= MAX_OVERTRAVEL_FRACTION)) {
    throw new HoningInputError("overtravelFraction", `must be from 0 to ${MAX_OVERTRAVEL_FRACTION} of the stone`);
  }
  const share = input.maxStrokeShareOfStock;
  if (share !== undefined && !(share > 0 && share <= 1)) throw new HoningInputError("maxStrokeShareOfStock", "must be above 0 and at most 1");
}
