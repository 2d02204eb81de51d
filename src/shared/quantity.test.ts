import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parsePressure, parseWithUnit } from "./quantity";

describe("parsePressure", () => {
  it("reads bar, kPa, MPa and psi into bar", () => {
    expect(parsePressure("9 bar", "bar")).toEqual({ ok: true, value: 9 });
    expect(parsePressure("900 kPa", "bar")).toEqual({ ok: true, value: 9 });
    expect(parsePressure("0.9 MPa", "bar")).toEqual({ ok: true, value: 9 });
    // 2 MPa → 290.08 psi, trade-facts §11.22 [D]; so 290.075 psi ≈ 20 bar
    const psi = parsePressure("130 psi", "bar");
    expect(psi.ok && psi.value).toBeCloseTo(8.963, 3);
    expect(parsePressure("7", "bar")).toEqual({ ok: true, value: 7 });
  });
  it("refuses what cannot convert, with the reason", () => {
    expect(parsePressure("9 bar", "dial")).toMatchObject({ ok: false });
    expect(parsePressure("130 psi", "N")).toMatchObject({ ok: false, error: expect.stringContaining("area") });
    expect(parsePressure("9 bananas", "bar")).toMatchObject({ ok: false, error: expect.stringContaining("Unknown unit") });
    expect(parsePressure("9,5 bar", "bar")).toMatchObject({ ok: false, error: "Use a point for decimals." });
    expect(parsePressure("-2 bar", "bar")).toMatchObject({ ok: false });
  });
  it("never throws and never answers a non-finite number on any text", () => {
    fc.assert(fc.property(fc.string(), fc.constantFrom("bar" as const, "dial" as const, "N" as const), (text, unit) => {
      const r = parsePressure(text, unit);
      if (r.ok) expect(Number.isFinite(r.value)).toBe(true);
    }), { numRuns: 1000 });
  });
});

describe("parseWithUnit", () => {
  it("reads 250 rpm and 45° and bare numbers", () => {
    expect(parseWithUnit("250 rpm", ["rpm"], "spindle speed")).toEqual({ ok: true, value: 250 });
    expect(parseWithUnit("45°", ["°", "deg"], "angle")).toEqual({ ok: true, value: 45 });
    expect(parseWithUnit("45", ["°"], "angle")).toEqual({ ok: true, value: 45 });
    expect(parseWithUnit("45 bar", ["°"], "angle")).toMatchObject({ ok: false });
  });
});
