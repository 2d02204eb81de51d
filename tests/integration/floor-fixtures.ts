// A released plan for the floor tests: the plans fixtures' shop, stones and job (INVENTED test inputs),
// saved by the machinist, released by the lead, with cylinder 1 assigned to the apprentice.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import type { HoneStage, PlanStage } from "@/lib/honing";
import { db } from "@/server/db";
import { stones } from "@/server/db/schema";
import { assignCylinder } from "@/server/jobs/mutations";
import { releasePlan, savePlanDraft } from "@/server/plans/mutations";
import { getPlan } from "@/server/plans/queries";
import type { Actor } from "@/shared/auth/policy";
import type { TestShop } from "../support/fixtures";
import { baseRequest, createPlanJob, withLibrary } from "./plans-fixtures";

export type FloorPlan = Awaited<ReturnType<typeof createFloorPlan>>;

export async function createFloorPlan(shop: TestShop, cylinderCount = 1, assignTo: Actor = shop.actors.apprentice) {
  const planShop = await withLibrary(shop);
  const job = await createPlanJob(shop.actors.machinist, cylinderCount);
  const { planId } = await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(planShop, job.jobId) });
  await releasePlan({ actor: shop.actors.lead, planId });
  await assignCylinder({ actor: shop.actors.machinist, jobId: job.jobId, cylinderId: job.cylinders[0]!.id, userId: assignTo.userId });
  const plan = await getPlan({ actor: shop.actors.lead, jobId: job.jobId, planId });
  return { planShop, job, planId, plan };
}

export const honeStages = (stages: PlanStage[]) => stages.map((s, position) => ({ s, position })).filter((x): x is { s: HoneStage; position: number } => x.s.kind !== "bore");

export async function stoneHeightUm(stoneId: string): Promise<number> {
  const [row] = await db.select({ h: stones.currentHeightUm }).from(stones).where(and(eq(stones.id, stoneId))).limit(1);
  return row!.h;
}

export const levelsOf = (values: number[], names = ["top", "middle", "bottom"]) => values.map((v, i) => ({ name: names[i]!, aUm: v, bUm: v }));

export const runBody = (planId: string, over: Record<string, unknown> = {}) => ({
  id: randomUUID(), planId, cylinder: 1, stagePosition: 0, block: "full", strokesDone: 10, readings: null, temperatures: null, notes: "", doneAt: new Date().toISOString(), ...over,
});
