import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { newId } from "@/server/db/ids";
import type { Actor } from "@/shared/auth/policy";
import { getPlan } from "@/server/plans/queries";
import { DEFAULT_MAX_TEMPERATURE_DIFFERENCE_K, inspectCylinder } from "@/lib/honing";
import { customers, finalInspections, jobs, plans } from "@/server/db/schema";
import { loadFloorCylinder } from "@/server/runs/load";
import { submitRun } from "@/server/runs/submit-run";
import { seedDemoFloor } from "./floor";
import type { DemoContext } from "./seed";

// A demo job that passed final inspection, for the machining record (issue 14): a second copy of the
// floor demo plan, every stage logged by the demo apprentice and every bore finished inside its band.
// Every figure and name is invented demo data.
const SURFACE = { raUm: 0.32, rzUm: 2.6, rkUm: 0.55, rpkUm: 0.15, rvkUm: 1.2 }; // under DP-800's demo targets

export async function seedDemoRecordJob(context: DemoContext): Promise<{ jobId: string }> {
  const apprenticeId = context.userIdsByRole.apprentice;
  if (!context.shopId || !apprenticeId || !context.userIdsByRole.machinist) throw new Error("seedDemoRecordJob needs the demo shop and its people.");
  const apprentice: Actor = { userId: apprenticeId, shopId: context.shopId, role: "apprentice" };
  const { planId } = await seedDemoFloor(context);
  const machinist: Actor = { userId: context.userIdsByRole.machinist, shopId: context.shopId, role: "machinist" };
  const [job] = await db.select({ id: jobs.id, customerId: jobs.customerId }).from(plans).innerJoin(jobs, eq(jobs.id, plans.jobId))
    .where(and(eq(plans.id, planId), eq(plans.shopId, context.shopId))).limit(1);
  const plan = await getPlan({ actor: machinist, jobId: job!.id, planId });
  const startedAt = Date.now() - 2 * 60 * 60 * 1000;
  let minute = 0;
  const at = () => new Date(startedAt + minute++ * 60_000).toISOString();
  for (const cylinder of plan.cylinders) {
    const stages = cylinder.plan.stages;
    for (const [position, stage] of stages.entries()) {
      if (stage.kind === "bore") continue;
      await submitRun({ actor: apprentice, input: { id: newId(), planId, cylinder: cylinder.cylinder, stagePosition: position, block: "full", strokesDone: stage.strokes.nominal, readings: null, temperatures: null, notes: "", doneAt: at() } });
    }
    const t = cylinder.plan.sizing!.targetUm;
    // Finished a little tapered and out of round, as real bores are (invented demo figures, within the band).
    const levels = [{ name: "top", aUm: t + 1.2, bUm: t + 0.8 }, { name: "middle", aUm: t + 0.6, bUm: t + 0.4 }, { name: "bottom", aUm: t, bUm: t + 0.2 }];
    await writeFinalCheck(apprentice, planId, cylinder.cylinder, levels, at());
  }
  // Every bore passed (checked above): the plan is done and the job inspected, as the floor's last pass leaves them.
  await db.update(plans).set({ status: "done" }).where(and(eq(plans.id, planId), eq(plans.shopId, context.shopId)));
  await db.update(jobs).set({ status: "inspected" }).where(and(eq(jobs.id, job!.id), eq(jobs.shopId, context.shopId)));
  await db.update(jobs).set({ engineDescription: "inline twin, 94 mm grey-iron bores (demo record job)", notes: "Demo data: invented for the machining record demo." })
    .where(and(eq(jobs.id, job!.id), eq(jobs.shopId, context.shopId)));
  if (job!.customerId) await db.update(customers).set({ name: "Record demo customer (demo)" }).where(and(eq(customers.id, job!.customerId), eq(customers.shopId, context.shopId)));
  return { jobId: job!.id };
}


/**
 * The final check as the floor writes it (src/server/runs/inspect.ts), without its mail to the lead:
 * the seed runs under the react-server condition, where the mail renderer cannot load.
 */
async function writeFinalCheck(actor: Actor, planId: string, cylinder: number, levels: { name: string; aUm: number; bUm: number }[], inspectedAt: string) {
  const loaded = await loadFloorCylinder({ actor, planId, cylinder });
  const verdict = inspectCylinder({
    levels, band: loaded.sizing, tolerances: { taperUm: loaded.finalCheck.taperToleranceUm, outOfRoundUm: loaded.finalCheck.outOfRoundToleranceUm },
    piston: { diameterUm: loaded.sizing.pistonDiameterUm, clearanceMinUm: loaded.sizing.clearanceMinUm, clearanceMaxUm: loaded.sizing.clearanceMaxUm },
    temperatures: null, maxTemperatureDifferenceK: DEFAULT_MAX_TEMPERATURE_DIFFERENCE_K, surface: SURFACE, surfaceTargets: null,
  });
  if (verdict.status !== "pass") throw new Error(`The demo record job's cylinder ${cylinder} did not pass: ${verdict.reason}`);
  await db.insert(finalInspections).values({
    id: newId(), shopId: actor.shopId, planId, jobId: loaded.job.id, cylinderId: loaded.cylinderRow.id, cylinderNumber: cylinder, readingsRaw: levels, readings: levels,
    blockTemperatureC: null, gaugeTemperatureC: null, surface: SURFACE, status: verdict.status, verdict, inspectedBy: actor.userId, inspectedAt: new Date(inspectedAt),
  });
}
