import { describe, expect, it } from "vitest";
import { chooseOversize } from "./oversize";

// Metric service oversizes 0.25/0.50/0.75/1.00 mm, trade-facts §7 [V S17]
const steps = [0, 250, 500, 750, 1000];

describe("chooseOversize", () => {
  it("standard 82.000 + 0.50 O/S → 82.500 mm, chosen from the worst cylinder", () => {
    // trade-facts §11.20 [D]; choose from the worst cylinder, all one oversize [V S17]
    const r = chooseOversize({ boresUm: [[82_050, 82_060], [82_150, 82_420], [82_100, 82_090]], stepsUm: steps, standardBoreUm: 82_000, honingAllowanceUm: 30 });
    expect(r).toMatchObject({ ok: true, stepUm: 500, finishedBoreUm: 82_500, boreToUm: 82_470, worstCylinderIndex: 1, worstReadingUm: 82_420 });
  });
  it("says when no step cleans up", () => {
    const r = chooseOversize({ boresUm: [[83_100]], stepsUm: steps, standardBoreUm: 82_000, honingAllowanceUm: 30 });
    expect(r).toMatchObject({ ok: false, reason: "NO_STEP_CLEANS_UP", largestStepUm: 1000 });
  });
  it("refuses a step that leaves less than the minimum wall", () => {
    // minimum about 0.125 in (3.2 mm) in critical areas, trade-facts §7 [V S28]
    const r = chooseOversize({ boresUm: [[82_100, 82_400]], stepsUm: steps, standardBoreUm: 82_000, honingAllowanceUm: 30, wallThicknessUm: 3_300, minWallUm: 3_175 });
    expect(r).toMatchObject({ ok: false, reason: "WALL_TOO_THIN", largestStepUm: 500 });
    if (!r.ok) expect(r.wallAfterUm).toBe(3_300 - (82_500 - 82_100) / 2);
  });
  it("inch practice: 4.000 in + 0.020 in → 102.108 mm", () => {
    // trade-facts §11.20 [D]; inch steps §7 [C]
    const r = chooseOversize({ boresUm: [[101_700, 101_950]], stepsUm: [254, 508, 762, 1016], standardBoreUm: 101_600, honingAllowanceUm: 50 });
    expect(r).toMatchObject({ ok: true, stepUm: 508, finishedBoreUm: 102_108 });
  });
});
