import "server-only";
import type { MachineInput, StoneInput } from "@/lib/honing";
import type { BoreMaterial } from "@/lib/bore-materials";
import type { Actor } from "@/server/auth/policy";
import type { RateRow, Stone } from "@/server/db/schema";
import { listMachines } from "@/server/machines/queries";
import { getPlanningLibrary as loadLibrary, type SkippedStone } from "@/server/stones/planning-inputs";
import type { PressureUnit } from "@/server/stones/constants";

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
