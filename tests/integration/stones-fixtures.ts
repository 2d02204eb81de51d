// Valid inputs for the stone-library tests (invented test values inside the physical limits).
import type { Actor } from "@/shared/auth/policy";
import { createStone } from "@/server/stones/mutations";
import { createRateRow } from "@/server/stones/rate-mutations";
import { createMachine } from "@/server/machines/mutations";

let counter = 0;
export const uniqueCode = (prefix = "T") => `${prefix}-${Date.now().toString(36)}-${counter++}`;

export function stoneInput(overrides: Record<string, unknown> = {}) {
  return {
    code: uniqueCode(), role: "coarse", abrasive: "silicon_carbide", grit: "F150", bond: "vitrified",
    stoneLengthUm: 100_000, stoneWidthUm: 6_000, stonesPerHead: 4, startHeightUm: 8_000, wearLimitHeightUm: 2_000,
    currentHeightUm: 7_000, notes: "", ...overrides,
  };
}

export function rateInput(stoneId: string, overrides: Record<string, unknown> = {}) {
  return {
    stoneId, boreMaterial: "grey_iron", removalPerDoubleStrokeUm: 1.5, referencePressure: 10, referencePressureUnit: "bar",
    referenceBoreLengthUm: 140_000, raUm: 1.6, rzUm: 11, cleanupMode: "explicit", cleanupStockUm: 20,
    wearUmPerUmStock: 0.5, uncertaintyFraction: 0.25, source: "shop_measurement", notes: "", ...overrides,
  };
}

export function machineInput(overrides: Record<string, unknown> = {}) {
  return {
    name: `Test hone ${uniqueCode("M")}`, spindleRpmMin: 80, spindleRpmMax: 400, doubleStrokesPerMinMin: 20, doubleStrokesPerMinMax: 120,
    maxStrokeLengthUm: 220_000, drive: "constant", pressureUnit: "bar", pressureMin: 2, pressureMax: 25, headStoneLengthUm: 100_000, notes: "",
    ...overrides,
  };
}

/** A stone with one grey-iron rate row, made by the given editor. */
export async function stoneWithRate(actor: Actor, stone: Record<string, unknown> = {}, rate: Record<string, unknown> = {}) {
  const { stoneId } = await createStone({ actor, input: stoneInput(stone) });
  const { rateRowId } = await createRateRow({ actor, input: rateInput(stoneId, rate) });
  return { stoneId, rateRowId };
}

export async function machineFor(actor: Actor, overrides: Record<string, unknown> = {}) {
  return createMachine({ actor, input: machineInput(overrides) });
}

/** The field errors of a rejected call, or a failure if it did not reject with them. */
export async function fieldErrorsOf(promise: Promise<unknown>): Promise<Record<string, string[]>> {
  try {
    await promise;
  } catch (error) {
    const e = error as { fieldErrors?: Record<string, string[]>; issues?: Array<{ path: PropertyKey[]; message: string }> };
    if (e.fieldErrors) return e.fieldErrors;
    if (e.issues) {
      const out: Record<string, string[]> = {};
      for (const issue of e.issues) (out[issue.path.join(".") || "_form"] ??= []).push(issue.message);
      return out;
    }
    throw error;
  }
  throw new Error("expected a validation error");
}
