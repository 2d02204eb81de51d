import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { divideRounded, formatMinor, invoiceTotals, lineNetMinor, parseMajor, BillingInputError } from "./index";

// Check values are worked by hand with the rule in totals.ts (common practice: round half away from
// zero per line, tax per rate on the summed nets).
describe("line nets", () => {
  it("rounds half away from zero to a minor unit", () => {
    expect(lineNetMinor({ quantityMilli: 1500, unitPriceMinor: 3333, taxRateBp: 0 })).toBe(5000); // 4999.5 → 5000
    expect(lineNetMinor({ quantityMilli: 500, unitPriceMinor: 1, taxRateBp: 0 })).toBe(1); // 0.5 → 1
    expect(lineNetMinor({ quantityMilli: -500, unitPriceMinor: 1, taxRateBp: 0 })).toBe(-1); // -0.5 → -1
    expect(lineNetMinor({ quantityMilli: 333, unitPriceMinor: 1, taxRateBp: 0 })).toBe(0); // 0.333 → 0
  });

  it("refuses fractions of a minor unit and quantities out of range", () => {
    expect(() => lineNetMinor({ quantityMilli: 1, unitPriceMinor: 0.5, taxRateBp: 0 })).toThrow(BillingInputError);
    expect(() => lineNetMinor({ quantityMilli: 1e12, unitPriceMinor: 1, taxRateBp: 0 })).toThrow(/quantityMilli/);
    expect(() => invoiceTotals([{ quantityMilli: 1000, unitPriceMinor: 1, taxRateBp: 10_001 }])).toThrow(/taxRateBp/);
  });
});

describe("a prepared invoice", () => {
  it("taxes each rate on its summed nets, then adds", () => {
    // 4 cylinders honed at 45.00, 1.25 h machine time at 72.50, parts at 12.99 with no tax.
    const t = invoiceTotals([
      { quantityMilli: 4000, unitPriceMinor: 4500, taxRateBp: 2000 },
      { quantityMilli: 1250, unitPriceMinor: 7250, taxRateBp: 2000 },
      { quantityMilli: 1000, unitPriceMinor: 1299, taxRateBp: 0 },
    ]);
    expect(t.lines.map((l) => l.netMinor)).toEqual([18000, 9063, 1299]); // 9062.5 → 9063
    expect(t.netMinor).toBe(28362);
    expect(t.taxes).toEqual([
      { taxRateBp: 0, netMinor: 1299, taxMinor: 0 },
      { taxRateBp: 2000, netMinor: 27063, taxMinor: 5413 }, // 5412.6 → 5413
    ]);
    expect(t.totalMinor).toBe(33775);
  });

  it("is empty and zero without lines", () => {
    expect(invoiceTotals([])).toMatchObject({ netMinor: 0, taxMinor: 0, totalMinor: 0, taxes: [] });
  });
});

const line = fc.record({
  quantityMilli: fc.integer({ min: -100_000, max: 100_000_000 }),
  unitPriceMinor: fc.integer({ min: -10_000_000, max: 10_000_000 }),
  taxRateBp: fc.constantFrom(0, 500, 700, 1900, 2000, 2500, 10_000),
});

describe("properties", () => {
  it("total = Σ line nets + Σ taxes, every figure a whole minor unit", () => {
    fc.assert(
      fc.property(fc.array(line, { maxLength: 40 }), (lines) => {
        const t = invoiceTotals(lines);
        expect(t.netMinor).toBe(t.lines.reduce((s, l) => s + l.netMinor, 0));
        expect(t.netMinor).toBe(t.taxes.reduce((s, g) => s + g.netMinor, 0));
        expect(t.totalMinor).toBe(t.netMinor + t.taxMinor);
        for (const n of [t.netMinor, t.taxMinor, t.totalMinor, ...t.lines.map((l) => l.netMinor)]) expect(Number.isSafeInteger(n)).toBe(true);
      }),
    );
  });

  it("the order of the lines changes nothing (no float drift)", () => {
    fc.assert(
      fc.property(fc.array(line, { maxLength: 30 }), (lines) => {
        expect(invoiceTotals([...lines].reverse()).totalMinor).toBe(invoiceTotals(lines).totalMinor);
      }),
    );
  });

  it("each line is within half a minor unit of the exact product", () => {
    fc.assert(
      fc.property(line, (l) => {
        const exact = BigInt(l.quantityMilli) * BigInt(l.unitPriceMinor); // in thousandths of a minor unit
        const err = BigInt(lineNetMinor(l)) * 1000n - exact;
        expect(err <= 500n && err >= -500n).toBe(true);
      }),
    );
  });

  it("rounding is symmetric: a credit mirrors its charge", () => {
    fc.assert(fc.property(fc.bigInt({ min: -(10n ** 15n), max: 10n ** 15n }), fc.bigInt({ min: 1n, max: 10n ** 6n }), (n, d) => {
      expect(divideRounded(-n, d)).toBe(-divideRounded(n, d));
    }));
  });

  it("parseMajor and formatMinor round-trip", () => {
    fc.assert(fc.property(fc.integer({ min: -999_999_999, max: 999_999_999 }), (minor) => {
      expect(parseMajor(formatMinor(minor))).toBe(minor);
    }));
    expect(parseMajor("12.345")).toBeNull();
    expect(parseMajor("12,5")).toBe(1250);
  });
});
