import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { medianAbsoluteError } from "./prediction";
import { histogram, normalCdf, oneIn, outsideShare } from "./capability";

describe("median absolute error", () => {
  it("is the middle error, or the mean of the two middle ones", () => {
    expect(medianAbsoluteError([])).toBeNull();
    expect(medianAbsoluteError([{ predicted: 10, actual: 12 }, { predicted: 5, actual: 5 }, { predicted: 9, actual: 3 }])).toBe(2);
    expect(medianAbsoluteError([{ predicted: 1, actual: 2 }, { predicted: 1, actual: 4 }])).toBe(2);
  });
  it("never negative and at most the largest error (property)", () => {
    const pair = fc.record({ predicted: fc.double({ min: 0, max: 1e4, noNaN: true }), actual: fc.double({ min: 0, max: 1e4, noNaN: true }) });
    fc.assert(fc.property(fc.array(pair, { minLength: 1, maxLength: 40 }), (pairs) => {
      const m = medianAbsoluteError(pairs)!;
      expect(m).toBeGreaterThanOrEqual(0);
      expect(m).toBeLessThanOrEqual(Math.max(...pairs.map((p) => Math.abs(p.predicted - p.actual))) + 1e-9);
    }), { seed: 13, numRuns: 300 });
  });
});

describe("the normal model behind the capability sentence", () => {
  it("matches the standard normal table", () => {
    // Standard normal table values, e.g. NIST/SEMATECH e-Handbook §1.3.6.7.1 (from memory): Φ(−3) = 0.00135, Φ(−1.96) = 0.0250, Φ(0) = 0.5.
    expect(normalCdf(-3)).toBeCloseTo(0.00135, 5);
    expect(normalCdf(-1.96)).toBeCloseTo(0.025, 4);
    expect(normalCdf(0)).toBeCloseTo(0.5, 7);
  });
  it("a centred process at Cpk 1 leaves about 0.27 % outside: 1 bore in 370", () => {
    // ±3σ holds 99.73 % of a normal distribution [standard normal table, from memory].
    const share = outsideShare(0, 1, -3, 3);
    expect(share).toBeCloseTo(0.0027, 4);
    expect(oneIn(share)).toBe("about 1 bore in 370");
    expect(oneIn(0)).toBe("practically none");
  });
  it("is symmetric and monotone (property)", () => {
    fc.assert(fc.property(fc.double({ min: -8, max: 8, noNaN: true }), fc.double({ min: 0, max: 4, noNaN: true }), (z, d) => {
      expect(normalCdf(z) + normalCdf(-z)).toBeCloseTo(1, 6);
      expect(normalCdf(z + d)).toBeGreaterThanOrEqual(normalCdf(z) - 1e-7);
    }), { seed: 13, numRuns: 300 });
  });
});

describe("histogram", () => {
  it("counts every value once in bins of the given width", () => {
    const bins = histogram([-1.2, -0.4, 0, 0.2, 0.3, 1.9], 0.5);
    expect(bins.reduce((a, b) => a + b.count, 0)).toBe(6);
    expect(bins[0]!.fromUm).toBe(-1.5);
    expect(bins.every((b) => Math.abs(b.toUm - b.fromUm - 0.5) < 1e-12)).toBe(true);
  });
  it("keeps every value with wider bins past the bin limit (property)", () => {
    fc.assert(fc.property(fc.array(fc.double({ min: -50, max: 50, noNaN: true }), { minLength: 1, maxLength: 60 }), (values) => {
      const bins = histogram(values, 0.5, 24);
      expect(bins.length).toBeLessThanOrEqual(24);
      expect(bins.reduce((a, b) => a + b.count, 0)).toBe(values.length);
    }), { seed: 13, numRuns: 300 });
  });
});
