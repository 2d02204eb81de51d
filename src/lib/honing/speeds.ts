import { HoningInputError, requireNonNegative, requirePositive } from "./errors";
import { CUTTING_SPEED_RANGE_M_PER_MIN, crosshatchAngle, peripheralSpeedMPerMin, strokeRateForAngle } from "./crosshatch";
import type { Crosshatch } from "./crosshatch";
import type { PlanIssue } from "./warnings";
import type { StrokeDrive } from "./types";

export interface MachineInput {
  spindleRpmMin: number;
  spindleRpmMax: number;
  doubleStrokesPerMinMin: number;
  doubleStrokesPerMinMax: number;
  maxStrokeLengthUm: number;
  drive: StrokeDrive;
}

export interface SpeedChoice extends Crosshatch {
  spindleRpm: number;
  doubleStrokesPerMin: number;
  targetAngleDeg: number;
  choiceRule: string;
  issues: PlanIssue[];
}

interface Interval {
  lo: number;
  hi: number;
}

const intersect = (a: Interval, b: Interval): Interval => ({ lo: Math.max(a.lo, b.lo), hi: Math.min(a.hi, b.hi) });
const round1 = (x: number) => Math.round(x * 10) / 10;

/**
 * Spindle speeds that give the target angle inside the machine's stroke-rate range and the
 * 15–150 m/min cutting-speed range [V S1]. f = k·n for a fixed angle, so each limit is a bound on n.
 */
function feasibleRpm(bore: number, stroke: number, angle: number, m: MachineInput): { rpm: Interval; withCutting: Interval } {
  const k = strokeRateForAngle({ boreDiameterUm: bore, spindleRpm: 1, strokeLengthUm: stroke, includedAngleDeg: angle, drive: m.drive });
  const machine: Interval = { lo: m.spindleRpmMin, hi: m.spindleRpmMax };
  const byStrokeRate: Interval = k > 0 ? { lo: m.doubleStrokesPerMinMin / k, hi: m.doubleStrokesPerMinMax / k } : { lo: 0, hi: Infinity };
  const cuttingPerRpm = peripheralSpeedMPerMin(bore, 1) / Math.cos((angle / 2) * (Math.PI / 180));
  const byCutting: Interval = { lo: CUTTING_SPEED_RANGE_M_PER_MIN.min / cuttingPerRpm, hi: CUTTING_SPEED_RANGE_M_PER_MIN.max / cuttingPerRpm };
  const rpm = intersect(machine, byStrokeRate);
  return { rpm, withCutting: intersect(rpm, byCutting) };
}

