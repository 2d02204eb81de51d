import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { planHone } from "./plan";
import type { HoneStage, PlanHoneInput } from "./plan-types";
import { profileTaperUm } from "./profile";
import { DEFAULT_CHECKPOINT_MIN_STOCK_UM } from "./strokes";
import { demoInput, demoStones } from "./testing/fixtures";

const levels = (top: number, middle: number, bottom: number) => ({
  kind: "readings" as const,
  levels: [{ name: "top", aUm: top, bUm: top }, { name: "middle", aUm: middle, bUm: middle }, { name: "bottom", aUm: bottom, bUm: bottom }],
});
const insideBand = (plan: ReturnType<typeof planHone>) =>
  plan.expectedFinal!.every((l) => Math.min(l.aUm, l.bUm) >= plan.sizing!.minUm - 1e-6 && Math.max(l.aUm, l.bUm) <= plan.sizing!.maxUm + 1e-6);

describe("taper correction along the bore", () => {
  // The case found in issue 10: 93.960 / 93.945 / 93.930 mm, a 100 mm stone in a 150 mm bore, piston 93.920 mm, band 40–60 µm.
  const issueCase = (over: Partial<PlanHoneInput> = {}) => demoInput({
    stones: demoStones().map((s) => ({ ...s, stoneLengthUm: 100_000 })), boreLengthUm: 150_000,
    piston: { pistonDiameterUm: 93_920, clearanceMinUm: 40, clearanceMaxUm: 60 }, bore: levels(93_960, 93_945, 93_930), ...over,
  });
  it("sizes the dwell so that the middle, swept by the long stone's short strokes, does not pass the band", () => {
    const plan = planHone(issueCase({ incomingSurface: { cleanupStockUm: 0 } }));
    const dwell = plan.taperCorrection!;
    expect(dwell.end).toBe("bottom");
    expect(dwell.removalByLevelUm[1]!).toBeGreaterThan(0); // the middle is reached by the short strokes
    expect(insideBand(plan)).toBe(true);
    expect(profileTaperUm(plan.expectedFinal!)).toBeLessThanOrEqual(10);
    expect(plan.canRelease).toBe(true);
  });
  it("the same bore with the as-received clean-up owed at the top is refused with the numbers", () => {
    // the top reads 93.960 (the band's floor): 10 µm to the target, of which the plateau takes 2
    const plan = planHone(issueCase());
    expect(plan.errors.find((e) => e.code === "STOCK_BELOW_CLEANUP")).toMatchObject({ marksOf: "incoming surface", cleanupUm: 10 });
  });
  it("a shape no end dwell can correct (tight in the middle) says so, with the way out", () => {
    const plan = planHone(demoInput({
      piston: { pistonDiameterUm: 93_920, clearanceMinUm: 40, clearanceMaxUm: 60 }, bore: levels(93_940, 93_900, 93_940),
    }));
    const issue = plan.errors.find((e) => e.code === "TAPER_NOT_CORRECTED");
    expect(issue?.message).toMatch(/shorter stone.*bore first.*accept the taper/);
    expect(plan.canRelease).toBe(false);
  });
  it("with too little stock for a coarse stage the dwell runs on the first stone planned, with its own speeds and a reading inside", () => {
    const plan = planHone(issueCase({ incomingSurface: { cleanupStockUm: 0 } }));
    const dwell = plan.taperCorrection!;
    expect(dwell.stoneId).toBe((plan.stages[0] as HoneStage).stoneId);
    expect(dwell.speeds.spindleRpm).toBeGreaterThan(0);
    expect(dwell.speeds.doubleStrokesPerMin).toBeGreaterThan(0);
    if (dwell.stockUm > DEFAULT_CHECKPOINT_MIN_STOCK_UM) expect(dwell.checkpoint).not.toBeNull();
  });
  it("the dwell runs on the coarse stone when the plan has a coarse stage", () => {
    const plan = planHone(demoInput({ bore: levels(93_930, 93_915, 93_900) }));
    expect(plan.stages[0]).toMatchObject({ kind: "coarse" });
    expect(plan.taperCorrection).toMatchObject({ stoneId: "demo-coarse" });
  });
  it("a bottom with little room is planned, not only warned: a dwell at the bottom makes up for it", () => {
    const plan = planHone(demoInput({ bore: { kind: "diameter", diameterUm: 93_960 }, bottomClearanceUm: 15_000 }));
    expect(plan.issues.map((i) => i.code)).toContain("BOTTOM_OVERTRAVEL_LIMITED");
    expect(plan.taperCorrection).toMatchObject({ end: "bottom" });
    expect(insideBand(plan)).toBe(true);
  });
  it("for tapered bores of any shape the plan's readings end in the band, or the plan is not releasable", () => {
    const arb = fc.record({
      top: fc.integer({ min: 0, max: 60 }), middle: fc.integer({ min: 0, max: 60 }), bottom: fc.integer({ min: 0, max: 60 }),
      stoneMm: fc.integer({ min: 40, max: 140 }), boreMm: fc.integer({ min: 100, max: 200 }), room: fc.option(fc.integer({ min: 0, max: 40_000 }), { nil: undefined }),
      angle: fc.integer({ min: 20, max: 80 }), pressure: fc.double({ min: 0.5, max: 3, noNaN: true }),
    });
    fc.assert(fc.property(arb, (a) => {
      const plan = planHone(demoInput({
        stones: demoStones().map((s) => ({ ...s, stoneLengthUm: a.stoneMm * 1000 })), boreLengthUm: a.boreMm * 1000, bottomClearanceUm: a.room,
        targetCrosshatchDeg: a.angle, pressures: { coarse: a.pressure, finish: a.pressure },
        bore: levels(93_900 + a.top, 93_900 + a.middle, 93_900 + a.bottom),
      }));
      if (!plan.canRelease) return;
      expect(insideBand(plan)).toBe(true);
      expect(profileTaperUm(plan.expectedFinal!)).toBeLessThanOrEqual(plan.finalCheck!.taperToleranceUm + 1e-6);
      for (const s of plan.stages.filter((x): x is HoneStage => x.kind !== "bore")) {
        for (const l of s.expectedByLevel) expect(Number.isFinite(l.aUm) && Number.isFinite(l.bUm)).toBe(true);
      }
    }), { numRuns: 200 });
  });
});

