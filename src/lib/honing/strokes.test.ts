import { describe, expect, it } from "vitest";
import { HoningInputError } from "./errors";
import { cleanupStockOf, estimateStrokes, rateUncertainty, remainingStrokes } from "./strokes";
import { demoStones } from "./testing/fixtures";

describe("strokes", () => {
  it("0.020 mm diameter stock at 0.5 µm per cycle → 40 double strokes", () => {
    // trade-facts §11.28 [D]
    expect(estimateStrokes(20, 0.5, 0).nominal).toBe(40);
  });
  it("the range follows the rate's uncertainty", () => {
    const e = estimateStrokes(20, 0.5, 0.25);
    expect(e).toMatchObject({ nominal: 40, low: 32, high: 54 });
  });
  it("refuses a zero or non-finite removal instead of planning Infinity strokes", () => {
    expect(() => estimateStrokes(20, 0, 0.2)).toThrow(HoningInputError);
    expect(() => estimateStrokes(Number.NaN, 0.5, 0.2)).toThrow(/stockUm/);
  });
  it("re-estimates the remaining strokes from a checkpoint reading", () => {
    // Preston/learned rate, trade-facts §11.27 [D]: same rate, remaining stock in proportion
    expect(remainingStrokes({ strokesDone: 30, removedSoFarUm: 12, stockLeftUm: 8 })).toEqual({ strokes: 20, observedRemovalUm: 0.4 });
  });
  it("clean-up stock: 2 sides × 3 × Rz by default, the row's figure when given", () => {
    // DESIGN §5.3 [C]
    expect(cleanupStockOf({ rzUm: 7 }).cleanupUm).toBe(42);
    expect(cleanupStockOf({ rzUm: 7, cleanupStockUm: 30 }).cleanupUm).toBe(30);
  });
  it("the coarse stones stop about 1.5–2 thou under size before the change to finer stones", () => {
    // common practice (practitioner account, issue 3): demo coarse Rz 7 µm → 42 µm clean-up for the finer stones
    const underThou = cleanupStockOf(demoStones()[0]!.rate).cleanupUm / 25.4;
    expect(underThou).toBeGreaterThanOrEqual(1.5);
    expect(underThou).toBeLessThanOrEqual(2);
  });
});

describe("rateUncertainty", () => {
  it("is the table's uncertainty until runs give a learned interval, then the learned one", () => {
    expect(rateUncertainty({ rate: { uncertaintyFraction: 0.25 } })).toBe(0.25);
    expect(rateUncertainty({ rate: { uncertaintyFraction: 0.25 }, learnedUncertaintyFraction: 0.06 })).toBe(0.06);
  });
});
