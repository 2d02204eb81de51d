import { describe, expect, it } from "vitest";
import { planHone } from "./plan";
import { planHoneJob } from "./job";
import type { HoneStage, PlanStage } from "./plan-types";
import { profileTaperUm } from "./profile";
import { demoInput, demoStones } from "./testing/fixtures";

const hone = (stages: PlanStage[]) => stages.filter((s): s is HoneStage => s.kind !== "bore");
const codes = (plan: ReturnType<typeof planHone>) => plan.issues.map((i) => i.code);
const THOU = 25.4;

describe("planHone: the demo bore (93.95 mm, piston 93.92 + 0.004 in)", () => {
  const plan = planHone(demoInput());
  it("aims at about 94.02 mm", () => {
    // common practice (practitioner account, issue 3): 93.92 mm piston + ~0.004 in → ~94.02 mm
    expect(plan.sizing!.targetUm / 1000).toBeCloseTo(94.02, 2);
  });
  it("runs coarse, finish, plateau with stocks adding to the total", () => {
    expect(plan.status).toBe("ok");
    expect(plan.canRelease).toBe(true);
    expect(plan.stages.map((s) => s.kind)).toEqual(["coarse", "finish", "plateau"]);
    // Whole strokes: the stocks add to the total within one plateau stroke and the 0.05 µm gauge slack.
    const sum = hone(plan.stages).reduce((a, s) => a + s.stockUm, 0);
    expect(Math.abs(sum - plan.stock!.totalUm)).toBeLessThan(0.25);
    expect(plan.stock!.totalUm / THOU).toBeCloseTo(2.82, 2);
  });
  it("changes from coarse to finer stones about 1.5–2 thou under size; the finer stones take the rest", () => {
    // common practice (practitioner account, issue 3)
    const coarse = plan.stages[0] as HoneStage;
    const underThou = (plan.sizing!.targetUm - coarse.expectedDiameterAfterUm) / THOU;
    expect(underThou).toBeGreaterThanOrEqual(1.5);
    expect(underThou).toBeLessThanOrEqual(2);
    expect(Math.abs(hone(plan.stages).at(-1)!.expectedDiameterAfterUm - plan.sizing!.targetUm)).toBeLessThan(0.25);
  });
  it("ends at one size at every level and in both directions", () => {
    // common practice (practitioner account, issue 3)
    expect(plan.finalCheck).toMatchObject({ targetUm: plan.sizing!.targetUm, levels: ["top", "middle", "bottom"] });
  });
  it("every stage carries its rule, settings, checkpoint and stone wear", () => {
    for (const stage of hone(plan.stages)) {
      expect(stage.rule).toBeTruthy();
      expect(stage.removal.rule).toContain("Preston");
      expect(stage.speeds.includedAngleDeg).toBeCloseTo(45, 0); // default 45° [V S17]
      expect(stage.strokeSetup.strokeLengthUm).toBe(115_000); // trade-facts §11.26 [C, D]
      expect(stage.stoneWear.heightAfterUm).toBeLessThan(stage.stoneWear.heightBeforeUm);
      if (stage.kind !== "plateau") expect(stage.checkpoint!.afterStrokes).toBeLessThan(stage.strokes.low);
    }
  });
  it("0.07 mm of stock as a stock figure gives 2.76 thou", () => {
    // common practice (practitioner account, issue 3)
    const p = planHone(demoInput({ bore: { kind: "stock", stockUm: 70 } }));
    expect(p.stock!.totalUm / THOU).toBeCloseTo(2.76, 2);
  });
});

