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
  it("a reading as the plan expected gives exactly the plan's remaining strokes (one rounding rule for both)", () => {
    const expected = coarse.checkpoint!.expectedByLevel.map((l) => l.diameterUm);
    const answer = ask(expected);
    expect(answer.action).toBe("continue");
    expect(answer.strokesToRun).toBe(coarse.strokes.nominal - coarse.checkpoint!.afterStrokes);
    expect(answer.dwell).toBeNull();
  });
  it("over many plans, a checkpoint reading as expected asks exactly the strokes the plan has left, never one more", () => {
    const arb = fc.record({
      boreUm: fc.integer({ min: 93_700, max: 93_990 }),
      coarseRate: fc.double({ min: 0.4, max: 4, noNaN: true }),
      finishRate: fc.double({ min: 0.1, max: 1.2, noNaN: true }),
      coarseRz: fc.double({ min: 1, max: 12, noNaN: true }),
      u: fc.double({ min: 0, max: 0.5, noNaN: true }),
      withPlateau: fc.boolean(),
      taperUm: fc.integer({ min: 0, max: 20 }),
    });
    let checked = 0;
    fc.assert(fc.property(arb, (a) => {
      const stones = demoInput().stones.filter((s) => a.withPlateau || s.role !== "plateau").map((s) => ({
        ...s, rate: { ...s.rate, uncertaintyFraction: a.u, ...(s.role === "coarse" && { removalPerDoubleStrokeUm: a.coarseRate, rzUm: a.coarseRz }), ...(s.role === "finish" && { removalPerDoubleStrokeUm: a.finishRate }) },
      }));
      const bore = a.taperUm > 0
        ? { kind: "readings" as const, levels: levels([a.boreUm, a.boreUm + a.taperUm / 2, a.boreUm + a.taperUm]) }
        : { kind: "diameter" as const, diameterUm: a.boreUm };
      const p = planHone(demoInput({ stones, bore } as Parameters<typeof demoInput>[0]));
      if (p.status !== "ok" || !p.sizing) return;
      const hs = p.stages.filter((s): s is HoneStage => s.kind !== "bore");
      hs.forEach((stage, i) => {
        if (!stage.checkpoint) return;
        const answer = reestimateAtCheckpoint({
          stage, levels: stage.checkpoint.expectedByLevel.map((l) => ({ name: l.level, aUm: l.aUm, bUm: l.bUm })), strokesDone: stage.checkpoint.afterStrokes,
          bandMaxUm: p.sizing!.maxUm, laterStockUm: hs.slice(i + 1).reduce((sum, s) => sum + s.cleanup.requiredUm, 0), taperToleranceUm: 1_000,
        });
        if (answer.action === "stop_call_machinist") return;
        checked++;
        expect(answer.strokesToRun).toBe(stage.strokes.nominal - stage.checkpoint.afterStrokes);
      });
    }), { numRuns: 400 });
    expect(checked).toBeGreaterThan(100);
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
