import { describe, expect, it } from "vitest";
import { crosshatchAngle, peripheralSpeedMPerMin, strokeRateForAngle } from "./crosshatch";
import { chooseSpeeds } from "./speeds";

const DEG_TOL = 1; // toBeCloseTo digits → 0.05
const SPEED = 2; // → 0.005 m/min

describe("crosshatch kinematics, trade-facts §11", () => {
  it("§11.1 v_t(94 mm, 250 rpm) = 73.827 m/min", () => {
    // trade-facts §11.1 [D] standard kinematics
    expect(peripheralSpeedMPerMin(94_000, 250)).toBeCloseTo(73.827, SPEED);
  });
  it("§11.2 axial speed for 30/45/60° at 94 mm, 250 rpm", () => {
    // trade-facts §11.2 [D] standard kinematics: v_a = v_t·tan(θ/2); with S = 1 m, f = v_a / 2
    const va = (deg: number) => 2 * strokeRateForAngle({ boreDiameterUm: 94_000, spindleRpm: 250, strokeLengthUm: 1e6, includedAngleDeg: deg });
    expect(va(45)).toBeCloseTo(30.58, SPEED - 1);
    expect(va(60)).toBeCloseTo(42.624, SPEED);
    expect(va(30)).toBeCloseTo(19.782, SPEED);
  });
  it("§11.3 L = 100 mm, 45° → 152.9 double strokes/min", () => {
    // trade-facts §11.3 [D] standard kinematics
    expect(strokeRateForAngle({ boreDiameterUm: 94_000, spindleRpm: 250, strokeLengthUm: 100_000, includedAngleDeg: 45 })).toBeCloseTo(152.9, 1);
  });
  it("§11.4 L = 120 mm, 100 /min → v_a 24.0, θ 36.02°, 18.01° to horizontal", () => {
    // trade-facts §11.4 [D] standard kinematics
    const r = crosshatchAngle({ boreDiameterUm: 94_000, spindleRpm: 250, strokeLengthUm: 120_000, doubleStrokesPerMin: 100 });
    expect(r.axialSpeed).toBeCloseTo(24.0, SPEED);
    expect(r.includedAngleDeg).toBeCloseTo(36.02, DEG_TOL);
    expect(r.scratchToHorizontalDeg).toBeCloseTo(18.01, DEG_TOL);
    expect(90 - r.scratchToHorizontalDeg).toBeCloseTo(71.99, DEG_TOL);
  });
  it("§11.5 101.6 mm, 150 rpm, 100 mm, 60 /min → 28.14° mean, 42.98° crank mid-stroke", () => {
    // trade-facts §11.5 [D] standard kinematics; crank peak π·S·f
    const base = { boreDiameterUm: 101_600, spindleRpm: 150, strokeLengthUm: 100_000, doubleStrokesPerMin: 60 };
    expect(crosshatchAngle(base).includedAngleDeg).toBeCloseTo(28.14, DEG_TOL);
    const crank = crosshatchAngle({ ...base, drive: "crank" });
    expect(crank.includedAngleDeg).toBeCloseTo(42.98, DEG_TOL);
    expect(crank.axialSpeed).toBeCloseTo(18.85, SPEED - 1);
    expect(strokeRateForAngle({ ...base, includedAngleDeg: crank.includedAngleDeg, drive: "crank" })).toBeCloseTo(60, 6);
  });
  it("§11.6 4.000 in, 200 rpm, 45° → v_t 2513.27 in/min, v_a 1041.03 in/min", () => {
    // trade-facts §11.6 [D] standard kinematics (converted: 1 m/min = 39.3701 in/min)
    const inPerMin = 1000 / 25.4;
    expect(peripheralSpeedMPerMin(101_600, 200) * inPerMin).toBeCloseTo(2513.27, SPEED);
    const f = strokeRateForAngle({ boreDiameterUm: 101_600, spindleRpm: 200, strokeLengthUm: 1e6, includedAngleDeg: 45 });
    expect(2 * f * inPerMin).toBeCloseTo(1041.03, SPEED);
  });
  it("§11.7 v_a = v_t → 90°, v_a = 0 → 0°", () => {
    // trade-facts §11.7 [D] edge cases
    const vt = peripheralSpeedMPerMin(94_000, 250);
    const f = vt / (2 * 1); // S = 1 m
    expect(crosshatchAngle({ boreDiameterUm: 94_000, spindleRpm: 250, strokeLengthUm: 1e6, doubleStrokesPerMin: f }).includedAngleDeg).toBeCloseTo(90, 6);
    expect(crosshatchAngle({ boreDiameterUm: 94_000, spindleRpm: 250, strokeLengthUm: 1e6, doubleStrokesPerMin: 0 }).includedAngleDeg).toBe(0);
  });
  it("§11.8 cutting speed at 45° (94 mm, 250 rpm) = 79.91 m/min, inside 15–150", () => {
    // trade-facts §11.8 [D; range V S1]
    const f = strokeRateForAngle({ boreDiameterUm: 94_000, spindleRpm: 250, strokeLengthUm: 100_000, includedAngleDeg: 45 });
    const r = crosshatchAngle({ boreDiameterUm: 94_000, spindleRpm: 250, strokeLengthUm: 100_000, doubleStrokesPerMin: f });
    expect(r.cuttingSpeed).toBeCloseTo(79.91, SPEED - 1);
    expect(r.includedAngleDeg).toBeCloseTo(45, 6);
  });
});

describe("chooseSpeeds", () => {
  const machine = { spindleRpmMin: 80, spindleRpmMax: 400, doubleStrokesPerMinMin: 20, doubleStrokesPerMinMax: 200, maxStrokeLengthUm: 250_000, drive: "constant" as const };
  it("hits 45° (default target, V S17) inside the machine's ranges", () => {
    const s = chooseSpeeds({ boreDiameterUm: 94_000, strokeLengthUm: 115_000, targetAngleDeg: 45, machine });
    expect(s.includedAngleDeg).toBeCloseTo(45, 0);
    expect(s.spindleRpm).toBeGreaterThanOrEqual(80);
    expect(s.spindleRpm).toBeLessThanOrEqual(400);
    expect(s.doubleStrokesPerMin).toBeLessThanOrEqual(200);
    expect(s.cuttingSpeed).toBeGreaterThanOrEqual(15);
    expect(s.cuttingSpeed).toBeLessThanOrEqual(150);
    expect(s.issues).toEqual([]);
  });
  it("says when the machine cannot reach the angle", () => {
    const slow = { ...machine, doubleStrokesPerMinMax: 10, doubleStrokesPerMinMin: 5 };
    const s = chooseSpeeds({ boreDiameterUm: 94_000, strokeLengthUm: 115_000, targetAngleDeg: 45, machine: slow });
    expect(s.issues.map((i) => i.code)).toContain("SPEED_OUTSIDE_MACHINE");
    expect(s.includedAngleDeg).toBeLessThan(45);
  });
  it("flags a cutting speed outside 15–150 m/min", () => {
    // range trade-facts §1.1 [V S1]
    const fast = { ...machine, spindleRpmMin: 600, spindleRpmMax: 700, doubleStrokesPerMinMax: 2000 };
    const s = chooseSpeeds({ boreDiameterUm: 94_000, strokeLengthUm: 115_000, targetAngleDeg: 45, machine: fast });
    const issue = s.issues.find((i) => i.code === "CUTTING_SPEED_OUT_OF_RANGE");
    expect(issue).toMatchObject({ minMPerMin: 15, maxMPerMin: 150 });
  });
});
