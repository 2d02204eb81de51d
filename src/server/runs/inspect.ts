import "server-only";
import { and, desc, eq, inArray, sql } from "drizzle-orm";
import { inspectCylinder, inspectJob, type CylinderVerdict, type SurfaceTargets } from "@/lib/honing";
import { db, type Tx } from "@/server/db";
import { finalInspections, jobs, plans, rateRows, type FinalInspectionRow } from "@/server/db/schema";
import type { Actor } from "@/shared/auth/policy";
import { AppError } from "@/server/errors";
import { fromJson } from "@/server/plans/store";
import { correctedLevels, cylinderProgress } from "@/shared/floor/outcome";
import { inspectionSubmissionSchema } from "@/shared/floor/schemas";
import { assertMayLog, loadFloorCylinder, runView, type LoadedCylinder } from "./load";
import { queueFloorNotice } from "./notices";
import { writeOnce } from "./exactly-once";
import { getFloorSettings } from "@/server/shop-settings/floor";
import { assertSurfaceReport } from "./surface-report";

// The final check of a cylinder, written exactly once like a run (src/server/runs/submit-run.ts).

export type InspectionView = { id: string; cylinder: number; status: FinalInspectionRow["status"]; verdict: CylinderVerdict; inspectedAt: string };

const inspectionView = (r: FinalInspectionRow): InspectionView => ({
  id: r.id, cylinder: r.cylinderNumber, status: r.status, verdict: fromJson<CylinderVerdict>(r.verdict), inspectedAt: r.inspectedAt.toISOString(),
});

async function storedAnswer(actor: Actor, id: string): Promise<InspectionView | null> {
  const [row] = await db.select().from(finalInspections).where(eq(finalInspections.id, id)).limit(1);
  if (!row) return null;
  if (row.shopId !== actor.shopId) throw new AppError("conflict", "This entry's device id is already taken; make the entry again.");
  return inspectionView(row);
}

/** The plateau stone's roughness from its rate row as the surface targets: Ra and Rz at most the row's [rate table]. */
async function surfaceTargets(tx: Tx, loaded: LoadedCylinder): Promise<SurfaceTargets | null> {
  const position = loaded.stages.findIndex((s) => s.kind === "plateau");
  const rateRowId = loaded.stageRows[position]?.rateRowId;
  if (!rateRowId) return null;
  const [row] = await tx.select({ raUm: rateRows.raUm, rzUm: rateRows.rzUm }).from(rateRows).where(and(eq(rateRows.id, rateRowId), eq(rateRows.shopId, loaded.plan.shopId))).limit(1);
  return row ? { raUm: { max: row.raUm }, rzUm: { max: row.rzUm } } : null;
}

/** The latest verdict of every cylinder of the plan, this one's included. */
async function jobVerdict(tx: Tx, loaded: LoadedCylinder) {
  const rows = await tx.select({ cylinder: finalInspections.cylinderNumber, status: finalInspections.status })
    .from(finalInspections)
    .where(and(eq(finalInspections.shopId, loaded.plan.shopId), eq(finalInspections.planId, loaded.plan.id)))
    .orderBy(desc(finalInspections.createdAt));
  return inspectJob(loaded.summary.cylinders.map((c) => ({ cylinder: c.cylinder, verdict: rows.find((r) => r.cylinder === c.cylinder)?.status ?? null })));
}

async function write(tx: Tx, actor: Actor, input: ReturnType<typeof inspectionSubmissionSchema.parse>) {
  const loaded = await loadFloorCylinder({ actor, planId: input.planId, cylinder: input.cylinder, tx, forUpdate: true });
  assertMayLog(actor, loaded.job, loaded.cylinderRow);
  if (loaded.plan.status !== "released") throw new AppError("conflict", `This plan is ${loaded.plan.status}; its final checks are closed.`);
  const progress = cylinderProgress(loaded.stages, loaded.runRows.map(runView), null);
  if (progress.state !== "inspect") throw new AppError("conflict", "Finish every stage of this cylinder before its final check.");
  const levels = correctedLevels(input.readings, input.temperatures, loaded.boreMaterial);
  const { maxTemperatureDifferenceK } = await getFloorSettings({ shopId: actor.shopId, tx });
  if (input.surfaceReportId) await assertSurfaceReport(tx, loaded, input.surfaceReportId);
  const verdict = inspectCylinder({
    levels, band: loaded.sizing, tolerances: { taperUm: loaded.finalCheck.taperToleranceUm, outOfRoundUm: loaded.finalCheck.outOfRoundToleranceUm },
    piston: { diameterUm: loaded.sizing.pistonDiameterUm, clearanceMinUm: loaded.sizing.clearanceMinUm, clearanceMaxUm: loaded.sizing.clearanceMaxUm },
    temperatures: input.temperatures, maxTemperatureDifferenceK, surface: input.surface, surfaceTargets: await surfaceTargets(tx, loaded),
  });
  await tx.insert(finalInspections).values({
    id: input.id, shopId: actor.shopId, planId: loaded.plan.id, jobId: loaded.job.id, cylinderId: loaded.cylinderRow.id, cylinderNumber: input.cylinder,
    readingsRaw: input.readings, readings: levels, blockTemperatureC: input.temperatures?.blockC ?? null, gaugeTemperatureC: input.temperatures?.gaugeC ?? null,
    surface: input.surface, surfaceReportId: input.surfaceReportId, status: verdict.status, verdict, inspectedBy: actor.userId, inspectedAt: new Date(input.inspectedAt),
  });
  const job = `job #${loaded.job.number}`;
  if (verdict.status === "fail") {
    return queueFloorNotice(tx, loaded.plan, input.cylinder, {
      kind: "floor.cylinder_failed", subject: `Job #${loaded.job.number}, cylinder ${input.cylinder} failed its final check`,
      lines: [`Cylinder ${input.cylinder} of ${job} failed its final check.`, ...verdict.failures.map((f) => f.message)],
    });
  }
  if (verdict.status !== "pass" || (await jobVerdict(tx, loaded)).status !== "pass") return null;
  await tx.update(plans).set({ status: "done", updatedAt: sql`CURRENT_TIMESTAMP(3)` }).where(and(eq(plans.id, loaded.plan.id), eq(plans.shopId, actor.shopId)));
  await tx.update(jobs).set({ status: "inspected", updatedAt: sql`CURRENT_TIMESTAMP(3)` })
    .where(and(eq(jobs.id, loaded.job.id), eq(jobs.shopId, actor.shopId), inArray(jobs.status, ["received", "measured", "planned", "in_work"])));
  return queueFloorNotice(tx, loaded.plan, input.cylinder, {
    kind: "floor.job_passed", subject: `Job #${loaded.job.number}: every cylinder passed its final check`,
    lines: [`Cylinder ${input.cylinder} was the last of ${job} to pass its final check; the job is inspected.`],
  });
}

/** Records the final reading set of a cylinder and its verdict; the job is inspected when every cylinder passes. */
export async function submitInspection({ actor, input }: { actor: Actor; input: unknown }): Promise<InspectionView> {
  const parsed = inspectionSubmissionSchema.parse(input);
  return writeOnce({ read: () => storedAnswer(actor, parsed.id), write: (tx) => write(tx, actor, parsed), what: "final check" });
}
