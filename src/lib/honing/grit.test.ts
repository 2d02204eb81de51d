import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { GRIT_NUMBERS, GRIT_SCALES, formatGrit, gritGrainSizeUm, gritRow, parseGrit, validGritNumbers } from "./grit";
import type { GritScale } from "./grit";

describe("grit grain sizes", () => {
  it("JIS #400 30.0, #600 20.0, #240 57.0, #1000 11.5 µm", () => {
    // trade-facts §11.12 [V S11] JIS R 6001:1987
    expect(gritRow({ scale: "JIS", number: 400 })).toMatchObject({ grainSizeUm: 30, toleranceUm: 2, tag: "V" });
    expect(gritGrainSizeUm({ scale: "JIS", number: 600 })).toBe(20);
    expect(gritGrainSizeUm({ scale: "JIS", number: 240 })).toBe(57);
    expect(gritGrainSizeUm({ scale: "JIS", number: 1000 })).toBe(11.5);
  });
  it("FEPA F80 → 178.3 µm, F220 → 63.0 µm (band geometric midpoints)", () => {
    // trade-facts §11.13 [D, S12]
    expect(gritGrainSizeUm({ scale: "FEPA-F", number: 80 })).toBeCloseTo(178.3, 1);
    expect(gritGrainSizeUm({ scale: "FEPA-F", number: 220 })).toBeCloseTo(63.0, 1);
  });
  it("D151 → 150/125 µm, US mesh 100/120; D91 → 90/75, 170/200", () => {
    // trade-facts §11.14 [V S14]
    expect(gritRow({ scale: "D", number: 151 })).toMatchObject({ bandUm: [125, 150], usMesh: "100/120" });
    expect(gritRow({ scale: "B", number: 91 })).toMatchObject({ bandUm: [75, 90], usMesh: "170/200" });
  });
  it("P and CAMI: P400 35 µm [M], CAMI 400 ~23.6 µm [M]; P80 201, CAMI 80 192 [V S13]", () => {
    // trade-facts §11.15 / §3.4 [V S13; M marked in the table]
    expect(gritRow({ scale: "FEPA-P", number: 400 })).toMatchObject({ grainSizeUm: 35, tag: "M" });
    expect(gritRow({ scale: "ANSI", number: 400 })).toMatchObject({ grainSizeUm: 23.6, tag: "M" });
    expect(gritRow({ scale: "FEPA-P", number: 80 })).toMatchObject({ grainSizeUm: 201, tag: "V" });
    expect(gritRow({ scale: "ANSI", number: 80 })).toMatchObject({ grainSizeUm: 192, tag: "V" });
  });
  it("grain size falls as the number rises (D/B: rises with the number) on every scale", () => {
    for (const { id } of GRIT_SCALES) {
      const sizes = validGritNumbers(id).map((n) => gritGrainSizeUm({ scale: id, number: n })!);
      const sorted = [...sizes].sort((a, b) => (id === "D" || id === "B" ? a - b : b - a));
      expect(sizes).toEqual(sorted);
    }
  });
});

describe("parseGrit", () => {
  it('"400 grit" with no scale is a validation error, not a size', () => {
    // trade-facts §11.15 [C/§3.4]
    for (const text of ["400", "#400", "400 grit", " 400 "]) {
      const r = parseGrit(text);
      expect(r).toMatchObject({ ok: false, code: "GRIT_SCALE_MISSING" });
    }
  });
  it.each<[string, GritScale, number]>([
    ["JIS #400", "JIS", 400], ["jis400", "JIS", 400], ["#600 (JIS)", "JIS", 600], ["F400", "FEPA-F", 400], ["FEPA F220", "FEPA-F", 220],
    ["P400", "FEPA-P", 400], ["FEPA-P 80", "FEPA-P", 80], ["ANSI 400", "ANSI", 400], ["CAMI 220", "ANSI", 220], ["ANSI/CAMI 600", "ANSI", 600],
    ["D54", "D", 54], ["B 151", "B", 151],
  ])("reads %j", (text, scale, number) => {
    expect(parseGrit(text)).toEqual({ ok: true, grit: { scale, number } });
  });
  it("refuses numbers the scale does not have and unreadable text", () => {
    expect(parseGrit("JIS #401")).toMatchObject({ ok: false, code: "GRIT_NOT_IN_SCALE" });
    expect(parseGrit("coarse")).toMatchObject({ ok: false, code: "GRIT_UNREADABLE" });
  });
  it("round-trips formatGrit for every listed number", () => {
    for (const { id } of GRIT_SCALES) for (const number of GRIT_NUMBERS[id]) expect(parseGrit(formatGrit({ scale: id, number }))).toEqual({ ok: true, grit: { scale: id, number } });
  });
  it("never throws on arbitrary strings (fast-check)", () => {
    fc.assert(fc.property(fc.string(), (text) => {
      const r = parseGrit(text);
      expect(typeof r.ok).toBe("boolean");
    }), { numRuns: 2000 });
  });
});
