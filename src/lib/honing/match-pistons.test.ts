import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { matchPistons } from "./match-pistons";

function permutations(n: number, k: number): number[][] {
  if (k === 0) return [[]];
  const out: number[][] = [];
  for (const rest of permutations(n, k - 1)) for (let i = 0; i < n; i++) if (!rest.includes(i)) out.push([...rest, i]);
  return out;
}

/** Brute force: the smallest spread over every assignment with all clearances in band, or null. */
function bruteForce(pistons: number[], bores: number[], min: number, max: number): number | null {
  let best: number | null = null;
  for (const perm of permutations(pistons.length, bores.length)) {
    const c = bores.map((b, i) => b - pistons[perm[i]!]!);
    if (c.some((x) => x < min || x > max)) continue;
    const spread = Math.max(...c) - Math.min(...c);
    if (best === null || spread < best) best = spread;
  }
  return best;
}

const ids = (prefix: string, values: number[]) => values.map((diameterUm, i) => ({ id: `${prefix}${i + 1}`, diameterUm }));

describe("matchPistons", () => {
  it("pairs four pistons to four bores inside 0.020–0.040 mm with the least spread", () => {
    // band: 2000 MY 2.0 L I4, trade-facts §6.2 [V S17]; diameters invented demo values
    const r = matchPistons({ pistons: ids("p", [84_770, 84_772, 84_768, 84_775]), bores: ids("b", [84_800, 84_805, 84_797, 84_803]), clearanceMinUm: 20, clearanceMaxUm: 40 });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // sorted pairing (largest bore to largest piston) gives clearances 29, 30, 30, 31
    expect(r.spreadUm).toBe(2);
    for (const p of r.pairs) expect(p.clearanceUm).toBeGreaterThanOrEqual(20);
  });
  it("says which bore cannot fit", () => {
    const r = matchPistons({ pistons: ids("p", [84_770, 84_771]), bores: ids("b", [84_800, 84_900]), clearanceMinUm: 20, clearanceMaxUm: 40 });
    expect(r).toMatchObject({ ok: false, reason: "NO_FIT", boresWithoutAnyFit: ["b2"], unmatchedBoreIds: ["b2"], largestMatchedCount: 1 });
  });
  it("says when there are fewer pistons than bores, and leaves spare pistons out", () => {
    expect(matchPistons({ pistons: ids("p", [1]), bores: ids("b", [30, 31]), clearanceMinUm: 20, clearanceMaxUm: 40 })).toMatchObject({ ok: false, reason: "NOT_ENOUGH_PISTONS" });
    const r = matchPistons({ pistons: ids("p", [0, 10, 5]), bores: ids("b", [30]), clearanceMinUm: 20, clearanceMaxUm: 40 });
    // one bore: every in-band piston gives spread 0; the tie goes to the clearance nearest the band middle (30)
    expect(r).toMatchObject({ ok: true, pairs: [{ boreId: "b1", pistonId: "p1", clearanceUm: 30 }] });
    if (r.ok) expect(r.sparePistonIds.sort()).toEqual(["p2", "p3"]);
  });
  it("agrees with brute force on small sets (fast-check)", () => {
    const arb = fc.integer({ min: 1, max: 6 }).chain((n) =>
      fc.record({
        pistons: fc.array(fc.integer({ min: 0, max: 40 }), { minLength: n, maxLength: n + 1 }),
        bores: fc.array(fc.integer({ min: 20, max: 80 }), { minLength: n, maxLength: n }),
        min: fc.integer({ min: 10, max: 30 }),
        width: fc.integer({ min: 0, max: 30 }),
      }),
    );
    fc.assert(fc.property(arb, ({ pistons, bores, min, width }) => {
      const expected = bruteForce(pistons, bores, min, min + width);
      const r = matchPistons({ pistons: ids("p", pistons), bores: ids("b", bores), clearanceMinUm: min, clearanceMaxUm: min + width });
      expect(r.ok).toBe(expected !== null);
      if (!r.ok) return;
      expect(r.spreadUm).toBe(expected);
      expect(new Set(r.pairs.map((p) => p.pistonId)).size).toBe(bores.length);
      for (const p of r.pairs) {
        expect(p.clearanceUm).toBeGreaterThanOrEqual(min);
        expect(p.clearanceUm).toBeLessThanOrEqual(min + width);
      }
    }), { numRuns: 400 });
  });
});
