import { describe, expect, it } from "vitest";
import { capabilityVerdict, processCapability } from "./capability";

describe("process capability", () => {
  it("matches the handbook's worked example: USL 20, LSL 8, μ 16, σ 2 gives Cp 1.0 and Cpk 0.667", () => {
    // NIST/SEMATECH e-Handbook of Statistical Methods, §6.1.6 "What is Process Capability?" (from memory of the example's figures)
    // Two bores at 16 ± √2 have mean 16 and sample σ 2: ((√2)² + (√2)²) / (2 − 1) = 4.
    const values = [16 - Math.SQRT2, 16 + Math.SQRT2];
    const c = processCapability(values, 8, 20);
    expect(c.meanUm).toBeCloseTo(16, 9);
    expect(c.sdUm).toBeCloseTo(2, 9);
    expect(c.cp).toBeCloseTo(1, 9);
    expect(c.cpk).toBeCloseTo(2 / 3, 9);
  });

  it("has no index with fewer than two bores or no spread, and says so", () => {
    expect(processCapability([5], 0, 10).cpk).toBeNull();
    expect(processCapability([5, 5, 5], 0, 10).cp).toBeNull();
    expect(capabilityVerdict(processCapability([], 0, 10))).toMatch(/Too few/);
  });

  it("a centred process has Cpk = Cp; a shifted one less", () => {
    const centred = processCapability([48, 50, 52, 49, 51], 40, 60);
    expect(centred.cpk).toBeCloseTo(centred.cp!, 9);
    const shifted = processCapability([54, 56, 58, 55, 57], 40, 60);
    expect(shifted.cpk!).toBeLessThan(shifted.cp!);
    expect(capabilityVerdict(shifted)).toMatch(/outside the band/);
  });

  it("refuses an upside-down band", () => {
    expect(() => processCapability([1, 2], 10, 5)).toThrow(/lower/);
  });
});
