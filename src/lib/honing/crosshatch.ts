import { HoningInputError, requireNonNegative, requirePositive } from "./errors";
import type { StrokeDrive } from "./types";

const DEG = Math.PI / 180;

/** Honing cutting speeds are typically 15–150 m/min [V S1]. */
export const CUTTING_SPEED_RANGE_M_PER_MIN = { min: 15, max: 150 } as const;
/** Default target: 45° included crosshatch [V S17 service manuals]. */
export const DEFAULT_CROSSHATCH_DEG = 45;

export const CROSSHATCH_RULE =
  "v_t = π·d·n; v_a = 2·S·f (constant) or π·S·f (crank, mid-stroke peak); θ = 2·atan(v_a/v_t) [D, standard kinematics]";

export interface CrosshatchInput {
  boreDiameterUm: number;
  spindleRpm: number;
  strokeLengthUm: number;
  doubleStrokesPerMin: number;
  drive?: StrokeDrive;
}

export interface Crosshatch {
  includedAngleDeg: number;
  /** Scratch angle to the horizontal (circumferential) direction, θ/2. */
  scratchToHorizontalDeg: number;
  /** m/min */
  peripheralSpeed: number;
  /** m/min: mean for a constant-speed drive, the mid-stroke peak for a crank drive. */
  axialSpeed: number;
  /** m/min: √(v_t² + v_a²). */
  cuttingSpeed: number;
  drive: StrokeDrive;
  rule: string;
}

/** Peripheral speed v_t = π·d·n in m/min [D, standard kinematics]. */
export function peripheralSpeedMPerMin(boreDiameterUm: number, spindleRpm: number): number {
  requireNonNegative("boreDiameterUm", boreDiameterUm);
  requireNonNegative("spindleRpm", spindleRpm);
  return Math.PI * (boreDiameterUm / 1e6) * spindleRpm;
}

/** Axial speed per double stroke rate: 2·S·f mean (constant drive) or π·S·f mid-stroke peak (crank) [D]. */
export function axialSpeedMPerMin(strokeLengthUm: number, doubleStrokesPerMin: number, drive: StrokeDrive): number {
  requireNonNegative("strokeLengthUm", strokeLengthUm);
  requireNonNegative("doubleStrokesPerMin", doubleStrokesPerMin);
  const factor = drive === "crank" ? Math.PI : 2;
  return factor * (strokeLengthUm / 1e6) * doubleStrokesPerMin;
}

/** Included crosshatch angle θ = 2·atan(v_a / v_t) [D, standard kinematics, trade-facts §1.2]. */
export function crosshatchAngle(input: CrosshatchInput): Crosshatch {
  requirePositive("boreDiameterUm", input.boreDiameterUm);
  requirePositive("spindleRpm", input.spindleRpm);
  requireNonNegative("strokeLengthUm", input.strokeLengthUm);
  requireNonNegative("doubleStrokesPerMin", input.doubleStrokesPerMin);
  const drive = input.drive ?? "constant";
  const peripheralSpeed = peripheralSpeedMPerMin(input.boreDiameterUm, input.spindleRpm);
  const axialSpeed = axialSpeedMPerMin(input.strokeLengthUm, input.doubleStrokesPerMin, drive);
  const scratch = Math.atan2(axialSpeed, peripheralSpeed) / DEG;
  return {
    includedAngleDeg: 2 * scratch,
    scratchToHorizontalDeg: scratch,
    peripheralSpeed,
    axialSpeed,
    cuttingSpeed: Math.hypot(peripheralSpeed, axialSpeed),
    drive,
    rule: CROSSHATCH_RULE,
  };
}

export interface StrokeRateInput {
  boreDiameterUm: number;
  spindleRpm: number;
  strokeLengthUm: number;
  includedAngleDeg: number;
  drive?: StrokeDrive;
}

/** Double strokes per minute for a target included angle: v_a = v_t·tan(θ/2), f = v_a/(2·S) or v_a/(π·S) [D]. */
export function strokeRateForAngle(input: StrokeRateInput): number {
  requirePositive("boreDiameterUm", input.boreDiameterUm);
  requireNonNegative("spindleRpm", input.spindleRpm);
  requirePositive("strokeLengthUm", input.strokeLengthUm);
  if (!(input.includedAngleDeg >= 0 && input.includedAngleDeg < 180)) {
    throw new HoningInputError("includedAngleDeg", "must be from 0° to below 180°");
  }
  const axial = peripheralSpeedMPerMin(input.boreDiameterUm, input.spindleRpm) * Math.tan((input.includedAngleDeg / 2) * DEG);
  return axial / axialSpeedMPerMin(input.strokeLengthUm, 1, input.drive ?? "constant");
}