/** Picks spindle speed and stroke rate for the target crosshatch within the machine's ranges [D, DESIGN §5.5]. */
export function chooseSpeeds(input: {
  boreDiameterUm: number;
  strokeLengthUm: number;
  targetAngleDeg: number;
  machine: MachineInput;
}): SpeedChoice {
  const { boreDiameterUm: bore, strokeLengthUm: stroke, targetAngleDeg: angle, machine: m } = input;
  requirePositive("boreDiameterUm", bore);
  requirePositive("strokeLengthUm", stroke);
  if (!(angle > 0 && angle < 180)) throw new HoningInputError("targetAngleDeg", "must be between 0° and 180°");
  validateMachine(m);
  const { rpm, withCutting } = feasibleRpm(bore, stroke, angle, m);
  const issues: PlanIssue[] = [];
  let spindleRpm: number;
  let doubleStrokesPerMin: number;
  let choiceRule = "middle of the spindle speeds that give the target angle within the machine and 15–150 m/min [D]";
  if (withCutting.lo <= withCutting.hi) {
    spindleRpm = clampRound((withCutting.lo + withCutting.hi) / 2, withCutting);
    doubleStrokesPerMin = clampRate(strokeRateForAngle({ boreDiameterUm: bore, spindleRpm, strokeLengthUm: stroke, includedAngleDeg: angle, drive: m.drive }), m);
  } else if (rpm.lo <= rpm.hi) {
    choiceRule = "target angle kept; no speed in the machine's range gives 15–150 m/min [D]";
    spindleRpm = clampRound((rpm.lo + rpm.hi) / 2, rpm);
    doubleStrokesPerMin = clampRate(strokeRateForAngle({ boreDiameterUm: bore, spindleRpm, strokeLengthUm: stroke, includedAngleDeg: angle, drive: m.drive }), m);
  } else {
    ({ spindleRpm, doubleStrokesPerMin } = closestCorner(bore, stroke, angle, m));
    choiceRule = "machine cannot reach the target angle: closest corner of its speed ranges [D]";
  }
  const result = crosshatchAngle({ boreDiameterUm: bore, spindleRpm, strokeLengthUm: stroke, doubleStrokesPerMin, drive: m.drive });
  if (Math.abs(result.includedAngleDeg - angle) > 1) {
    issues.push({
      code: "SPEED_OUTSIDE_MACHINE", severity: "warning", targetAngleDeg: angle, achievedAngleDeg: result.includedAngleDeg,
      spindleRpm, doubleStrokesPerMin,
      message: `The machine's speed ranges give ${result.includedAngleDeg.toFixed(1)}°, not the target ${angle}°.`,
    });
  }
  const { min, max } = CUTTING_SPEED_RANGE_M_PER_MIN;
  if (result.cuttingSpeed < min || result.cuttingSpeed > max) {
    issues.push({
      code: "CUTTING_SPEED_OUT_OF_RANGE", severity: "warning", cuttingSpeedMPerMin: result.cuttingSpeed, minMPerMin: min, maxMPerMin: max,
      message: `Cutting speed ${result.cuttingSpeed.toFixed(1)} m/min is outside the usual ${min}–${max} m/min [V S1].`,
    });
  }
  return { ...result, spindleRpm, doubleStrokesPerMin, targetAngleDeg: angle, choiceRule, issues };
}

/** The machine's ranges: finite, low ≤ high [D]. */
export function validateMachine(m: MachineInput): void {
  requireNonNegative("machine.spindleRpmMin", m.spindleRpmMin);
  requirePositive("machine.spindleRpmMax", m.spindleRpmMax);
  if (m.spindleRpmMin > m.spindleRpmMax) throw new HoningInputError("machine.spindleRpmMin", "the minimum is above the maximum");
  requireNonNegative("machine.doubleStrokesPerMinMin", m.doubleStrokesPerMinMin);
  requirePositive("machine.doubleStrokesPerMinMax", m.doubleStrokesPerMinMax);
  if (m.doubleStrokesPerMinMin > m.doubleStrokesPerMinMax) throw new HoningInputError("machine.doubleStrokesPerMinMin", "the minimum is above the maximum");
  requirePositive("machine.maxStrokeLengthUm", m.maxStrokeLengthUm);
}

function clampRound(x: number, range: Interval): number {
  const r = Math.round(x);
  if (r >= range.lo && r <= range.hi) return r;
  return x;
}

function clampRate(f: number, m: MachineInput): number {
  return Math.min(m.doubleStrokesPerMinMax, Math.max(m.doubleStrokesPerMinMin, round1(f)));
}

function closestCorner(bore: number, stroke: number, angle: number, m: MachineInput) {
  const corners = [
    { spindleRpm: m.spindleRpmMin, doubleStrokesPerMin: m.doubleStrokesPerMinMax },
    { spindleRpm: m.spindleRpmMax, doubleStrokesPerMin: m.doubleStrokesPerMinMin },
    { spindleRpm: m.spindleRpmMin, doubleStrokesPerMin: m.doubleStrokesPerMinMin },
    { spindleRpm: m.spindleRpmMax, doubleStrokesPerMin: m.doubleStrokesPerMinMax },
  ];
  const error = (c: (typeof corners)[number]) =>
    Math.abs(crosshatchAngle({ boreDiameterUm: bore, strokeLengthUm: stroke, drive: m.drive, ...c }).includedAngleDeg - angle);
  return corners.reduce((best, c) => (error(c) < error(best) ? c : best));
}
