import { describe, expect, it } from "vitest";
import { jobPlanSchema, planRequestSchema, quickSaveSchema, withdrawSchema } from "./schema";

// Limits are sane physical bounds (schema.ts), not trade check values.
const base = { mode: "job", jobId: "job-1", machineId: "m-1", clearance: { minUm: 40, maxUm: 60 } };
const paths = (input: unknown) => {
  const result = planRequestSchema.safeParse(input);
  return result.success ? [] : result.error.issues.map((i) => i.path.join("."));
};

describe("planRequestSchema", () => {
  it("fills the defaults: 45° crosshatch [V S17], checkpoint at 75 % [C], boring decided by the stock", () => {
    const parsed = jobPlanSchema.parse(base);
    expect(parsed).toMatchObject({ targetCrosshatchDeg: 45, checkpointFraction: 0.75, boring: { enabled: null, marginUm: null }, cylinders: [], stoneIds: {}, pressures: {} });
    expect(parsed.clearance.performanceAllowanceUm).toBe(0);
  });

  it("refuses an upside-down band on the largest clearance, and a target outside it", () => {
    expect(paths({ ...base, clearance: { minUm: 60, maxUm: 40 } })).toEqual(["clearance.maxUm"]);
    expect(paths({ ...base, clearance: { minUm: 40, maxUm: 60, targetUm: 70 } })).toEqual(["clearance.targetUm"]);
  });

  it("refuses negative or absurd figures with the field named", () => {
    expect(paths({ ...base, clearance: { minUm: -1, maxUm: 60 } })).toEqual(["clearance.minUm"]);
    expect(paths({ ...base, spindleRpm: 50_000 })).toEqual(["spindleRpm"]);
    expect(paths({ ...base, targetCrosshatchDeg: 0 })).toEqual(["targetCrosshatchDeg"]);
    expect(paths({ ...base, pressures: { finish: -2 } })).toEqual(["pressures.finish"]);
    expect(paths({ ...base, cylinders: [{ cylinder: 1, bore: { kind: "diameter", diameterUm: 5 } }] })).toEqual(["cylinders.0.bore.diameterUm"]);
  });

  it("refuses NaN, which the wizard sends for text that is not a length", () => {
    expect(paths({ ...base, clearance: { minUm: Number.NaN, maxUm: 60 } })).toEqual(["clearance.minUm"]);
  });

  it("refuses a cylinder listed twice", () => {
    expect(paths({ ...base, cylinders: [{ cylinder: 2 }, { cylinder: 2 }] })).toEqual(["cylinders.1.cylinder"]);
  });

  it("accepts a quick plan from stock alone and refuses one without a bore figure", () => {
    const quick = { mode: "quick", boreMaterial: "grey_iron", boreLengthUm: 140_000, pistonDiameterUm: 93_920, machineId: "m-1", clearance: { minUm: 40, maxUm: 60 } };
    expect(paths({ ...quick, bore: { kind: "stock", stockUm: 70 } })).toEqual([]);
    expect(paths({ ...quick, bore: { kind: "readings" } })).toEqual(["bore.kind"]);
    expect(quickSaveSchema.safeParse({ plan: { ...quick, bore: { kind: "stock", stockUm: 70 } }, job: { engineDescription: "x", cylinderCount: 0, standardBoreUm: 94_000 } }).success).toBe(false);
  });

  it("asks for a reason to withdraw", () => {
    expect(withdrawSchema.safeParse({ reason: "  " }).success).toBe(false);
    expect(withdrawSchema.parse({ reason: " Pistons changed " }).reason).toBe("Pistons changed");
  });
});
