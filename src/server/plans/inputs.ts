import "server-only";
import type { MachineInput, PlanJobInput, StoneInput } from "@/lib/honing";
import type { BoreMaterial } from "@/lib/bore-materials";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, type FieldErrors } from "@/server/errors";
import { getShopSettings } from "@/server/shop-settings/queries";
import type { Job } from "@/server/db/schema";
import { getPlanningLibrary, libraryFromRecords, type PlanningLibrary, type PlanningStone } from "./library";
import { loadJobPlanningRecords, type JobPlanningRecords } from "./records";
import type { Tx } from "@/server/db";
import { currentPlanningRecords } from "./records-cache";
import { STONE_ROLES } from "@/shared/stones/constants";
import { jobCylinderInputs, pistonInput, resolveCylinders, type CylinderBasis } from "./cylinders";
import type { JobPlanRequest, PlanRequest, QuickPlanRequest } from "@/shared/plans/schema";

// Loads everything a plan rests on through the server layer and builds planHoneJob's input.

type Options = Omit<PlanRequest, "mode">;

export type BuiltPlanInput = {
  input: PlanJobInput;
  bases: CylinderBasis[];
  library: PlanningLibrary;
  job: Pick<Job, "id" | "number" | "engineDescription" | "boreMaterial" | "boreLengthUm" | "bottomClearanceUm" | "cylinderCount" | "standardBoreUm"> | null;
  boreMaterial: BoreMaterial;
};

/** Stones in planHone's order of preference: the machinist's pick per role first. */
function orderStones(stones: PlanningStone[], stoneIds: Options["stoneIds"]): StoneInput[] {
  const errors: FieldErrors = {};
  for (const role of STONE_ROLES) {
    const wanted = stoneIds[role];
    if (wanted && !stones.some((s) => s.id === wanted && s.role === role)) {
      errors[`stoneIds.${role}`] = [`Pick a ${role} stone that has a rate row for this bore material.`];
    }
  }
  if (Object.keys(errors).length > 0) throw new AppError("bad_request", "Some fields need attention.", { fieldErrors: errors });
  const rank = (s: PlanningStone) => (stoneIds[s.role] === s.id ? 0 : 1);
  return [...stones].sort((a, b) => rank(a) - rank(b)).map((s) => s.input);
}

/** A held spindle speed narrows the machine's range to that speed; it must be one the machine runs. */
function machineFor(library: PlanningLibrary, spindleRpm: number | null | undefined): MachineInput {
  if (spindleRpm == null) return library.machineInput;
  const { spindleRpmMin: min, spindleRpmMax: max } = library.machineInput;
  if (spindleRpm < min || spindleRpm > max) {
    const message = `${library.machine.name} runs the spindle at ${min}–${max} rpm.`;
    throw new AppError("bad_request", message, { fieldErrors: { spindleRpm: [message] } });
  }
  return { ...library.machineInput, spindleRpmMin: spindleRpm, spindleRpmMax: spindleRpm };
}

/** Pressures must lie in the machine's range where the rate row speaks the machine's unit. */
function checkPressures(library: PlanningLibrary, options: Options): void {
  const errors: FieldErrors = {};
  const { pressureMin, pressureMax, pressureUnit, name } = library.machine;
  for (const role of STONE_ROLES) {
    const pressure = options.pressures[role];
    const stone = library.stones.find((s) => s.role === role && (options.stoneIds[role] ? s.id === options.stoneIds[role] : true));
    if (pressure == null || !stone || stone.rate.pressureUnit !== pressureUnit) continue;
    if (pressure < pressureMin || pressure > pressureMax) errors[`pressures.${role}`] = [`${name} sets ${pressureMin}–${pressureMax} ${pressureUnit}.`];
  }
  if (Object.keys(errors).length > 0) throw new AppError("bad_request", "Some fields need attention.", { fieldErrors: errors });
}

type SizingSettings = JobPlanningRecords["sizing"];

/** The boring stage as the machinist chose it, or on above the shop's threshold (one sizing story, lib sizeJob). */
function boringOf(options: Options, sizing: SizingSettings) {
  if (options.boring.enabled === false) return undefined;
  const base = { marginUm: options.boring.marginUm ?? sizing.boringMarginUm, surfaceRzUm: sizing.boringRzUm };
  return options.boring.enabled === true ? base : { ...base, onlyAboveStockUm: sizing.boreAboveStockUm };
}

/** What the first stones must clean up when the plan hones without boring: boring marks or a worn surface. */
function incomingSurfaceOf(state: "as_received" | "bored", sizing: SizingSettings) {
  return state === "bored" ? { rzUm: sizing.boringRzUm } : { cleanupStockUm: sizing.asReceivedCleanupUm };
}

