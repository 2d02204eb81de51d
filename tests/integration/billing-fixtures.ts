// Billing test set-up: a priced shop (INVENTED demo prices) and a run log written as the plan said,
// straight into the runs table (the floor's own tests cover how runs are submitted).
import { randomUUID } from "node:crypto";
import { and, asc, eq, ne } from "drizzle-orm";
import { db } from "@/server/db";
import { cylinders, planStages, plans, runs } from "@/server/db/schema";
import { addPriceItem, addTaxRate } from "@/server/billing/settings";
import type { Actor } from "@/shared/auth/policy";

export async function priceShop(owner: Actor) {
  const rate = randomUUID();
  await addTaxRate({ actor: owner, input: { id: rate, name: "Standard (demo)", rate: "20" } });
  await addPriceItem({ actor: owner, input: { id: randomUUID(), kind: "honing", name: "Honing per cylinder (demo price)", unitPrice: "45.00", taxRateId: rate } });
  await addPriceItem({ actor: owner, input: { id: randomUUID(), kind: "machine_hour", name: "Machine time per hour (demo price)", unitPrice: "72.50", taxRateId: rate } });
  return rate;
}

/** Logs every hone stage of the listed cylinders as run in full at the planned strokes and rate. */
export async function logRunsAsPlanned(actor: Actor, planId: string, cylinderNumbers: number[], strokesScale = 1) {
  const [plan] = await db.select({ jobId: plans.jobId, machineId: plans.machineId }).from(plans).where(eq(plans.id, planId));
  const stages = await db.select().from(planStages).where(and(eq(planStages.planId, planId), ne(planStages.kind, "bore"))).orderBy(asc(planStages.cylinderNumber), asc(planStages.position));
  const cyls = await db.select({ id: cylinders.id, number: cylinders.number }).from(cylinders).where(eq(cylinders.jobId, plan!.jobId!));
  let at = Date.now() - 3_600_000;
  for (const stage of stages.filter((s) => cylinderNumbers.includes(s.cylinderNumber))) {
    await db.insert(runs).values({
      id: randomUUID(), shopId: actor.shopId, planId, planStageId: stage.id, jobId: plan!.jobId!, cylinderId: cyls.find((c) => c.number === stage.cylinderNumber)!.id,
      cylinderNumber: stage.cylinderNumber, stagePosition: stage.position, block: "full", outcome: "done", stoneId: stage.stoneId, machineId: plan!.machineId,
      doubleStrokesPerMin: stage.doubleStrokesPerMin, strokesDone: Math.round((stage.strokesNominal ?? 0) * strokesScale), stoneWearUm: 0, loggedBy: actor.userId, doneAt: new Date((at += 60_000)),
    });
  }
}
