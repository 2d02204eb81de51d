import { describe, expect, it } from "vitest";
import { cleanupStockOf, estimateStrokes, planCheckpoint, remainingStrokes, removalPerDoubleStroke } from "./strokes";
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
  it("removal scales with pressure (Preston) and equals the table at reference conditions", () => {
    // Preston r = k·P·v, trade-facts §3.1 [V S10]
    const stone = demoStones()[1]!;
    const atRef = removalPerDoubleStroke({ stone, pressure: 1, strokeLengthUm: 115_000 });
    expect(atRef.removalPerDoubleStrokeUm).toBeCloseTo(0.5, 12);
    expect(atRef.coverageFactor).toBeCloseTo(1, 12);
    expect(removalPerDoubleStroke({ stone, pressure: 2, strokeLengthUm: 115_000 }).removalPerDoubleStrokeUm).toBeCloseTo(1, 12);
    expect(removalPerDoubleStroke({ stone: { ...stone, learnedMultiplier: 0.8 }, pressure: 1, strokeLengthUm: 115_000 }).removalPerDoubleStrokeUm).toBeCloseTo(0.4, 12);
  });
  it("a checkpoint falls at 75 % and before the fast end of the range", () => {
    // DESIGN §5.3: stop at about 70–80 % [C]
    const cp = planCheckpoint({ strokes: { nominal: 40, low: 32, high: 54, rule: "" }, fraction: 0.75, diameterBeforeUm: 1000, removalUm: 0.5 });
    expect(cp).toMatchObject({ afterStrokes: 30, expectedDiameterUm: 1015 });
    const wide = planCheckpoint({ strokes: { nominal: 40, low: 20, high: 80, rule: "" }, fraction: 0.75, diameterBeforeUm: 0, removalUm: 0.5 });
    expect(wide?.afterStrokes).toBe(19);
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