function sharedInput(library: PlanningLibrary, options: Options, tolerances: { taperUm: number; outOfRoundUm: number }, sizing: SizingSettings) {
  checkPressures(library, options);
  const pressures = Object.fromEntries(STONE_ROLES.flatMap((r) => (options.pressures[r] == null ? [] : [[r, options.pressures[r]!]])));
  return {
    stones: orderStones(library.stones, options.stoneIds),
    machine: machineFor(library, options.spindleRpm),
    pressures,
    checkpointFraction: options.checkpointFraction,
    targetCrosshatchDeg: options.targetCrosshatchDeg,
    overtravelFraction: options.overtravelFraction ?? undefined,
    boring: boringOf(options, sizing),
    taperToleranceUm: tolerances.taperUm,
    outOfRoundToleranceUm: tolerances.outOfRoundUm,
  };
}

/** With `tx`, reads inside that transaction and past the records cache (it must never keep uncommitted rows). */
export async function buildJobPlanInput({ actor, request, tx }: { actor: Actor; request: JobPlanRequest; tx?: Tx }): Promise<BuiltPlanInput> {
  assertCan(actor, "plans.create");
  const records = tx
    ? await loadJobPlanningRecords({ actor, jobId: request.jobId, machineId: request.machineId, tx })
    : (await currentPlanningRecords({ actor, jobId: request.jobId, machineId: request.machineId })).records;
  return jobPlanInputFrom(request, records);
}

/** planHoneJob's input for a job request from its planning records (already loaded for the actor). */
export function jobPlanInputFrom(request: JobPlanRequest, records: JobPlanningRecords): BuiltPlanInput {
  const { job, cylinders, sets, pistons, tolerances, machine, stones, sizing } = records;
  const library = libraryFromRecords(machine, stones);
  const bases = resolveCylinders({ request, cylinders, sets, pistons });
  const shared = sharedInput(library, request, tolerances, sizing);
  const cylinderInputs = jobCylinderInputs(bases, request.cylinders, request.clearance).map((c, i) => {
    const state = request.incomingSurface ?? (bases[i]?.bore?.readingKind === "after_boring" ? "bored" : "as_received");
    return { ...c, incomingSurface: incomingSurfaceOf(state, sizing) };
  });
  const firstPiston = cylinderInputs[0]?.piston ?? pistonInput(job.standardBoreUm, request.clearance);
  return {
    input: { ...shared, piston: firstPiston, boreLengthUm: job.boreLengthUm, bottomClearanceUm: job.bottomClearanceUm ?? undefined, cylinders: cylinderInputs },
    bases, library, boreMaterial: job.boreMaterial,
    job: {
      id: job.id, number: job.number, engineDescription: job.engineDescription, boreMaterial: job.boreMaterial, boreLengthUm: job.boreLengthUm,
      bottomClearanceUm: job.bottomClearanceUm, cylinderCount: job.cylinderCount, standardBoreUm: job.standardBoreUm,
    },
  };
}

export async function buildQuickPlanInput({ actor, request }: { actor: Actor; request: QuickPlanRequest }): Promise<BuiltPlanInput> {
  assertCan(actor, "plans.create");
  const [settings, library] = await Promise.all([
    getShopSettings({ shopId: actor.shopId }),
    getPlanningLibrary({ actor, boreMaterial: request.boreMaterial, machineId: request.machineId }),
  ]);
  const shared = sharedInput(library, request, { taperUm: settings.taperToleranceUm, outOfRoundUm: settings.outOfRoundToleranceUm }, settings);
  const piston = pistonInput(request.pistonDiameterUm, request.clearance);
  const basis: CylinderBasis = {
    cylinder: 1, cylinderId: "", needs: [],
    piston: { source: "typed", pistonId: null, label: "typed", diameterUm: request.pistonDiameterUm, sizingHeightUm: null },
    bore: { basis: request.bore.kind, readingSetId: null, readingKind: null, takenAt: null, levels: [] },
  };
  return {
    input: {
      ...shared, piston, boreLengthUm: request.boreLengthUm, bottomClearanceUm: request.bottomClearanceUm ?? undefined,
      cylinders: [{ cylinder: 1, bore: request.bore, piston, incomingSurface: incomingSurfaceOf(request.incomingSurface ?? "as_received", settings) }],
    },
    bases: [basis], library, job: null, boreMaterial: request.boreMaterial,
  };
}

export function buildPlanInput({ actor, request }: { actor: Actor; request: PlanRequest }): Promise<BuiltPlanInput> {
  return request.mode === "job" ? buildJobPlanInput({ actor, request }) : buildQuickPlanInput({ actor, request });
}