describe("planHone: worked scenarios", () => {
  it("a bore already over target gives BORE_OVER_TARGET with the level and amount", () => {
    const plan = planHone(demoInput({
      bore: { kind: "readings", levels: [{ name: "top", aUm: 94_030, bUm: 94_000 }, { name: "middle", aUm: 93_990, bUm: 93_990 }, { name: "bottom", aUm: 93_985, bUm: 93_985 }] },
    }));
    expect(plan.status).toBe("blocked");
    expect(plan.stages).toEqual([]);
    const issue = plan.errors[0]!;
    expect(issue).toMatchObject({ code: "BORE_OVER_TARGET", level: "top", direction: "A", readingUm: 94_030 });
    if (issue.code === "BORE_OVER_TARGET") {
      expect(issue.overByUm).toBeCloseTo(8.4, 9);
      expect(issue.choices.map((c) => c.kind)).toEqual(["NEXT_OVERSIZE", "OTHER_PISTON", "LARGER_CLEARANCE"]);
    }
  });
  it("a stock too small to clean up the boring marks says so", () => {
    // clean-up 2 × 3 × Rz [C]: bored Rz 4 µm → 24 µm; stock 11.6 µm
    const plan = planHone(demoInput({ bore: { kind: "diameter", diameterUm: 94_010 }, incomingSurface: { rzUm: 4 } }));
    const issue = plan.errors.find((i) => i.code === "STOCK_BELOW_CLEANUP");
    expect(issue).toMatchObject({ stage: "finish", cleanupUm: 24, marksOf: "incoming surface" });
    if (issue?.code === "STOCK_BELOW_CLEANUP") expect(issue.shortByUm).toBeCloseTo(24 - 9.6, 9);
    expect(plan.canRelease).toBe(false);
  });
  it("a worn, tapered bore gets a dwell block at the tight end and ends inside the band and the taper tolerance", () => {
    const plan = planHone(demoInput({
      bore: { kind: "readings", levels: [{ name: "top", aUm: 93_990, bUm: 93_992 }, { name: "middle", aUm: 93_975, bUm: 93_976 }, { name: "bottom", aUm: 93_960, bUm: 93_961 }] },
    }));
    expect(plan.geometry!.tightEnd).toBe("bottom");
    const dwell = plan.taperCorrection!;
    expect(dwell).toMatchObject({ end: "bottom", measureAfter: true });
    expect(dwell.removalByLevelUm[0]).toBe(0); // the short strokes never reach the top level
    expect(dwell.removalByLevelUm[1]!).toBeLessThan(dwell.removalByLevelUm[2]!);
    expect(dwell.checkpoint).not.toBeNull(); // a reading inside a long dwell
    expect(dwell.speeds.includedAngleDeg).toBeCloseTo(45, 0); // the dwell has its own speeds for the target angle
    const first = plan.stages[0] as HoneStage;
    expect(first.dwell).toBe(dwell);
    expect(dwell.lowerReversal).toEqual(first.strokeSetup.lowerReversal);
    expect(dwell.lowerReversal.stoneTopFromDeckUm - dwell.upperReversal.stoneTopFromDeckUm).toBe(dwell.strokeLengthUm);
    expect(plan.canRelease).toBe(true);
    for (const l of plan.expectedFinal!) {
      expect(Math.max(l.aUm, l.bUm)).toBeLessThanOrEqual(plan.sizing!.maxUm);
      expect(Math.min(l.aUm, l.bUm)).toBeGreaterThanOrEqual(plan.sizing!.minUm);
    }
    expect(profileTaperUm(plan.expectedFinal!)).toBeLessThanOrEqual(10);
  });
  it("a top-tight bore dwells at the top", () => {
    const plan = planHone(demoInput({
      bore: { kind: "readings", levels: [{ name: "top", aUm: 93_950, bUm: 93_950 }, { name: "bottom", aUm: 93_975, bUm: 93_975 }] },
    }));
    expect(plan.taperCorrection).toMatchObject({ end: "top" });
    expect(plan.taperCorrection!.stockUm).toBeGreaterThan(15);
    expect(plan.taperCorrection!.upperReversal).toEqual((plan.stages[0] as HoneStage).strokeSetup.upperReversal);
  });
  it("plans a boring stage with the allowance from the stone sequence", () => {
    // bore-to = target − honing allowance [V S17]; allowance = boring clean-up (2·3·4) + coarse clean-up (42) + plateau (2) + margin 10
    const plan = planHone(demoInput({ bore: { kind: "diameter", diameterUm: 93_800 }, boring: { marginUm: 10, surfaceRzUm: 4 } }));
    const bore = plan.stages[0]!;
    expect(bore).toMatchObject({ kind: "bore", honingAllowanceUm: 78 });
    if (bore.kind === "bore") expect(bore.boreToUm).toBeCloseTo(plan.sizing!.targetUm - 78, 9);
    expect(plan.stock!.honingUm).toBeCloseTo(78, 9);
    expect(plan.stock!.boringUm + plan.stock!.honingUm).toBeCloseTo(plan.stock!.totalUm, 9);
    expect(plan.taperCorrection).toBeNull();
    expect(plan.errors).toEqual([]);
  });
  it("refuses to hone half a millimetre", () => {
    // stock "may be as much as 0.5 mm, but is usually much less" [V S1]
    expect(codes(planHone(demoInput({ bore: { kind: "diameter", diameterUm: 93_400 } })))).toContain("STOCK_ABOVE_HONING_LIMIT");
  });
  it("warns before a stone runs below its wear limit", () => {
    const stones = demoStones();
    stones[0]!.currentHeightUm = 1_005;
    const issue = planHone(demoInput({ stones })).issues.find((i) => i.code === "STONE_WEAR_LIMIT");
    expect(issue).toMatchObject({ stoneId: "demo-coarse", stage: "coarse", wearLimitHeightUm: 1_000 });
  });
  it("prefers a stone of the same role that is still above its wear limit", () => {
    const stones = demoStones();
    stones.unshift({ ...stones[0]!, id: "demo-coarse-worn", currentHeightUm: 900 });
    expect(planHone(demoInput({ stones })).stages[0]).toMatchObject({ stoneId: "demo-coarse" });
  });
  it("limited room below the bore warns that the bottom stays tight", () => {
    expect(codes(planHone(demoInput({ bottomClearanceUm: 5_000 })))).toContain("BOTTOM_OVERTRAVEL_LIMITED");
  });
  it("skips coarse stones when the stock is small and says why", () => {
    const plan = planHone(demoInput({ bore: { kind: "diameter", diameterUm: 94_000 } }));
    expect(plan.stages.map((s) => s.kind)).toEqual(["finish", "plateau"]);
    expect(codes(plan)).toContain("COARSE_SKIPPED");
  });
  it("higher pressure means fewer strokes", () => {
    const low = planHone(demoInput({ pressures: { finish: 1 } }));
    const high = planHone(demoInput({ pressures: { finish: 1.5 } }));
    expect((high.stages[1] as HoneStage).strokes.nominal).toBeLessThan((low.stages[1] as HoneStage).strokes.nominal);
  });
  it("turns contradictory input into INVALID_INPUT, not an exception", () => {
    const plan = planHone(demoInput({ piston: { pistonDiameterUm: 93_920, clearanceMinUm: 50, clearanceMaxUm: 10 } }));
    expect(plan).toMatchObject({ status: "blocked", canRelease: false });
    expect(plan.errors[0]).toMatchObject({ code: "INVALID_INPUT", field: "clearanceMinUm" });
  });
  it("refuses impossible options as INVALID_INPUT", () => {
    expect(planHone(demoInput({ checkpointFraction: 1.2 })).errors[0]).toMatchObject({ code: "INVALID_INPUT", field: "checkpointFraction" });
    expect(planHone(demoInput({ machine: { ...demoInput().machine, spindleRpmMin: 500 } })).errors[0]).toMatchObject({ code: "INVALID_INPUT", field: "machine.spindleRpmMin" });
  });
  it("reports an unusable rate row", () => {
    const stones = demoStones();
    stones[1]!.rate.uncertaintyFraction = 1.5;
    expect(planHone(demoInput({ stones })).errors[0]).toMatchObject({ code: "STONE_RATE_INVALID", stoneId: "demo-finish" });
  });
  it("needs a coarse or finish stone", () => {
    expect(codes(planHone(demoInput({ stones: demoStones().slice(2) })))).toEqual(["NO_HONING_STONE"]);
  });
  it("refuses a stroke longer than the machine's", () => {
    const plan = planHone(demoInput({ machine: { ...demoInput().machine, maxStrokeLengthUm: 100_000 } }));
    expect(codes(plan)).toContain("STROKE_ABOVE_MACHINE");
  });
});

describe("planHoneJob", () => {
  it("carries stone wear from cylinder to cylinder", () => {
    const cylinders = Array.from({ length: 8 }, (_, i) => ({ cylinder: i + 1, bore: { kind: "diameter" as const, diameterUm: 93_950 + i } }));
    const job = planHoneJob({ ...demoInput(), cylinders });
    expect(job.cylinders).toHaveLength(8);
    const firstCoarse = job.cylinders[0]!.plan.stages[0] as HoneStage;
    const secondCoarse = job.cylinders[1]!.plan.stages[0] as HoneStage;
    expect(secondCoarse.stoneWear.heightBeforeUm).toBeCloseTo(firstCoarse.stoneWear.heightAfterUm, 9);
    expect(job.stoneHeightsAfterUm["demo-coarse"]).toBeLessThan(6_000);
  });
});
