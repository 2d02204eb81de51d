import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { learnedRates, machines, rateRows, stones, type RateRow, type Stone } from "@/server/db/schema";
import { formatGrit, type GritScale, type MachineInput, type StoneInput } from "@/lib/honing";
import type { BoreMaterial } from "@/lib/bore-materials";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, notFound } from "@/server/errors";
import { listMachines } from "@/server/machines/queries";
import { toStoneRateInput, type RateInputRow } from "@/server/stones/rate-inputs";
import type { PressureUnit } from "@/shared/stones/constants";
import type { MachineRecord, StoneRateRecord } from "./records";
import { learnedView, type LearnedView } from "@/server/learning/view";

// The one planning library for job and quick plans: what planHone needs from the shop's library for
// one bore material on one machine, with what the screens show beside it. Two readings feed the one
// builder (libraryFromRecords): job plans take the records from the single-query SQL of records.ts
// (for speed), quick plans and the planning route read them with drizzle here. A test proves the two
// readings agree (tests/integration/planning-library-readings.test.ts).

export type PlanningStone = {
  id: string;
  code: string;
  role: Stone["role"];
  gritLabel: string;
  version: number;
  stoneLengthUm: number;
  currentHeightUm: number;
  wearLimitHeightUm: number;
  rate: { id: string; version: number; referencePressure: number; pressureUnit: PressureUnit; source: RateRow["source"] };
  /** What this machine's runs say about the rate row (null before the first run of its version). */
  learned: LearnedView | null;
  input: StoneInput;
};

export type SkippedStone = { stoneId: string; code: string; reason: "no_rate_row" | "pressure_unit_mismatch" | "longer_than_stroke"; message: string };
export type PlanningMachine = MachineInput & { id: string; name: string; pressureUnit: PressureUnit; pressureMin: number; pressureMax: number; headStoneLengthUm: number };
export type PlanningLibrary = { machine: PlanningMachine; machineInput: MachineInput; stones: PlanningStone[]; skipped: SkippedStone[] };
export type LibraryRecords = { machine: MachineRecord; stones: StoneRateRecord[] };

const MACHINE_COLUMNS = {
  id: machines.id, name: machines.name, spindleRpmMin: machines.spindleRpmMin, spindleRpmMax: machines.spindleRpmMax,
  doubleStrokesPerMinMin: machines.doubleStrokesPerMinMin, doubleStrokesPerMinMax: machines.doubleStrokesPerMinMax,
  maxStrokeLengthUm: machines.maxStrokeLengthUm, drive: machines.drive, pressureUnit: machines.pressureUnit, pressureMin: machines.pressureMin,
  pressureMax: machines.pressureMax, headStoneLengthUm: machines.headStoneLengthUm, active: machines.active,
};

const STONE_RATE_COLUMNS = {
  id: stones.id, code: stones.code, role: stones.role, gritScale: stones.gritScale, gritNumber: stones.gritNumber, stoneLengthUm: stones.stoneLengthUm,
  currentHeightUm: stones.currentHeightUm, wearLimitHeightUm: stones.wearLimitHeightUm, version: stones.version,
  rateId: rateRows.id, removalPerDoubleStrokeUm: rateRows.removalPerDoubleStrokeUm, referencePressure: rateRows.referencePressure,
  referencePressureUnit: rateRows.referencePressureUnit, referenceBoreLengthUm: rateRows.referenceBoreLengthUm, raUm: rateRows.raUm, rzUm: rateRows.rzUm,
  cleanupMode: rateRows.cleanupMode, cleanupStockUm: rateRows.cleanupStockUm, cleanupRzMultiple: rateRows.cleanupRzMultiple,
  wearUmPerUmStock: rateRows.wearUmPerUmStock, uncertaintyFraction: rateRows.uncertaintyFraction, source: rateRows.source, rateVersion: rateRows.version,
  referenceAngleDeg: rateRows.referenceAngleDeg, referenceDiameterUm: rateRows.referenceDiameterUm, learnedState: learnedRates.state,
};

/**
 * The library's records read with drizzle, shaped exactly as records.ts reads them in its one query:
 * the machine (404 in another shop, 409 when retired) and every active stone with its rate row for
 * the material (rate fields null without one), by role then code.
 */
