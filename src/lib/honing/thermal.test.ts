import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { diameterAt20C, EXPANSION_UM_PER_M_K, levelsAt20C, temperatureSettled } from "./thermal";

describe("warm bores corrected to 20 °C (ISO 1)", () => {
  it("a grey-iron bore of 94 mm, 10 K above the gauge, reads about 10 µm large", () => {
    // issue 12 and handbook range for grey iron α ≈ 10–12 µm/m·K [from memory]: 11e-6 × 10 K × 94 mm ≈ 10.3 µm.
    const corrected = diameterAt20C(94_030, { blockC: 30, gaugeC: 20 }, EXPANSION_UM_PER_M_K.grey_iron);
    expect(94_030 - corrected).toBeCloseTo(10.34, 1);
  });
  it("a bore and a gauge of the same expansion at the same temperature read true", () => {
    expect(diameterAt20C(94_000, { blockC: 26, gaugeC: 26 }, EXPANSION_UM_PER_M_K.gauge_steel)).toBeCloseTo(94_000, 6);
  });
  it("a warmer block always reads larger than it is at the gauge's temperature, by about α·ΔT·D", () => {
    fc.assert(fc.property(fc.double({ min: 50_000, max: 150_000, noNaN: true }), fc.double({ min: 0.1, max: 40, noNaN: true }), (d, dt) => {
      const alpha = EXPANSION_UM_PER_M_K.steel_liner;
      const corrected = diameterAt20C(d, { blockC: 20 + dt, gaugeC: 20 }, alpha);
      expect(corrected).toBeLessThan(d);
      expect(d - corrected).toBeCloseTo(alpha * 1e-6 * dt * d, 0);
    }), { numRuns: 200 });
  });
  it("holds the verdict while the block and the gauge differ by more than the set difference", () => {
    expect(temperatureSettled({ blockC: 24, gaugeC: 20 })).toEqual({ settled: false, differenceK: 4 });
    expect(temperatureSettled({ blockC: 21.5, gaugeC: 20 }).settled).toBe(true);
    expect(temperatureSettled({ blockC: 24, gaugeC: 20 }, 5).settled).toBe(true);
  });
  it("corrects both directions of every level", () => {
    const [l] = levelsAt20C([{ name: "top", aUm: 94_030, bUm: 94_020 }], { blockC: 30, gaugeC: 20 }, 11);
    expect(l!.aUm).toBeLessThan(94_030);
    expect(l!.bUm).toBeLessThan(94_020);
    expect(l!.name).toBe("top");
  });
  it("refuses a temperature no shop floor has", () => {
    expect(() => diameterAt20C(94_000, { blockC: 400, gaugeC: 20 }, 11)).toThrow(/blockC/);
  });
});
