import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { HoningInputError } from "./errors";
import { checkClearance, commonClearanceBand, finishedBore } from "./sizing";

describe("finishedBore", () => {
  it("piston 85.470 + clearance 0.030 → hone to 85.500 mm", () => {
    // trade-facts §11.16 [D, formula V S17 service manuals: piston + clearance]
    const r = finishedBore({ pistonDiameterUm: 85_470, clearanceMinUm: 30, clearanceMaxUm: 30 });
    expect(r.targetUm).toBe(85_500);
    // §11.16: honing margin 0.020 mm → bore-to 85.480 mm
    expect(r.targetUm - 20).toBe(85_480);
    expect(r.rule).toContain("[V S17]");
  });
  it("forged coated-skirt piston 93.92 mm with about 0.004 in clearance finishes at about 94.02 mm", () => {
    // common practice (practitioner account, issue 3)
    const r = finishedBore({ pistonDiameterUm: 93_920, clearanceMinUm: 88.9, clearanceMaxUm: 114.3, clearanceTargetUm: 101.6 });
    expect(r.targetUm / 1000).toBeCloseTo(94.02, 2);
  });
  it("target defaults to the middle of the band; the allowance moves the target only, the band stays the maker's", () => {
    // OEM 2000 2.0 L I4 band 0.020–0.040 mm, trade-facts §6.2 [V S17]
    const r = finishedBore({ pistonDiameterUm: 84_770, clearanceMinUm: 20, clearanceMaxUm: 40, performanceAllowanceUm: 5 });
    expect(r).toMatchObject({ targetUm: 84_805, minUm: 84_790, maxUm: 84_810, performanceAllowanceUm: 5, clearanceTargetUm: 30, bandWideningUm: 0 });
  });
  it("an allowance past the band is refused unless the machinist widens the band explicitly", () => {
    // issue 10: +30 µm on a 40–60 band must not silently accept 70–90
    const base = { pistonDiameterUm: 93_920, clearanceMinUm: 40, clearanceMaxUm: 60, performanceAllowanceUm: 30 };
    expect(() => finishedBore(base)).toThrow(/performanceAllowanceUm/);
    const widened = finishedBore({ ...base, bandWideningUm: 30 });
    expect(widened).toMatchObject({ targetUm: 94_000, minUm: 93_960, maxUm: 94_010, bandWideningUm: 30 });
    expect(widened.rule).toContain("widened");
  });
  it("allows a negative lower clearance (coated skirt interference)", () => {
    // 2007 4.4 L V8 coated skirt −0.016 to +0.031 mm, trade-facts §6.2 [V S17]
    const r = finishedBore({ pistonDiameterUm: 92_000, clearanceMinUm: -16, clearanceMaxUm: 31 });
    expect(r.minUm).toBe(91_984);
    expect(r.targetUm).toBe(92_007.5);
  });
  it("refuses contradictory bands", () => {
    expect(() => finishedBore({ pistonDiameterUm: 90_000, clearanceMinUm: 40, clearanceMaxUm: 20 })).toThrow(HoningInputError);
    expect(() => finishedBore({ pistonDiameterUm: 90_000, clearanceMinUm: 20, clearanceMaxUm: 40, clearanceTargetUm: 50 })).toThrow(HoningInputError);
    expect(() => finishedBore({ pistonDiameterUm: Number.NaN, clearanceMinUm: 20, clearanceMaxUm: 40 })).toThrow(HoningInputError);
  });
});

describe("checkClearance", () => {
  it("spec 0.020–0.040: bore 84.800 / piston 84.770 passes, piston 84.750 is loose", () => {
    // trade-facts §11.18 [D; spec V S17]
    const band = { clearanceMinUm: 20, clearanceMaxUm: 40 };
    expect(checkClearance({ boreDiameterUm: 84_800, pistonDiameterUm: 84_770, ...band })).toEqual({ clearanceUm: 30, verdict: "in band" });
    expect(checkClearance({ boreDiameterUm: 84_800, pistonDiameterUm: 84_750, ...band })).toEqual({ clearanceUm: 50, verdict: "loose" });
    expect(checkClearance({ boreDiameterUm: 84_800, pistonDiameterUm: 84_790, ...band }).verdict).toBe("tight");
  });
  it("refuses NaN and an upside-down band instead of calling them in band or tight", () => {
    expect(() => checkClearance({ boreDiameterUm: 84_800, pistonDiameterUm: 84_770, clearanceMinUm: Number.NaN, clearanceMaxUm: 40 })).toThrow(HoningInputError);
    expect(() => checkClearance({ boreDiameterUm: Number.NaN, pistonDiameterUm: 84_770, clearanceMinUm: 20, clearanceMaxUm: 40 })).toThrow(HoningInputError);
    expect(() => checkClearance({ boreDiameterUm: 84_800, pistonDiameterUm: 84_770, clearanceMinUm: 40, clearanceMaxUm: 20 })).toThrow(/clearanceMinUm/);
  });
});

describe("commonClearanceBand", () => {
  it("is the overlap of every piston's band", () => {
    fc.assert(fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 200 }), fc.integer({ min: 0, max: 200 })), { minLength: 1, maxLength: 12 }), (pairs) => {
      const bands = pairs.map(([a, b]) => ({ clearanceMinUm: Math.min(a, b), clearanceMaxUm: Math.max(a, b) }));
      const band = commonClearanceBand(bands);
      const lo = Math.max(...bands.map((b) => b.clearanceMinUm));
      const hi = Math.min(...bands.map((b) => b.clearanceMaxUm));
      if (lo > hi) expect(band).toBeNull();
      else {
        expect(band).toEqual({ clearanceMinUm: lo, clearanceMaxUm: hi });
        for (const b of bands) expect(b.clearanceMinUm <= band!.clearanceMinUm && band!.clearanceMaxUm <= b.clearanceMaxUm).toBe(true);
      }
    }));
  });

  it("is null without pistons", () => {
    expect(commonClearanceBand([])).toBeNull();
  });
});
