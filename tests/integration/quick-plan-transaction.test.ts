// Issue 15 §6: a quick plan is saved in ONE transaction: the job, its cylinders and the plan commit or
// roll back together. A failure between the steps (here: writing the plan) leaves no job behind, and
// the device's ids make the retry finish with the same job and plan.
import { beforeAll, describe, expect, it, vi } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { cylinders, jobs, plans } from "@/server/db/schema";
import { saveQuickPlan } from "@/server/plans/mutations";
import type * as Store from "@/server/plans/store";
import { newClientId } from "@/shared/client-id";
import { BORE_LENGTH_UM, CLEARANCE, PISTON_UM, createPlanShop, type PlanShop } from "./plans-fixtures";

const failPlanWrite = vi.hoisted(() => ({ once: false }));
vi.mock("@/server/plans/store", async (original) => {
  const actual = await original<typeof Store>();
  return {
    ...actual,
    insertPlan: async (...args: Parameters<typeof actual.insertPlan>) => {
      if (failPlanWrite.once) {
        failPlanWrite.once = false;
        throw new Error("injected: the plan write failed after the job was made");
      }
      return actual.insertPlan(...args);
    },
  };
});

let shop: PlanShop;
beforeAll(async () => {
  shop = await createPlanShop("quick-plan-tx");
});

const shopJobs = () => db.select({ id: jobs.id, number: jobs.number }).from(jobs).where(eq(jobs.shopId, shop.shopId));

describe("quick plan save", () => {
  it("leaves nothing when the plan write fails, and the retry finishes with the same job and plan", async () => {
    const plan = { mode: "quick", boreMaterial: "grey_iron", boreLengthUm: BORE_LENGTH_UM, pistonDiameterUm: PISTON_UM, bore: { kind: "stock", stockUm: 70 }, machineId: shop.machineId, clearance: CLEARANCE };
    const input = { plan, job: { engineDescription: "Quick plan, one transaction (invented)", cylinderCount: 3, standardBoreUm: 94_000 }, clientId: newClientId(), jobClientId: newClientId() };
    const before = await shopJobs();

    failPlanWrite.once = true;
    await expect(saveQuickPlan({ actor: shop.actors.machinist, input })).rejects.toThrow(/injected/);
    expect(await shopJobs()).toEqual(before);
    expect(await db.select().from(cylinders).where(eq(cylinders.jobId, input.jobClientId))).toHaveLength(0);
    expect(await db.select().from(plans).where(eq(plans.id, input.clientId))).toHaveLength(0);

    const saved = await saveQuickPlan({ actor: shop.actors.machinist, input });
    expect(saved).toEqual({ planId: input.clientId, jobId: input.jobClientId });
    expect(await saveQuickPlan({ actor: shop.actors.machinist, input })).toEqual(saved);
    const after = await shopJobs();
    expect(after).toHaveLength(before.length + 1);
    // The failed attempt used up no job number.
    expect(after.find((j) => j.id === saved.jobId)!.number).toBe(Math.max(0, ...before.map((j) => j.number)) + 1);
    expect(await db.select().from(cylinders).where(eq(cylinders.jobId, saved.jobId))).toHaveLength(3);
    expect(await db.select({ id: plans.id }).from(plans).where(eq(plans.jobId, saved.jobId))).toEqual([{ id: saved.planId }]);
  });

  it("two sends at once with the same ids make one job and one plan", async () => {
    const plan = { mode: "quick", boreMaterial: "grey_iron", boreLengthUm: BORE_LENGTH_UM, pistonDiameterUm: PISTON_UM, bore: { kind: "stock", stockUm: 70 }, machineId: shop.machineId, clearance: CLEARANCE };
    const input = { plan, job: { engineDescription: "Quick plan sent twice (invented)", cylinderCount: 2, standardBoreUm: 94_000 }, clientId: newClientId(), jobClientId: newClientId() };
    const [a, b] = await Promise.all([saveQuickPlan({ actor: shop.actors.machinist, input }), saveQuickPlan({ actor: shop.actors.machinist, input })]);
    expect(b).toEqual(a);
    expect(await db.select().from(jobs).where(eq(jobs.id, input.jobClientId))).toHaveLength(1);
    expect(await db.select({ id: plans.id }).from(plans).where(eq(plans.jobId, input.jobClientId))).toHaveLength(1);
  });
});
