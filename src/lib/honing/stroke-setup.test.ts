import { describe, expect, it } from "vitest";
import { strokeSetup } from "./stroke-setup";

describe("strokeSetup", () => {
  it("bore 140 mm, stone 75 mm, overtravel 25 mm → head stroke 115 mm", () => {
    // trade-facts §11.26 [C rule 1/3 stone, D arithmetic]
    const s = strokeSetup({ boreLengthUm: 140_000, stoneLengthUm: 75_000 });
    expect(s.overtravelTopUm).toBe(25_000);
    expect(s.overtravelBottomUm).toBe(25_000);
    expect(s.strokeLengthUm).toBe(115_000);
    expect(s.warnings).toEqual([]);
    expect(s.rule).toContain("[C]");
  });
  it("gives the stops as distances from the deck", () => {
    // trade-facts §11.26 geometry [D]
    const s = strokeSetup({ boreLengthUm: 140_000, stoneLengthUm: 75_000 });
    expect(s.upperReversal).toEqual({ stoneTopFromDeckUm: -25_000, stoneBottomFromDeckUm: 50_000 });
    expect(s.lowerReversal).toEqual({ stoneTopFromDeckUm: 90_000, stoneBottomFromDeckUm: 165_000 });
    expect(s.lowerReversal.stoneTopFromDeckUm - s.upperReversal.stoneTopFromDeckUm).toBe(s.strokeLengthUm);
  });
  it("a limited bottom shortens the stroke and warns that the bottom stays tight", () => {
    // trade-facts §5 [C]: obstructed bottom → under-honed end
    const s = strokeSetup({ boreLengthUm: 140_000, stoneLengthUm: 75_000, maxBottomOvertravelUm: 10_000 });
    expect(s.overtravelBottomUm).toBe(10_000);
    expect(s.strokeLengthUm).toBe(100_000);
    expect(s.warnings[0]).toMatchObject({ code: "BOTTOM_OVERTRAVEL_LIMITED", overtravelBottomUm: 10_000, wantedUm: 25_000 });
  });
  it("a 1/4 overtravel gives S = L_bore + 2·o − L_stone", () => {
    // trade-facts §5 (1/4–1/3 quoted) [C], formula [D]
    expect(strokeSetup({ boreLengthUm: 140_000, stoneLengthUm: 80_000, overtravelFraction: 0.25 }).strokeLengthUm).toBe(100_000);
  });
  it("errors when the stone is longer than the bore plus overtravel", () => {
    const s = strokeSetup({ boreLengthUm: 20_000, stoneLengthUm: 75_000, maxBottomOvertravelUm: 0 });
    expect(s.strokeLengthUm).toBe(0);
    expect(s.warnings.map((w) => w.code)).toContain("STONE_LONGER_THAN_TRAVEL");
  });
});
