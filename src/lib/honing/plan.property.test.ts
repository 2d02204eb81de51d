import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { planHone } from "./plan";
import { DEFAULT_CHECKPOINT_MIN_STOCK_UM } from "./plan-stage";
import type { HoneStage, PlanHoneInput, StoneInput } from "./plan-types";
import { estimateStrokes } from "./strokes";
import { demoMachine } from "./testing/fixtures";

const stone = (id: string, role: StoneInput["role"], r: number, u: number, rz: number): StoneInput => ({
  id, role, stoneLengthUm: 75_000, currentHeightUm: 6_000, wearLimitHeightUm: 1_000,
  rate: { removalPerDoubleStrokeUm: r, referencePressure: 1, referenceBoreLengthUm: 140_000, uncertaintyFraction: u, raUm: rz / 5, rzUm: rz, wearUmPerUmStock: 0.3 },
});

const arbInput = fc.record({
  pistonUm: fc.integer({ min: 60_000, max: 140_000 }),
  cMin: fc.integer({ min: 10, max: 80 }),
  bandWidth: fc.integer({ min: 5, max: 60 }),
  stockUm: fc.double({ min: 1, max: 300, noNaN: true }),
  coarseRate: fc.double({ min: 0.5, max: 4, noNaN: true }),
  finishRate: fc.double({ min: 0.1, max: 1, noNaN: true }),
  coarseRz: fc.double({ min: 2, max: 10, noNaN: true }),
  finishRz: fc.double({ min: 0.5, max: 4, noNaN: true }),
  u: fc.double({ min: 0, max: 0.5, noNaN: true }),
  incomingRz: fc.option(fc.double({ min: 0.5, max: 8, noNaN: true }), { nil: undefined }),
  withCoarse: fc.boolean(),
  withPlateau: fc.boolean(),
  pressure: fc.double({ min: 0.5, max: 2, noNaN: true }),
});
type Arb = typeof arbInput extends fc.Arbitrary<infer T> ? T : never;

function inputOf(a: Arb, overrides: Partial<PlanHoneInput> = {}): PlanHoneInput {
  const stones = [stone("f", "finish", a.finishRate, a.u, a.finishRz)];
  if (a.withCoarse) stones.push(stone("c", "coarse", a.coarseRate, a.u, a.coarseRz));
  if (a.withPlateau) stones.push(stone("p", "plateau", 0.2, a.u, 1));
  return {
    piston: { pistonDiameterUm: a.pistonUm, clearanceMinUm: a.cMin, clearanceMaxUm: a.cMin + a.bandWidth },
    bore: { kind: "stock", stockUm: a.stockUm },
    stones, machine: demoMachine(), boreLengthUm: 140_000,
    pressures: { coarse: a.pressure, finish: a.pressure },
    ...(a.incomingRz !== undefined && { incomingSurface: { rzUm: a.incomingRz } }),
    ...overrides,
  };
}

const honeStages = (input: PlanHoneInput) => planHone(input).stages.filter((s): s is HoneStage => s.kind !== "bore");
const RUNS = { numRuns: 300 };

describe("planHone properties (fast-check)", () => {
  it("stage stocks add up to the total stock, give or take the last whole stroke", () => {
    fc.assert(fc.property(arbInput, (a) => {
      const plan = planHone(inputOf(a));
      const stages = plan.stages.filter((s): s is HoneStage => s.kind !== "bore");
      if (stages.length === 0) return;
      const sum = stages.reduce((n, s) => n + s.stockUm, 0);
      const lastStroke = Math.max(...stages.map((s) => s.removal.removalPerDoubleStrokeUm));
      expect(Math.abs(sum - plan.stock!.totalUm)).toBeLessThanOrEqual(lastStroke + 0.05 + 1e-6);
    }), RUNS);
  });
  it("every cutting stage removes at least the clean-up stock of the one before, or the plan says it cannot", () => {
    fc.assert(fc.property(arbInput, (a) => {
      const plan = planHone(inputOf(a));
      const cutting = plan.stages.filter((s): s is HoneStage => s.kind === "coarse" || s.kind === "finish");
      cutting.forEach((s) => {
        // 0.05 µm: the gauge slack (CLEANUP_SLACK_UM)
        if (s.stockUm < s.cleanup.requiredUm - 0.05 - 1e-9) expect(plan.errors.map((e) => e.code)).toContain("STOCK_BELOW_CLEANUP");
      });
    }), RUNS);
  });
  it("more stock never gives fewer strokes for a stage's stroke estimate", () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 500, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0.01, max: 5, noNaN: true }), fc.double({ min: 0, max: 0.9, noNaN: true }), (s, extra, r, u) => {
      const a = estimateStrokes(s, r, u);
      const b = estimateStrokes(s + extra, r, u);
      expect(b.nominal).toBeGreaterThanOrEqual(a.nominal);
      expect(b.low).toBeGreaterThanOrEqual(a.low);
      expect(b.high).toBeGreaterThanOrEqual(a.high);
    }), { numRuns: 1000 });
  });
  it("higher pressure never removes less per stroke at any level", () => {
    fc.assert(fc.property(arbInput, fc.double({ min: 0, max: 2, noNaN: true }), (a, extra) => {
      const low = honeStages(inputOf(a));
      const high = honeStages(inputOf({ ...a, pressure: a.pressure + extra }));
      for (const s of low) {
        const same = high.find((h) => h.kind === s.kind);
        if (!same || s.kind === "plateau") continue;
        s.removalByLevelUm.forEach((r, i) => expect(same.removalByLevelUm[i]!).toBeGreaterThanOrEqual(r - 1e-12));
      }
    }), RUNS);
  });
  it("the expected readings after the last stage lie inside the band, or the plan cannot be released", () => {
    fc.assert(fc.property(arbInput, (a) => {
      const plan = planHone(inputOf(a));
      if (!plan.canRelease || !plan.expectedFinal) return;
      for (const l of plan.expectedFinal) {
        expect(Math.min(l.aUm, l.bUm)).toBeGreaterThanOrEqual(plan.sizing!.minUm - 1e-6);
        expect(Math.max(l.aUm, l.bUm)).toBeLessThanOrEqual(plan.sizing!.maxUm + 1e-6);
      }
    }), RUNS);
  });
  it("never plans the last of a stage's stock without a checkpoint (or says it cannot)", () => {
    fc.assert(fc.property(arbInput, (a) => {
      const plan = planHone(inputOf(a));
      for (const s of honeStages(inputOf(a))) {
        if (s.fullStrokeStockUm <= DEFAULT_CHECKPOINT_MIN_STOCK_UM) continue;
        if (s.checkpoint) {
          expect(s.checkpoint.afterStrokes).toBeLessThan(s.strokes.low);
          expect(s.checkpoint.expectedDiameterUm).toBeLessThan(s.expectedDiameterAfterUm);
        } else {
          expect(plan.warnings.some((w) => w.code === "CHECKPOINT_NOT_POSSIBLE" && w.stage === s.kind)).toBe(true);
        }
      }
    }), RUNS);
  });
  it("never throws on arbitrary numbers; bad ones become typed issues", () => {
    const anyNumber = fc.oneof(fc.double(), fc.integer());
    fc.assert(fc.property(arbInput, anyNumber, anyNumber, anyNumber, (a, x, y, z) => {
      const plan = planHone(inputOf(a, { boreLengthUm: x, piston: { pistonDiameterUm: y, clearanceMinUm: z, clearanceMaxUm: 50 } }));
      expect(["ok", "blocked"]).toContain(plan.status);
    }), RUNS);
  });
});
