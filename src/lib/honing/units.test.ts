import fc from "fast-check";
import { unit } from "mathjs";
import { describe, expect, it } from "vitest";
import { formatLength, fromUm, parseLength, toUm } from "./units";
import type { LengthUnit } from "./types";

const um = (text: string, unit: LengthUnit = "mm") => {
  const r = parseLength(text, unit);
  if (!r.ok) throw new Error(r.error);
  return r.um;
};

describe("unit conversions: check values", () => {
  it("1 in = 25.4 mm exactly", () => {
    // trade-facts §9 [V S24] international yard 1959
    expect(toUm(1, "in")).toBe(25_400);
  });
  it("0.0005 in = 12.7 µm; 4.030 in = 102.362 mm; 1 thou = 25.4 µm", () => {
    // trade-facts §11.21 [V S24, D]
    expect(toUm(0.0005, "in")).toBe(12.7);
    expect(toUm(4.03, "in")).toBe(102_362);
    expect(toUm(1, "thou")).toBe(25.4);
  });
  it("16 µin Ra = 0.4064 µm", () => {
    // trade-facts §11.21 [D]
    expect(toUm(16e-6, "in")).toBeCloseTo(0.4064, 10);
  });
  it("0.07 mm of stock on diameter is just under 3 thou (2.76 thou)", () => {
    // common practice (practitioner account, issue 3)
    expect(formatLength(70, "thou")).toBe("2.76 thou");
    expect(fromUm(70, "thou")).toBeLessThan(3);
  });
  it("4.000 in + 0.020 in oversize = 102.108 mm", () => {
    // trade-facts §11.20 [D]
    expect(toUm(4.02, "in")).toBe(102_108);
  });
});

describe("parseLength", () => {
  it("reads every unit the design lists", () => {
    // DESIGN §5 examples
    expect(um("93.92 mm")).toBe(93_920);
    expect(um("3.6977 in")).toBe(93_921.58);
    expect(um("2.8 thou")).toBe(71.12);
    expect(um("70 µm")).toBe(70);
    expect(um("70 um")).toBe(70);
    expect(um("70μm")).toBe(70);
    expect(um('3.6977"')).toBe(93_921.58);
    expect(um("3.6977 inch")).toBe(93_921.58);
    expect(um("2.8 mil")).toBe(71.12);
    expect(um("93.92MM")).toBe(93_920);
  });
  it("reads a bare number in the user's unit", () => {
    expect(um("93.92", "mm")).toBe(93_920);
    expect(um("3.7", "in")).toBe(93_980);
    expect(um("2.76", "thou")).toBeCloseTo(70.104, 9);
    expect(um(".5", "um")).toBe(0.5);
  });
  it.each([
    ["", "Enter a length"],
    ["abc", "not a length"],
    ["-0.5 mm", "negative"],
    ["93,92", "point for decimals"],
    ["12 furlongs", "Unknown unit"],
    ["3000 mm", "more than 2 m"],
    ["1e3", "Unknown unit"],
    ["Infinity", "not a length"],
    ["NaN", "not a length"],
  ])("refuses %j with a clear message", (text, fragment) => {
    const r = parseLength(text, "mm");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toContain(fragment);
  });
  it("never throws and never returns a negative or non-finite length (fast-check)", () => {
    fc.assert(
      fc.property(fc.string(), fc.constantFrom<LengthUnit>("mm", "in", "thou", "um"), (text, u) => {
        const r = parseLength(text, u);
        if (r.ok) expect(Number.isFinite(r.um) && r.um >= 0).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });
  it("round-trips formatLength output", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1_999_999_999 }), (milliUm) => {
        const value = milliUm / 1000;
        expect(um(formatLength(value, "mm", { decimals: 6 }))).toBeCloseTo(value, 6);
      }),
    );
  });
});

describe("conversions agree with mathjs's unit system (reference library)", () => {
  const mathName: Record<LengthUnit, string> = { mm: "mm", in: "in", thou: "mil", um: "um" };
  const units: LengthUnit[] = ["mm", "in", "thou", "um"];
  it("toUm matches mathjs for random values in every unit", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 2000, noNaN: true }), fc.constantFrom(...units), (value, u) => {
        const reference = unit(value, mathName[u]).toNumber("um");
        expect(toUm(value, u)).toBeCloseTo(reference, 6);
      }),
      { numRuns: 1000 },
    );
  });
  it("fromUm matches mathjs for random µm values", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 2_000_000, noNaN: true }), fc.constantFrom(...units), (value, u) => {
        const reference = unit(value, "um").toNumber(mathName[u]);
        expect(fromUm(value, u)).toBeCloseTo(reference, 6);
      }),
      { numRuns: 1000 },
    );
  });
  it("parsed text matches mathjs", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 7_800 }), fc.constantFrom(...units), (n, u) => {
        const text = `${(n / 100).toFixed(2)} ${u}`;
        expect(um(text)).toBeCloseTo(unit(n / 100, mathName[u]).toNumber("um"), 6);
      }),
      { numRuns: 500 },
    );
  });
});

describe("formatLength", () => {
  it("uses the design's default decimals and labels", () => {
    // DESIGN §5: mm 3 decimals, inch 4, thou for stock, µm for stock and roughness
    expect(formatLength(94_020, "mm")).toBe("94.020 mm");
    expect(formatLength(102_362, "in")).toBe("4.0300 in");
    expect(formatLength(25.4, "thou")).toBe("1.00 thou");
    expect(formatLength(0.4064, "um", { decimals: 2 })).toBe("0.41 µm");
    expect(formatLength(-0.0001, "mm")).toBe("0.000 mm");
  });
});
