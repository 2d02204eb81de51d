import fc from "fast-check";
import { describe, expect, it } from "vitest";
import * as honing from "./index";
import { HoningInputError } from "./errors";
import { demoInput, demoMachine, demoStones } from "./testing/fixtures";

const demoHoneStage = () => honing.planHone(demoInput()).stages.find((s): s is honing.HoneStage => s.kind !== "bore")!;

// Every exported function either answers with finite numbers or refuses with a typed error naming the
// field: NaN and Infinity never reach an output (issue 10, guards).
const anyNumber = fc.oneof(fc.double(), fc.integer({ min: -1e9, max: 1e9 }), fc.constantFrom(Number.NaN, Infinity, -Infinity, 0, -0));

function finiteEverywhere(value: unknown, path = "result"): void {
  if (typeof value === "number") {
    expect(Number.isFinite(value), `${path} = ${value}`).toBe(true);
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => finiteEverywhere(v, `${path}[${i}]`));
  } else if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) finiteEverywhere(v, `${path}.${k}`);
  }
}

function refusesOrFinite(call: () => unknown): void {
  let result: unknown;
  try {
    result = call();
  } catch (error) {
    expect(error).toBeInstanceOf(HoningInputError);
    expect((error as HoningInputError).field.length).toBeGreaterThan(0);
    return;
  }
  finiteEverywhere(result);
}

const CASES: Array<[string, (x: number, y: number, z: number) => unknown]> = [
  ["finishedBore", (x, y, z) => honing.finishedBore({ pistonDiameterUm: x, clearanceMinUm: y, clearanceMaxUm: z })],
  ["commonClearanceBand", (x, y, z) => honing.commonClearanceBand([{ clearanceMinUm: x, clearanceMaxUm: y }, { clearanceMinUm: 20, clearanceMaxUm: z }])],
  ["checkClearance", (x, y, z) => honing.checkClearance({ boreDiameterUm: x, pistonDiameterUm: 90_000, clearanceMinUm: y, clearanceMaxUm: z })],
  ["boreGeometry", (x, y, z) => honing.boreGeometry({ levels: [{ name: "top", aUm: x, bUm: y }, { name: "bottom", aUm: z, bUm: z }] })],
  ["geometryVerdict", (x, y, z) => honing.geometryVerdict({ taperUm: x, outOfRoundUm: y }, { taperUm: z, outOfRoundUm: 5 })],
  ["crosshatchAngle", (x, y, z) => honing.crosshatchAngle({ boreDiameterUm: x, spindleRpm: y, strokeLengthUm: z, doubleStrokesPerMin: 100 })],
  ["strokeRateForAngle", (x, y, z) => honing.strokeRateForAngle({ boreDiameterUm: x, spindleRpm: y, strokeLengthUm: 100_000, includedAngleDeg: z })],
  ["peripheralSpeedMPerMin", (x, y) => honing.peripheralSpeedMPerMin(x, y)],
  ["axialSpeedMPerMin", (x, y) => honing.axialSpeedMPerMin(x, y, "constant")],
  ["chooseSpeeds", (x, y, z) => honing.chooseSpeeds({ boreDiameterUm: x, strokeLengthUm: y, targetAngleDeg: z, machine: demoMachine() })],
  ["strokeSetup", (x, y, z) => honing.strokeSetup({ boreLengthUm: x, stoneLengthUm: y, overtravelFraction: z })],
  ["removalPerDoubleStroke", (x, y, z) => honing.removalPerDoubleStroke({ stone: demoStones()[1]!, pressure: x, angleDeg: y, boreDiameterUm: z, boreLengthUm: 140_000 })],
  ["estimateStrokes", (x, y, z) => honing.estimateStrokes(x, y, z)],
  ["remainingStrokes", (x, y, z) => honing.remainingStrokes({ strokesDone: x, removedSoFarUm: y, stockLeftUm: z })],
  ["cleanupStockOf", (x, y, z) => honing.cleanupStockOf({ rzUm: x, cleanupRzMultiple: y, ...(z > 0 ? {} : { cleanupStockUm: z }) })],
  ["stoneWear", (x, y, z) => honing.stoneWear({ stone: demoStones()[0]!, fullStrokeStockUm: x, boreLengthUm: y, dwellStockUm: z, dwellZoneLengthUm: 0, heightBeforeUm: 6_000 })],
  ["splitStock", (x, y, z) => honing.splitStock({ honingStockUm: x, incomingCleanupUm: y, incomingMarksOf: "boring", coarse: null, finish: { id: "f", removalUm: 0.5, uncertaintyFraction: 0.2, cleanupUm: 18 }, plateauStockUm: z })],
  ["honingAllowance", (x, y, z) => honing.honingAllowance({ coarse: demoStones()[0]!.rate, finish: demoStones()[1]!.rate, plateauStockUm: x, boringRzUm: y, marginUm: z })],
  ["contactLengthUm", (x, y, z) => honing.contactLengthUm({ topAtUpperUm: x, strokeLengthUm: y, stoneLengthUm: 75_000 }, z)],
  ["levelDepthsUm", (x, y) => honing.levelDepthsUm(x, y)],
  ["chooseOversize", (x, y, z) => honing.chooseOversize({ boresUm: [[x, y]], stepsUm: [0, 250, z], standardBoreUm: 94_000, honingAllowanceUm: 50 })],
  ["matchPistons", (x, y, z) => honing.matchPistons({ pistons: [{ id: "p", diameterUm: x }], bores: [{ id: "b", diameterUm: 94_000 }], clearanceMinUm: y, clearanceMaxUm: z })],
  ["learnMultiplier", (x, y, z) => honing.learnMultiplier([{ stockRemovedUm: x, strokes: y, modelRatePerStrokeUm: z, loggedAt: "2026-01-01T00:00:00Z" }])],
  ["processCapability", (x, y, z) => honing.processCapability([x, 50], y, z)],
  ["normalCdf", (x) => honing.normalCdf(x)],
  ["outsideShare", (x, y, z) => honing.outsideShare(x, y, z, z + 10)],
  ["oneIn", (x) => honing.oneIn(x)],
  ["medianAbsoluteError", (x, y, z) => honing.medianAbsoluteError([{ predicted: x, actual: y }, { predicted: z, actual: 3 }])],
  ["histogram", (x, y) => honing.histogram([x, 3, 7], y)],
  ["toUm", (x) => honing.toUm(x, "in")],
  ["diameterAt20C", (x, y, z) => honing.diameterAt20C(x, { blockC: y, gaugeC: 20 }, z)],
  ["temperatureSettled", (x, y, z) => honing.temperatureSettled({ blockC: x, gaugeC: y }, z)],
  ["reestimateAtCheckpoint", (x, y, z) => honing.reestimateAtCheckpoint({
    stage: demoHoneStage(), levels: [{ name: "top", aUm: x, bUm: 93_990 }, { name: "middle", aUm: y, bUm: 93_990 }, { name: "bottom", aUm: 93_990, bUm: 93_990 }],
    strokesDone: z, bandMaxUm: 94_030, laterStockUm: 5, taperToleranceUm: 10,
  })],
  ["inspectCylinder", (x, y, z) => honing.inspectCylinder({
    levels: [{ name: "top", aUm: x, bUm: 94_020 }], band: { minUm: 94_010, maxUm: y }, tolerances: { taperUm: z, outOfRoundUm: 5 },
    piston: { diameterUm: 93_920, clearanceMinUm: 80, clearanceMaxUm: 110 }, surface: { raUm: z }, surfaceTargets: { raUm: { max: 0.4 } },
  })],
  ["fromUm", (x) => honing.fromUm(x, "mm")],
];

