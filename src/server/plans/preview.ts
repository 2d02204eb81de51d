import "server-only";
import { planHoneJob, type HonePlan } from "@/lib/honing";
import type { Actor } from "@/shared/auth/policy";
import type { PlanRateVersion } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import { buildPlanInput, jobPlanInputFrom, type BuiltPlanInput } from "./inputs";
import { assertCanLoadPlanningRecords } from "./records";
import { planningRecordsAt } from "./records-cache";
import { readPlanningVersion } from "./planning-version";
import { planRequestSchema, type JobPlanRequest, type PlanRequest } from "@/shared/plans/schema";
import type { CylinderBasis } from "./cylinders";
import { rememberedAnswer } from "./preview-memo";
import { planView } from "./preview-view";

// The preview the wizard renders: every number comes from planHoneJob; this file only shapes it.

/** A cylinder as planned, with the full plan (what Save stores). */
export type ComputedCylinder = CylinderBasis & { plan: HonePlan | null };

function stonesView(built: BuiltPlanInput) {
  return built.library.stones.map((s) => ({
    id: s.id, code: s.code, role: s.role, gritLabel: s.gritLabel, stoneLengthUm: s.stoneLengthUm, currentHeightUm: s.currentHeightUm,
    wearLimitHeightUm: s.wearLimitHeightUm, referencePressure: s.rate.referencePressure, pressureUnit: s.rate.pressureUnit, rateSource: s.rate.source,
    learned: s.learned && { multiplier: s.learned.multiplier, low: s.learned.low, high: s.learned.high, runsUsed: s.learned.runsUsed, runsIgnored: s.learned.runsIgnored },
  }));
}

function machineView(built: BuiltPlanInput) {
  const m = built.library.machine;
  return {
    id: m.id, name: m.name, drive: m.drive, spindleRpmMin: m.spindleRpmMin, spindleRpmMax: m.spindleRpmMax,
    doubleStrokesPerMinMin: m.doubleStrokesPerMinMin, doubleStrokesPerMinMax: m.doubleStrokesPerMinMax,
    maxStrokeLengthUm: m.maxStrokeLengthUm, pressureUnit: m.pressureUnit, pressureMin: m.pressureMin, pressureMax: m.pressureMax,
    headStoneLengthUm: m.headStoneLengthUm,
  };
}

/** The rate rows (and stone versions) the plan's stages used. */
export function rateVersionsOf(built: BuiltPlanInput, cylinders: ComputedCylinder[]): PlanRateVersion[] {
  const used = new Set(cylinders.flatMap((c) => c.plan?.stages.flatMap((s) => (s.kind === "bore" ? [] : [s.stoneId])) ?? []));
  return built.library.stones
    .filter((s) => used.has(s.id))
    .map((s) => ({ stoneId: s.id, stoneVersion: s.version, rateRowId: s.rate.id, rateRowVersion: s.rate.version }));
}

export function shapePreview(request: PlanRequest, built: BuiltPlanInput) {
  const result = planHoneJob(built.input);
  const cylinders: ComputedCylinder[] = built.bases.map((basis) => ({
    ...basis,
    plan: result.cylinders.find((c) => c.cylinder === basis.cylinder)?.plan ?? null,
  }));
  const planned = cylinders.filter((c) => c.plan !== null);
  return {
    mode: request.mode,
    job: built.job,
    boreMaterial: built.boreMaterial,
    machine: machineView(built),
    stones: stonesView(built),
    cylinders,
    rateVersions: rateVersionsOf(built, cylinders),
    stoneHeightsAfterUm: result.stoneHeightsAfterUm,
    canRelease: planned.length === cylinders.length && planned.every((c) => c.plan!.canRelease),
    errorCount: cylinders.reduce((n, c) => n + c.needs.length + (c.plan?.errors.length ?? 0), 0),
    warningCount: planned.reduce((n, c) => n + c.plan!.warnings.filter((w) => w.severity === "warning").length, 0),
  };
}
export type ComputedPreview = ReturnType<typeof shapePreview>;

/** The preview as the wizard receives it: every plan cut to what the wizard shows (preview-view.ts). */
export function previewView(computed: ComputedPreview) {
  return { ...computed, cylinders: computed.cylinders.map((c) => ({ ...c, plan: c.plan && planView(c.plan) })) };
}
export type PlanPreview = ReturnType<typeof previewView>;
export type PreviewCylinder = PlanPreview["cylinders"][number];

/** Validates with the wizard's schema, loads through the server layer and plans every cylinder. */
export async function previewPlan({ actor, input }: { actor: Actor; input: unknown }): Promise<ComputedPreview> {
  return previewRequest({ actor, request: planRequestSchema.parse(input) });
}

/** The preview of a request already validated with planRequestSchema (the route's readJson). */
export async function previewRequest({ actor, request }: { actor: Actor; request: PlanRequest }): Promise<ComputedPreview> {
  const built = await buildPlanInput({ actor, request });
  return shapePreview(request, built);
}

/**
 * The job preview as JSON bytes, remembered per (shop, planning counter, request): see preview-memo.ts.
 * `counter`: the shop's planning counter if the caller already read it this request (with the session).
 */
async function jobPreviewJson(actor: Actor, request: JobPlanRequest, counter: number | null): Promise<Uint8Array<ArrayBuffer>> {
  assertCan(actor, "plans.create");
  assertCanLoadPlanningRecords(actor);
  // Counter BEFORE records: a write between the two then leaves the answer newer than its key (harmless), never older.
  const version = counter ?? (await readPlanningVersion(actor.shopId));
  return rememberedAnswer(JSON.stringify([actor.shopId, version, request]), async () => {
    const records = await planningRecordsAt({ actor, jobId: request.jobId, machineId: request.machineId }, version);
    return JSON.stringify(previewView(shapePreview(request, jobPlanInputFrom(request, records))));
  });
}

/**
 * The preview as the route sends it (JSON as UTF-8 bytes; a Response copies them, so the memo's stay
 * intact). shapePreview reads only the request's mode and the built input; a quick plan's input is
 * loaded fresh, so it and the mode are the whole memo key.
 */
export async function previewRequestJson({ actor, request, planningVersion = null }: { actor: Actor; request: PlanRequest; planningVersion?: number | null }): Promise<Uint8Array<ArrayBuffer>> {
  if (request.mode === "job") return jobPreviewJson(actor, request, planningVersion);
  const built = await buildPlanInput({ actor, request });
  const key = JSON.stringify([request.mode, built.job, built.boreMaterial, built.library, built.bases, built.input]);
  return rememberedAnswer(key, () => JSON.stringify(previewView(shapePreview(request, built))));
}
