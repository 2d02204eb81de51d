import "server-only";
import type { HonePlan, PlanStage } from "@/lib/honing";
import type { Tx } from "@/server/db";
import { newId } from "@/server/db/ids";
import { planStages, plans, type PlanStageRow } from "@/server/db/schema";
import type { ComputedPreview, ComputedCylinder } from "./preview";
import type { PlanRequest } from "@/shared/plans/schema";

// How a computed plan is written and read back: the stages as rows (the floor reads their columns),
// everything else per cylinder as JSON. Reading back gives the same HonePlan the wizard showed.

export type StoredCylinder = Omit<ComputedCylinder, "plan"> & { plan: Omit<HonePlan, "stages"> };
export type PlanSummary = {
  job: ComputedPreview["job"];
  machine: ComputedPreview["machine"];
  stones: ComputedPreview["stones"];
  stoneHeightsAfterUm: ComputedPreview["stoneHeightsAfterUm"];
  cylinders: StoredCylinder[];
};

function stageRow(shopId: string, planId: string, preview: ComputedPreview, c: ComputedCylinder, stage: PlanStage, position: number) {
  const base = {
    id: newId(), shopId, planId, cylinderNumber: c.cylinder, position, kind: stage.kind, boreBasis: c.bore!.basis,
    stockUm: stage.stockUm, diameterBeforeUm: stage.diameterBeforeUm, detail: stage,
  };
  if (stage.kind === "bore") return { ...base, diameterAfterUm: stage.boreToUm };
  const rate = preview.rateVersions.find((v) => v.stoneId === stage.stoneId);
  return {
    ...base, diameterAfterUm: stage.expectedDiameterAfterUm, stoneId: stage.stoneId, rateRowId: rate?.rateRowId ?? null, rateRowVersion: rate?.rateRowVersion ?? null,
    strokesNominal: stage.strokes.nominal, strokesLow: stage.strokes.low, strokesHigh: stage.strokes.high,
    checkpointAfterStrokes: stage.checkpoint?.afterStrokes ?? null, pressure: stage.pressure, spindleRpm: stage.speeds.spindleRpm,
    doubleStrokesPerMin: stage.speeds.doubleStrokesPerMin, strokeLengthUm: stage.strokeSetup.strokeLengthUm,
  };
}

/** Inserts the plan and its stages inside the caller's transaction. */
export async function insertPlan(tx: Tx, input: { id?: string; shopId: string; jobId: string; userId: string; request: PlanRequest; preview: ComputedPreview }): Promise<string> {
  const { shopId, jobId, userId, request, preview } = input;
  const planId = input.id ?? newId();
  const summary: PlanSummary = {
    job: preview.job, machine: preview.machine, stones: preview.stones, stoneHeightsAfterUm: preview.stoneHeightsAfterUm,
    cylinders: preview.cylinders.map(({ plan, ...c }) => {
      const rest: Partial<HonePlan> = { ...plan! };
      delete rest.stages;
      return { ...c, plan: rest as Omit<HonePlan, "stages"> };
    }),
  };
  await tx.insert(plans).values({
    id: planId, shopId, jobId, status: "draft", machineId: preview.machine.id, boreMaterial: preview.boreMaterial, inputs: request, summary,
    rateVersions: preview.rateVersions, canRelease: preview.canRelease, createdBy: userId,
  });
  const rows = preview.cylinders.flatMap((c) => c.plan!.stages.map((stage, i) => stageRow(shopId, planId, preview, c, stage, i)));
  if (rows.length > 0) await tx.insert(planStages).values(rows);
  return planId;
}

/** MariaDB hands JSON columns back as text. */
export function fromJson<T>(value: unknown): T {
  return (typeof value === "string" ? JSON.parse(value) : value) as T;
}

/** The stored cylinders with their stages put back in order: the plan exactly as it was saved. */
export function readCylinders(summary: PlanSummary, stages: Pick<PlanStageRow, "cylinderNumber" | "position" | "detail">[]) {
  return summary.cylinders.map((c) => ({
    ...c,
    plan: {
      ...c.plan,
      stages: stages
        .filter((s) => s.cylinderNumber === c.cylinder)
        .sort((a, b) => a.position - b.position)
        .map((s) => fromJson<PlanStage>(s.detail)),
    } as HonePlan,
  }));
}
