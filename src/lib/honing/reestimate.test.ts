import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { planHone } from "./plan";
import type { HoneStage } from "./plan-types";
import { profileTaperUm } from "./profile";
import { reestimateAtCheckpoint } from "./reestimate";
import { demoInput } from "./testing/fixtures";

// The demo plan (invented stones, see testing/fixtures.ts): coarse, finish, plateau.
const plan = planHone(demoInput());
const stages = plan.stages.filter((s): s is HoneStage => s.kind !== "bore");
const coarse = stages[0]!;
const laterStock = stages.slice(1).reduce((a, s) => a + s.cleanup.requiredUm, 0);
const levels = (values: number[]) => values.map((v, i) => ({ name: ["top", "middle", "bottom"][i]!, aUm: v, bUm: v }));
const ask = (readings: number[], over: Partial<Parameters<typeof reestimateAtCheckpoint>[0]> = {}) => reestimateAtCheckpoint({
  stage: coarse, levels: levels(readings), strokesDone: coarse.checkpoint!.afterStrokes, bandMaxUm: plan.sizing!.maxUm, laterStockUm: laterStock, taperToleranceUm: 10, ...over,
});

describe("re-estimate at a checkpoint", () => {
  it("a reading as the plan expected gives the plan's remaining strokes (or one more: the plan may stop one short of the goal)", () => {
    const expected = coarse.checkpoint!.expectedByLevel.map((l) => l.diameterUm);
    const answer = ask(expected);
    const planned = coarse.strokes.nominal - coarse.checkpoint!.afterStrokes;
    expect(answer.action).toBe("continue");
    expect(answer.strokesToRun).toBeGreaterThanOrEqual(planned);
    expect(answer.strokesToRun).toBeLessThanOrEqual(planned + 1);
    expect(answer.dwell).toBeNull();
  });
  it("a bore that cut slower than planned calls for more strokes, with the stock left per level", () => {
    const expected = coarse.checkpoint!.expectedByLevel.map((l) => l.diameterUm - 6);
    const answer = ask(expected);
    expect(answer.strokesToRun).toBeGreaterThan(coarse.strokes.nominal - coarse.checkpoint!.afterStrokes);
    expect(answer.remainingByLevel.map((r) => r.stockUm)).toEqual(expected.map((v) => Math.max(0, coarse.goalUm - v)));
    expect(answer.reason).toMatch(/full strokes at the plan's rate/);
  });
  it("a reading already at the stage's goal ends the stage", () => {
    const answer = ask([coarse.goalUm + 0.5, coarse.goalUm + 0.5, coarse.goalUm + 0.5]);
    expect(answer).toMatchObject({ action: "stage_done", strokesToRun: 0 });
  });
  it("a reading past what the band allows after the later stages stops the stage and calls the machinist", () => {
    const past = plan.sizing!.maxUm - laterStock + 1;
    const answer = ask([past, coarse.goalUm, coarse.goalUm]);
    expect(answer.action).toBe("stop_call_machinist");
    expect(answer.reason).toMatch(/call the machinist/);
  });
  it("a reading with taper past the tolerance plans short strokes at the tight end first, and leaves less taper", () => {
    const base = coarse.checkpoint!.expectedDiameterUm;
    const answer = ask([base, base + 14, base + 16]);
    expect(answer.dwell?.end).toBe("top");
    expect(answer.dwell!.strokes).toBeGreaterThan(0);
    expect(profileTaperUm(answer.expectedAfter)).toBeLessThan(16);
  });
  it("the larger the reading, the fewer strokes still to run", () => {
    const base = coarse.checkpoint!.expectedDiameterUm;
    fc.assert(fc.property(fc.double({ min: -20, max: 15, noNaN: true }), fc.double({ min: 0.1, max: 5, noNaN: true }), (shift, more) => {
      const a = ask([base + shift, base + shift, base + shift]);
      const b = ask([base + shift + more, base + shift + more, base + shift + more]);
      expect(b.strokesToRun).toBeLessThanOrEqual(a.strokesToRun);
    }), { numRuns: 200 });
  });
  it("refuses a reading set with a different number of levels than the plan", () => {
    expect(() => ask([94_000, 94_000])).toThrow(/levels/);
  });
});
