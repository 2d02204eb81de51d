// A job that passed final inspection, for the machining record's tests: the floor fixtures' released
// plan (INVENTED test inputs), every stage logged, every bore finished inside its band.
import { randomUUID } from "node:crypto";
import { submitInspection } from "@/server/runs/inspect";
import { submitRun } from "@/server/runs/submit-run";
import type { TestShop } from "../support/fixtures";
import { createFloorPlan, honeStages, runBody, type FloorPlan } from "./floor-fixtures";

export type PassedJob = FloorPlan & { finals: { cylinder: number; levels: { name: string; aUm: number; bUm: number }[] }[] };

/** Finished a little tapered, as real bores are (test values inside the band). */
export const finishedLevels = (targetUm: number, cylinder: number) => [
  { name: "top", aUm: targetUm + 1.2 + cylinder / 10, bUm: targetUm + 0.8 },
  { name: "middle", aUm: targetUm + 0.6, bUm: targetUm + 0.4 },
  { name: "bottom", aUm: targetUm, bUm: targetUm + 0.2 },
];

export async function logAllStages(shop: TestShop, floor: FloorPlan): Promise<void> {
  for (const c of floor.plan.cylinders) {
    for (const { position } of honeStages(c.plan.stages)) await submitRun({ actor: shop.actors.machinist, input: runBody(floor.planId, { cylinder: c.cylinder, stagePosition: position }) });
  }
}

export async function createPassedJob(shop: TestShop, cylinderCount = 2, surface: Record<string, number> | null = { raUm: 0.3 }): Promise<PassedJob> {
  const floor = await createFloorPlan(shop, cylinderCount);
  await logAllStages(shop, floor);
  const finals = [];
  for (const c of floor.plan.cylinders) {
    const levels = finishedLevels(c.plan.sizing!.targetUm, c.cylinder);
    await submitInspection({ actor: shop.actors.machinist, input: { id: randomUUID(), planId: floor.planId, cylinder: c.cylinder, readings: levels, temperatures: null, surface, inspectedAt: new Date().toISOString() } });
    finals.push({ cylinder: c.cylinder, levels });
  }
  return { ...floor, finals };
}
