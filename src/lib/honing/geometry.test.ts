import { describe, expect, it } from "vitest";
import { boreGeometry, geometryVerdict } from "./geometry";

// trade-facts §11.19 [D; limits C / V S17]: readings in mm, thrust (A) / pin (B)
const check19 = [
  { name: "top", aUm: 85_512, bUm: 85_498 },
  { name: "middle", aUm: 85_505, bUm: 85_500 },
  { name: "bottom", aUm: 85_501, bUm: 85_499 },
];

describe("boreGeometry", () => {
  it("§11.19: out-of-round 0.014 at the top, taper 0.011 in thrust", () => {
    const g = boreGeometry({ levels: check19 });
    expect(g.outOfRoundUm).toBe(14);
    expect(g.outOfRoundLevel).toBe("top");
    expect(g.taperUm).toBe(11);
    expect(g.taperDirection).toBe("A");
    expect(g.taperByDirection).toEqual({ A: 11, B: 2 });
    expect(g.minUm).toBe(85_498);
    expect(g.maxUm).toBe(85_512);
    expect(g.spreadUm).toBe(14);
    expect(g.minAt).toMatchObject({ level: "top", direction: "B" });
    expect(g.tightEnd).toBe("bottom");
  });
  it("§11.19: fails a 0.0127 mm rebuild limit, passes a 0.050 mm service limit", () => {
    const g = boreGeometry({ levels: check19 });
    // rebuild target 0.0005 in [C]; service limit 0.050 mm [V S17]
    expect(geometryVerdict(g, { taperUm: 12.7, outOfRoundUm: 12.7 }).ok).toBe(false);
    expect(geometryVerdict(g, { taperUm: 50, outOfRoundUm: 50 }).ok).toBe(true);
  });
  it("a finished bore is the same size at top, middle and bottom and again at 90°", () => {
    // common practice (practitioner account, issue 3)
    const g = boreGeometry({ levels: ["top", "middle", "bottom"].map((name) => ({ name, aUm: 94_020, bUm: 94_020 })) });
    expect(g).toMatchObject({ taperUm: 0, outOfRoundUm: 0, spreadUm: 0, tightEnd: null });
    expect(geometryVerdict(g).ok).toBe(true);
  });
  it("finds a tight top and a single level has no tight end", () => {
    const g = boreGeometry({ levels: [{ name: "top", aUm: 100, bUm: 100 }, { name: "bottom", aUm: 110, bUm: 110 }] });
    expect(g.tightEnd).toBe("top");
    expect(boreGeometry({ levels: [{ name: "only", aUm: 100, bUm: 104 }] }).tightEnd).toBeNull();
  });
  it("refuses an empty or non-positive reading set", () => {
    expect(() => boreGeometry({ levels: [] })).toThrow();
    expect(() => boreGeometry({ levels: [{ name: "top", aUm: 0, bUm: 1 }] })).toThrow();
  });
});