describe("guards on every exported computation", () => {
  for (const [name, call] of CASES) {
    it(`${name} answers in finite numbers or refuses with a typed error`, () => {
      fc.assert(fc.property(anyNumber, anyNumber, anyNumber, (x, y, z) => refusesOrFinite(() => call(x, y, z))), { numRuns: 300 });
    });
  }
  it("planHone turns any bad number into an INVALID_INPUT issue and keeps every output finite", () => {
    fc.assert(fc.property(anyNumber, anyNumber, anyNumber, (x, y, z) => {
      const plan = honing.planHone(demoInput({
        boreLengthUm: x > 0 && x < 1e6 ? x : 140_000, pressures: { finish: y }, targetCrosshatchDeg: z,
        bore: { kind: "readings", levels: [{ name: "top", aUm: 93_960 + (Number.isFinite(y) ? y % 50 : y), bUm: 93_960 }, { name: "bottom", aUm: 93_950, bUm: 93_950 }] },
      }));
      finiteEverywhere({ stages: plan.stages, final: plan.expectedFinal, stock: plan.stock });
      if (plan.errors.some((e) => e.code === "INVALID_INPUT")) expect(plan.canRelease).toBe(false);
    }), { numRuns: 300 });
  });
  it("all-NaN readings never give an oversize", () => {
    expect(() => honing.chooseOversize({ boresUm: [[Number.NaN, Number.NaN]], stepsUm: [0, 250], standardBoreUm: 94_000, honingAllowanceUm: 50 })).toThrow(HoningInputError);
  });
  it("formatLength shows a dash for a missing number, never NaN", () => {
    expect(honing.formatLength(Number.NaN, "mm")).toBe("— mm");
  });
});
