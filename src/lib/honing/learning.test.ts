import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { emptyLearnedState, learnMultiplier, multiplierFromState, updateLearnedState, type LearningRun } from "./learning";

// Invented run histories: the rate table says 0.5 µm per stroke, and the runs remove q times that.
const MODEL = 0.5;
const at = (i: number) => new Date(Date.UTC(2026, 0, 1) + i * 3_600_000).toISOString();
const run = (q: number, i: number, strokes = 40): LearningRun => ({ stockRemovedUm: q * MODEL * strokes, strokes, modelRatePerStrokeUm: MODEL, loggedAt: at(i) });
const history = (qs: number[]) => qs.map((q, i) => run(q, i));
/** A fixed pseudo-random ±spread around 1, the same every run of the test. */
const noise = (i: number, spread: number) => 1 + spread * Math.sin(i * 12.9898 + 78.233);

describe("learned rate multiplier", () => {
  it("with no runs it is the table's, with the table's uncertainty as its interval", () => {
    const m = learnMultiplier([]);
    expect(m.multiplier).toBe(1);
    expect(m.runsUsed).toBe(0);
    expect(m.low).toBeLessThan(1 / 1.25 + 0.1);
    expect(m.high).toBeGreaterThan(1.25 - 0.1);
  });

  it("one run moves it part of the way, and many consistent runs all the way, with a narrowing interval", () => {
    const one = learnMultiplier(history([0.8]));
    expect(one.multiplier).toBeLessThan(1);
    expect(one.multiplier).toBeGreaterThan(0.8);
    const widths = [1, 3, 10].map((n) => { const m = learnMultiplier(history(Array(n).fill(0.8))); return m.high - m.low; });
    expect(widths[1]!).toBeLessThan(widths[0]!);
    expect(widths[2]!).toBeLessThan(widths[1]!);
    expect(learnMultiplier(history(Array(20).fill(0.8))).multiplier).toBeCloseTo(0.8, 3);
  });

  it("replaying the runs one at a time gives exactly the batch answer, in time order", () => {
    const arb = fc.array(fc.record({ q: fc.double({ min: 0.2, max: 5, noNaN: true }), strokes: fc.integer({ min: 1, max: 2000 }), hour: fc.integer({ min: 0, max: 10_000 }) }), { maxLength: 60 });
    fc.assert(fc.property(arb, (rows) => {
      const runs = rows.map((r) => ({ ...run(r.q, r.hour, r.strokes) }));
      const ordered = [...runs].sort((a, b) => Date.parse(a.loggedAt) - Date.parse(b.loggedAt));
      const replayed = multiplierFromState(ordered.reduce(updateLearnedState, emptyLearnedState()));
      expect(learnMultiplier(runs)).toEqual(replayed);
    }));
  });

  it("is positive and finite for any valid history, its interval around it", () => {
    const arb = fc.array(fc.double({ min: 1e-3, max: 1e3, noNaN: true }), { maxLength: 80 });
    fc.assert(fc.property(arb, (qs) => {
      const m = learnMultiplier(history(qs));
      for (const v of [m.multiplier, m.low, m.high]) expect(Number.isFinite(v) && v > 0).toBe(true);
      expect(m.low).toBeLessThanOrEqual(m.multiplier);
      expect(m.high).toBeGreaterThanOrEqual(m.multiplier);
      expect(m.runsUsed + m.runsIgnored).toBe(qs.length);
    }));
  });

  it("one gross outlier (a misread gauge: twice the stock) moves a settled multiplier less than 5 %", () => {
    const settled = Array.from({ length: 15 }, (_, i) => 0.9 * noise(i, 0.05));
    const before = learnMultiplier(history(settled)).multiplier;
    for (const gross of [2, 0.4, 3]) {
      const after = learnMultiplier(history([...settled, 0.9 * gross]));
      expect(Math.abs(after.multiplier / before - 1)).toBeLessThan(0.05);
      expect(after.runsIgnored).toBe(1);
    }
  });

  it("follows a slow drift (glazing) and a step change (new stones) within ten runs", () => {
    const drift = Array.from({ length: 40 }, (_, i) => (1 - 0.01 * i) * noise(i, 0.04));
    // 1 % slower per run for 40 runs: the truth ends at 0.61; the estimate lags a few runs behind it but
    // has closed most of the table's gap.
    const truth = 0.61;
    expect(Math.abs(learnMultiplier(history(drift)).multiplier - truth)).toBeLessThan(0.25 * (1 - truth));
    const step = [...Array.from({ length: 15 }, (_, i) => 0.8 * noise(i, 0.04)), ...Array.from({ length: 10 }, (_, i) => 1.6 * noise(i + 15, 0.04))];
    const m = learnMultiplier(history(step));
    expect(Math.abs(m.multiplier / 1.6 - 1)).toBeLessThan(0.06);
  });

  it("refuses a run no machine can give, naming the field", () => {
    expect(() => learnMultiplier([{ ...run(1, 0), strokes: 0 }])).toThrow(/strokes/);
    expect(() => learnMultiplier([{ ...run(1, 0), stockRemovedUm: Number.NaN }])).toThrow(/stockRemovedUm/);
    expect(() => learnMultiplier([{ ...run(1, 0), loggedAt: "yesterday" }])).toThrow(/loggedAt/);
    expect(() => emptyLearnedState({ forgetting: 1.5 })).toThrow(/forgetting/);
  });
});
