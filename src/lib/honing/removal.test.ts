import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { planHone } from "./plan";
import type { HoneStage } from "./plan-types";
import { blockOf, contactLengthUm, contactShares, levelDepthsUm, removalPerDoubleStroke, ruleBlock } from "./removal";
import { strokeSetup } from "./stroke-setup";
import { demoInput, demoStones } from "./testing/fixtures";

const finish = () => demoStones()[1]!;
const at = (over: Partial<Parameters<typeof removalPerDoubleStroke>[0]> = {}) =>
  removalPerDoubleStroke({ stone: finish(), pressure: 1, angleDeg: 45, boreDiameterUm: 94_000, boreLengthUm: 140_000, ...over });

describe("removal per double stroke (Preston [V S10], kinematics [D])", () => {
  it("equals the table rate at the row's reference conditions", () => {
    const r = at();
    expect(r.removalPerDoubleStrokeUm).toBeCloseTo(0.5, 12);
    expect(r).toMatchObject({ pressureFactor: 1, angleFactor: 1, diameterFactor: 1, strokeFactor: 1, referenceAngleDeg: 45 });
  });
  it("is proportional to pressure: Preston r = k·P·v [V S10]", () => {
    expect(at({ pressure: 2 }).removalPerDoubleStrokeUm).toBeCloseTo(1, 12);
    expect(at({ stone: { ...finish(), learnedMultiplier: 0.8 } }).removalPerDoubleStrokeUm).toBeCloseTo(0.4, 12);
  });
  it("follows the sliding per double stroke, 2·c/sin(θ/2): a flat hatch slides further per stroke [D]", () => {
    // sin(22.5°)/sin(2.5°) = 8.773; sin(22.5°)/sin(89.5°) = 0.3827 [D, arithmetic]
    expect(at({ angleDeg: 5 }).angleFactor).toBeCloseTo(8.773, 3);
    expect(at({ angleDeg: 179 }).angleFactor).toBeCloseTo(0.3827, 4);
    expect(at({ angleDeg: 30 }).removalPerDoubleStrokeUm).toBeGreaterThan(at({ angleDeg: 60 }).removalPerDoubleStrokeUm);
  });
  it("scales with the stones' share of the circumference, D_ref/D, when the row names its diameter [D]", () => {
    const stone = { ...finish(), rate: { ...finish().rate, referenceDiameterUm: 94_000 } };
    expect(at({ stone, boreDiameterUm: 188_000 }).diameterFactor).toBeCloseTo(0.5, 12);
    expect(at({ boreDiameterUm: 188_000 }).diameterFactor).toBe(1); // no reference diameter: not scaled
  });
  it("does not rise for a stone longer than its stroke: a level is covered at most for the stroke [D]", () => {
    const long = { ...finish(), stoneLengthUm: 130_000 };
    expect(at({ stone: long, boreLengthUm: 140_000 }).strokeFactor).toBeLessThanOrEqual(1);
  });
  it("is monotonic in pressure over any inputs", () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 50, noNaN: true }), fc.double({ min: 0, max: 50, noNaN: true }), fc.double({ min: 1, max: 179, noNaN: true }), (p, extra, angle) => {
      expect(at({ pressure: p + extra, angleDeg: angle }).removalPerDoubleStrokeUm).toBeGreaterThanOrEqual(at({ pressure: p, angleDeg: angle }).removalPerDoubleStrokeUm);
    }), { numRuns: 500 });
  });
});

describe("where the stone touches along the bore [D]", () => {
  it("the rule set-up (⅓ overtravel) reaches every level in full, so it removes evenly [C, trade-facts §5]", () => {
    const depths = levelDepthsUm(3, 140_000);
    expect(depths).toEqual([10_000, 70_000, 130_000]);
    expect(contactShares(ruleBlock(140_000, 75_000), 140_000, depths)).toEqual([1, 1, 1]);
  });
  it("a bottom with little room stays tight: the bottom level gets a fraction of the rate [C, trade-facts §5]", () => {
    const setup = strokeSetup({ boreLengthUm: 140_000, stoneLengthUm: 75_000, maxBottomOvertravelUm: 5_000 });
    const [top, middle, bottom] = contactShares(blockOf(setup), 140_000, levelDepthsUm(3, 140_000));
    expect(top).toBe(1);
    expect(middle).toBe(1);
    expect(bottom!).toBeLessThan(1);
  });
  it("more overtravel than the rule opens the ends (bell mouth) [C, trade-facts §5]", () => {
    const setup = strokeSetup({ boreLengthUm: 140_000, stoneLengthUm: 75_000, overtravelFraction: 0.5 });
    const [top, middle] = contactShares(blockOf(setup), 140_000, levelDepthsUm(3, 140_000));
    expect(top!).toBeGreaterThan(1);
    expect(middle).toBe(1);
  });
  it("contact is never negative and never more than the stone or the stroke", () => {
    fc.assert(fc.property(fc.integer({ min: -100_000, max: 100_000 }), fc.integer({ min: 1, max: 300_000 }), fc.integer({ min: 1_000, max: 200_000 }), fc.integer({ min: 0, max: 300_000 }), (top, stroke, stone, z) => {
      const c = contactLengthUm({ topAtUpperUm: top, strokeLengthUm: stroke, stoneLengthUm: stone }, z);
      expect(c).toBeGreaterThanOrEqual(0);
      expect(c).toBeLessThanOrEqual(Math.min(stroke, stone) + 1e-9);
    }), { numRuns: 500 });
  });
});

describe("plans follow the kinematics", () => {
  const finishOf = (angle: number) => planHone(demoInput({ targetCrosshatchDeg: angle })).stages.find((s): s is HoneStage => s.kind === "finish")!;
  it("a flatter crosshatch needs fewer strokes for the same stock, a steeper one more", () => {
    expect(finishOf(30).strokes.nominal).toBeLessThan(finishOf(45).strokes.nominal);
    expect(finishOf(60).strokes.nominal).toBeGreaterThan(finishOf(45).strokes.nominal);
  });
  it("expected sizes come from whole strokes × rate", () => {
    const s = finishOf(45);
    const removed = s.expectedDiameterAfterUm - s.diameterBeforeUm;
    expect(removed).toBeCloseTo(s.strokes.nominal * s.removal.removalPerDoubleStrokeUm, 9);
  });
  it("an extreme pressure is flagged, and one stroke bigger than the stage is a warning", () => {
    const plan = planHone(demoInput({ pressures: { finish: 200 } }));
    const codes = plan.issues.map((i) => i.code);
    expect(codes).toContain("PRESSURE_OUTSIDE_RATE");
    expect(codes).toContain("STROKE_TOO_COARSE");
    expect(plan.canRelease).toBe(false); // one 100 µm stroke takes the bore out of the band
    expect(codes).toContain("LEVEL_OUTSIDE_BAND");
  });
  it("a crosshatch far from the row's reference angle is flagged", () => {
    expect(planHone(demoInput({ targetCrosshatchDeg: 80 })).issues.map((i) => i.code)).toContain("ANGLE_OUTSIDE_RATE");
  });
});