describe("clean-up of the incoming surface", () => {
  it("a worn bore owes the as-received clean-up: 3 µm of stock is refused, not planned as finish 1 + plateau 2", () => {
    const plan = planHone(demoInput({ bore: { kind: "stock", stockUm: 3 } }));
    expect(plan.errors.find((e) => e.code === "STOCK_BELOW_CLEANUP")).toMatchObject({ marksOf: "incoming surface", cleanupUm: 10 });
  });
  it("the bore-to allowance always has a boring term, from the shop's boring Rz or the default", () => {
    const plan = planHone(demoInput({ bore: { kind: "diameter", diameterUm: 93_700 }, boring: { marginUm: 10 } }));
    const bore = plan.stages[0]!;
    // default boring Rz 6 µm → 2 × 3 × 6 = 36 µm [from memory, allowance.ts] + coarse 42 + plateau 2 + margin 10
    expect(bore).toMatchObject({ kind: "bore", honingAllowanceUm: 90 });
    // inside the 0.05–0.10 mm rebuild shops bore under the finished size [C, trade-facts §3.3]
    if (bore.kind === "bore") expect(bore.honingAllowanceUm).toBeGreaterThanOrEqual(50);
  });
  it("bores first only above the shop's threshold when asked to decide", () => {
    const auto = { marginUm: 10, onlyAboveStockUm: 100 };
    expect(planHone(demoInput({ bore: { kind: "diameter", diameterUm: 93_950 }, boring: auto })).stages[0]!.kind).not.toBe("bore");
    expect(planHone(demoInput({ bore: { kind: "diameter", diameterUm: 93_800 }, boring: auto })).stages[0]!.kind).toBe("bore");
  });
});
