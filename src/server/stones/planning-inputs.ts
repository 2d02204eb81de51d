import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { machines, rateRows, stones, type Machine, type RateRow, type Stone } from "@/server/db/schema";
import type { MachineInput, StoneInput, StoneRateInput } from "@/lib/honing";
import { formatGrit, type GritScale } from "@/lib/honing";
import type { BoreMaterial } from "@/lib/bore-materials";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, notFound } from "@/server/errors";
import type { PressureUnit } from "@/shared/stones/constants";

export type PlanningStone = {
  /** Ready for planHone's `stones`. */
  input: StoneInput;
  code: string;
  gritLabel: string;
  stoneVersion: number;
  rateRowId: string;
  /** The rate row version this input was built from: a plan records it. */
  rateVersion: number;
  pressureUnit: PressureUnit;
  source: RateRow["source"];
};

export type SkippedStone = { stoneId: string; code: string; reason: "no_rate_row" | "pressure_unit_mismatch" | "longer_than_stroke"; message: string };

export type PlanningLibrary = {
  boreMaterial: BoreMaterial;
  machine: { id: string; name: string; pressureUnit: PressureUnit; pressureMin: number; pressureMax: number; headStoneLengthUm: number; input: MachineInput };
  stones: PlanningStone[];
  /** `stones.map(s => s.input)`: pass straight to planHone. */
  stoneInputs: StoneInput[];
  rateVersions: { stoneId: string; rateRowId: string; version: number }[];
  skipped: SkippedStone[];
};

export function toMachineInput(m: Machine): MachineInput {
  return {
    spindleRpmMin: m.spindleRpmMin, spindleRpmMax: m.spindleRpmMax,
    doubleStrokesPerMinMin: m.doubleStrokesPerMinMin, doubleStrokesPerMinMax: m.doubleStrokesPerMinMax,
    maxStrokeLengthUm: m.maxStrokeLengthUm, drive: m.drive,
  };
}

export function toStoneRateInput(r: RateRow): StoneRateInput {
  const cleanup = r.cleanupMode === "explicit" && r.cleanupStockUm !== null ? { cleanupStockUm: r.cleanupStockUm } : { cleanupRzMultiple: r.cleanupRzMultiple ?? undefined };
  return {
    removalPerDoubleStrokeUm: r.removalPerDoubleStrokeUm, referencePressure: r.referencePressure,
    referenceBoreLengthUm: r.referenceBoreLengthUm, uncertaintyFraction: r.uncertaintyFraction,
    raUm: r.raUm, rzUm: r.rzUm, wearUmPerUmStock: r.wearUmPerUmStock, ...cleanup,
    referenceAngleDeg: r.referenceAngleDeg, ...(r.referenceDiameterUm !== null && { referenceDiameterUm: r.referenceDiameterUm }),
  };
}

/**
 * The rate rows the honing allowance rests on: per role, the first active stone with a row for the
 * material, in the order the planning library lists them (role, then code).
 */
export async function sequenceRatesFor({ actor, boreMaterial }: { actor: Actor; boreMaterial: BoreMaterial }): Promise<Record<Stone["role"], StoneRateInput | null>> {
  assertCan(actor, "stones.view");
  const rows = await db
    .select({ role: stones.role, rate: rateRows })
    .from(stones)
    .innerJoin(rateRows, and(eq(rateRows.stoneId, stones.id), eq(rateRows.shopId, actor.shopId), eq(rateRows.boreMaterial, boreMaterial)))
    .where(and(eq(stones.shopId, actor.shopId), eq(stones.active, true)))
    .orderBy(asc(stones.role), asc(stones.code));
  const first = (role: Stone["role"]) => {
    const row = rows.find((r) => r.role === role);
    return row ? toStoneRateInput(row.rate) : null;
  };
  return { coarse: first("coarse"), finish: first("finish"), plateau: first("plateau") };
}

export function toStoneInput(s: Stone, r: RateRow): StoneInput {
  return { id: s.id, role: s.role, stoneLengthUm: s.stoneLengthUm, rate: toStoneRateInput(r), currentHeightUm: s.currentHeightUm, wearLimitHeightUm: s.wearLimitHeightUm };
}

function skipReason(s: Stone, r: RateRow | undefined, m: Machine): SkippedStone | null {
  const base = { stoneId: s.id, code: s.code };
  if (!r) return { ...base, reason: "no_rate_row", message: `${s.code} has no rate row for this bore material.` };
  if (r.referencePressureUnit !== m.pressureUnit) {
    return { ...base, reason: "pressure_unit_mismatch", message: `${s.code}'s rate is at a pressure in ${r.referencePressureUnit}; ${m.name} sets pressure in ${m.pressureUnit}.` };
  }
  if (s.stoneLengthUm >= m.maxStrokeLengthUm) return { ...base, reason: "longer_than_stroke", message: `${s.code} is longer than ${m.name}'s maximum stroke.` };
  return null;
}

/**
 * What planHone needs from the library for one bore material on one machine: the active stone sets
 * with their current rate rows (and the versions used), and the machine's limits.
 */
export async function getPlanningLibrary({ actor, boreMaterial, machineId }: { actor: Actor; boreMaterial: BoreMaterial; machineId: string }): Promise<PlanningLibrary> {
  assertCan(actor, "stones.view");
  assertCan(actor, "machines.view");
  const [machine] = await db.select().from(machines).where(and(eq(machines.id, machineId), eq(machines.shopId, actor.shopId))).limit(1);
  if (!machine) throw notFound("That machine");
  if (!machine.active) throw new AppError("conflict", `${machine.name} is retired; choose an active machine.`);
  const rows = await db
    .select({ stone: stones, rate: rateRows })
    .from(stones)
    .leftJoin(rateRows, and(eq(rateRows.stoneId, stones.id), eq(rateRows.shopId, actor.shopId), eq(rateRows.boreMaterial, boreMaterial)))
    .where(and(eq(stones.shopId, actor.shopId), eq(stones.active, true)))
    .orderBy(asc(stones.role), asc(stones.code));
  const library: PlanningLibrary = {
    boreMaterial,
    machine: { id: machine.id, name: machine.name, pressureUnit: machine.pressureUnit, pressureMin: machine.pressureMin, pressureMax: machine.pressureMax, headStoneLengthUm: machine.headStoneLengthUm, input: toMachineInput(machine) },
    stones: [], stoneInputs: [], rateVersions: [], skipped: [],
  };
  for (const { stone, rate } of rows) {
    const skipped = skipReason(stone, rate ?? undefined, machine);
    if (skipped || !rate) {
      if (skipped) library.skipped.push(skipped);
      continue;
    }
    const gritLabel = formatGrit({ scale: stone.gritScale as GritScale, number: stone.gritNumber });
    library.stones.push({ input: toStoneInput(stone, rate), code: stone.code, gritLabel, stoneVersion: stone.version, rateRowId: rate.id, rateVersion: rate.version, pressureUnit: rate.referencePressureUnit, source: rate.source });
    library.rateVersions.push({ stoneId: stone.id, rateRowId: rate.id, version: rate.version });
  }
  library.stoneInputs = library.stones.map((s) => s.input);
  return library;
}
