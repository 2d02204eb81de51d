import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { METRIC, displayUnits, fromDeck, heightLeft } from "@/shared/units";

describe("fromDeck", () => {
  it("says above or below the deck, never a signed figure", () => {
    expect(fromDeck(-33_300, "mm")).toBe("33.3 mm above the deck");
    expect(fromDeck(110_000, "mm")).toBe("110.0 mm below the deck");
    expect(fromDeck(-25_400, "in")).toBe("1.000 in above the deck");
    expect(fromDeck(0, "mm")).toBe("at the deck");
    expect(fromDeck(null, "mm")).toBe("—");
  });
  it("holds for any stop", () => {
    fc.assert(fc.property(fc.integer({ min: -500_000, max: 500_000 }).filter((n) => n !== 0), fc.constantFrom("mm" as const, "in" as const), (um, unit) => {
      const text = fromDeck(um, unit);
      expect(text).not.toMatch(/[−-]/);
      expect(text.endsWith(um < 0 ? "above the deck" : "below the deck")).toBe(true);
    }));
  });
});

describe("heightLeft", () => {
  it("reads as what is left and the limit, not a ratio", () => {
    expect(heightLeft(3_000, 2_000, METRIC)).toBe("3.00 mm left (limit 2.00 mm)");
    expect(heightLeft(3_000, 2_000, displayUnits("inch"))).toMatch(/^0\.1181 in left \(limit 0\.0787 in\)$/);
  });
});
