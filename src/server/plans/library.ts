import "server-only";
import type { MachineInput, StoneInput } from "@/lib/honing";
import type { BoreMaterial } from "@/lib/bore-materials";
import type { Actor } from "@/shared/auth/policy";
import type { RateRow, Stone } from "@/server/db/schema";
import { listMachines } from "@/server/machines/queries";
import { formatGrit, type GritScale } from "@/lib/honing";
import { getPlanningLibrary as loadLibrary, toMachineInput, toStoneInput, type SkippedStone } from "@/server/stones/planning-inputs";
import type { Machine } from "@/server/db/schema";
import type { MachineRecord, StoneRateRecord } from "./records";
import type { PressureUnit } from "@/shared/stones/constants";

// The stones engineer's getPlanningLibrary, shaped for the wizard: one record per stone with what the
// screens show beside the planHone input.

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
  input: StoneInput;
};

export type PlanningMachine = MachineInput & { id: string; name: string; pressureUnit: PressureUnit; pressureMin: number; pressureMax: number; headStoneLengthUm: number };
export type PlanningLibrary = { machine: PlanningMachine; machineInput: MachineInput; stones: PlanningStone[]; skipped: SkippedStone[] };

export async function getPlanningLibrary(args: { actor: Actor; boreMaterial: BoreMaterial; machineId: string }): Promise<PlanningLibrary> {
  const lib = await loadLibrary(args);
  const { input: machineInput, ...machine } = lib.machine;
  return {
    machine: { ...machine, ...machineInput },
    machineInput,
    skipped: lib.skipped,
    stones: lib.stones.map((s) => ({
      id: s.input.id, code: s.code, role: s.input.role, gritLabel: s.gritLabel, version: s.stoneVersion, stoneLengthUm: s.input.stoneLengthUm,
      currentHeightUm: s.input.currentHeightUm, wearLimitHeightUm: s.input.wearLimitHeightUm,
      rate: { id: s.rateRowId, version: s.rateVersion, referencePressure: s.input.rate.referencePressure, pressureUnit: s.pressureUnit, source: s.source },
      input: s.input,
    })),
  };
}

/** The shop's active machines for the wizard's picker. */
export async function listActiveMachines({ actor }: { actor: Actor }) {
  return (await listMachines({ actor })).filter((m) => m.active);
}

/** Why a stone cannot be planned on this machine (the same rules as the stones engineer's library). */
function skipReason(s: StoneRateRecord, m: MachineRecord): SkippedStone | null {
  const base = { stoneId: s.id, code: s.code };
  if (s.rateId === null) return { ...base, reason: "no_rate_row", message: `${s.code} has no rate row for this bore material.` };
  if (s.referencePressureUnit !== m.pressureUnit) {
    return { ...base, reason: "pressure_unit_mismatch", message: `${s.code}'s rate is at a pressure in ${s.referencePressureUnit}; ${m.name} sets pressure in ${m.pressureUnit}.` };
  }
  if (s.stoneLengthUm >= m.maxStrokeLengthUm) return { ...base, reason: "longer_than_stroke", message: `${s.code} is longer than ${m.name}'s maximum stroke.` };
  return null;
}

/**
 * getPlanningLibrary's result from records already loaded (plans/records.ts). The records carry
 * every field toStoneInput and toMachineInput read, hence the casts to the full row types.
 */
export function libraryFromRecords(m: MachineRecord, records: StoneRateRecord[]): PlanningLibrary {
  const machineInput = toMachineInput(m as Machine);
  const library: PlanningLibrary = {
    machine: { id: m.id, name: m.name, pressureUnit: m.pressureUnit, pressureMin: m.pressureMin, pressureMax: m.pressureMax, headStoneLengthUm: m.headStoneLengthUm, ...machineInput },
    machineInput, stones: [], skipped: [],
  };
  for (const s of records) {
    const skipped = skipReason(s, m);
    if (skipped) {
      library.skipped.push(skipped);
      continue;
    }
    const input = toStoneInput(s as unknown as Stone, s as unknown as RateRow);
    library.stones.push({
      id: s.id, code: s.code, role: s.role, gritLabel: formatGrit({ scale: s.gritScale as GritScale, number: s.gritNumber }), version: s.version,
      stoneLengthUm: s.stoneLengthUm, currentHeightUm: s.currentHeightUm, wearLimitHeightUm: s.wearLimitHeightUm,
      rate: { id: s.rateId!, version: s.rateVersion!, referencePressure: input.rate.referencePressure, pressureUnit: s.referencePressureUnit!, source: s.source! },
      input,
    });
  }
  return library;
}