export async function readLibraryRecords({ actor, boreMaterial, machineId }: { actor: Actor; boreMaterial: BoreMaterial; machineId: string }): Promise<LibraryRecords> {
  assertCan(actor, "stones.view");
  assertCan(actor, "machines.view");
  const [machine] = await db.select(MACHINE_COLUMNS).from(machines).where(and(eq(machines.id, machineId), eq(machines.shopId, actor.shopId))).limit(1);
  if (!machine) throw notFound("That machine");
  if (!machine.active) throw new AppError("conflict", `${machine.name} is retired; choose an active machine.`);
  const records = await db
    .select(STONE_RATE_COLUMNS)
    .from(stones)
    .leftJoin(rateRows, and(eq(rateRows.stoneId, stones.id), eq(rateRows.shopId, actor.shopId), eq(rateRows.boreMaterial, boreMaterial)))
    .leftJoin(learnedRates, and(eq(learnedRates.shopId, stones.shopId), eq(learnedRates.stoneId, stones.id), eq(learnedRates.boreMaterial, rateRows.boreMaterial),
      eq(learnedRates.machineId, machineId), eq(learnedRates.rateVersion, rateRows.version)))
    .where(and(eq(stones.shopId, actor.shopId), eq(stones.active, true)))
    .orderBy(asc(stones.role), asc(stones.code));
  return { machine, stones: records };
}

export async function getPlanningLibrary(args: { actor: Actor; boreMaterial: BoreMaterial; machineId: string }): Promise<PlanningLibrary> {
  const { machine, stones: records } = await readLibraryRecords(args);
  return libraryFromRecords(machine, records);
}

/** The shop's active machines for the wizard's picker. */
export async function listActiveMachines({ actor }: { actor: Actor }) {
  return (await listMachines({ actor })).filter((m) => m.active);
}

export function toMachineInput(m: MachineRecord): MachineInput {
  return {
    spindleRpmMin: m.spindleRpmMin, spindleRpmMax: m.spindleRpmMax,
    doubleStrokesPerMinMin: m.doubleStrokesPerMinMin, doubleStrokesPerMinMax: m.doubleStrokesPerMinMax,
    maxStrokeLengthUm: m.maxStrokeLengthUm, drive: m.drive,
  };
}

/** A record whose rate row was found: every rate column is NOT NULL in the table, so all are present. */
type RatedRecord = StoneRateRecord & RateInputRow & { rateId: string; rateVersion: number; referencePressureUnit: PressureUnit; source: RateRow["source"] };
const isRated = (s: StoneRateRecord): s is RatedRecord => s.rateId !== null;

/** Why a stone cannot be planned on this machine, or null when it can. */
function skipReason(s: StoneRateRecord, m: MachineRecord): SkippedStone | null {
  const base = { stoneId: s.id, code: s.code };
  if (!isRated(s)) return { ...base, reason: "no_rate_row", message: `${s.code} has no rate row for this bore material.` };
  if (s.referencePressureUnit !== m.pressureUnit) {
    return { ...base, reason: "pressure_unit_mismatch", message: `${s.code}'s rate is at a pressure in ${s.referencePressureUnit}; ${m.name} sets pressure in ${m.pressureUnit}.` };
  }
  if (s.stoneLengthUm >= m.maxStrokeLengthUm) return { ...base, reason: "longer_than_stroke", message: `${s.code} is longer than ${m.name}'s maximum stroke.` };
  return null;
}

function planningStone(s: RatedRecord): PlanningStone {
  const learned = learnedView(s.learnedState);
  const input: StoneInput = {
    id: s.id, role: s.role, stoneLengthUm: s.stoneLengthUm, rate: toStoneRateInput(s), currentHeightUm: s.currentHeightUm, wearLimitHeightUm: s.wearLimitHeightUm,
    ...(learned && { learnedMultiplier: learned.multiplier, learnedUncertaintyFraction: learned.uncertaintyFraction }),
  };
  return {
    id: s.id, code: s.code, role: s.role, gritLabel: formatGrit({ scale: s.gritScale as GritScale, number: s.gritNumber }), version: s.version,
    stoneLengthUm: s.stoneLengthUm, currentHeightUm: s.currentHeightUm, wearLimitHeightUm: s.wearLimitHeightUm,
    rate: { id: s.rateId, version: s.rateVersion, referencePressure: s.referencePressure, pressureUnit: s.referencePressureUnit, source: s.source },
    learned, input,
  };
}

/** The planning library built from its records, whichever reading loaded them. */
export function libraryFromRecords(m: MachineRecord, records: StoneRateRecord[]): PlanningLibrary {
  const machineInput = toMachineInput(m);
  const library: PlanningLibrary = {
    machine: { id: m.id, name: m.name, pressureUnit: m.pressureUnit, pressureMin: m.pressureMin, pressureMax: m.pressureMax, headStoneLengthUm: m.headStoneLengthUm, ...machineInput },
    machineInput, stones: [], skipped: [],
  };
  for (const s of records) {
    const skipped = skipReason(s, m);
    if (skipped) library.skipped.push(skipped);
    else if (isRated(s)) library.stones.push(planningStone(s));
  }
  return library;
}
