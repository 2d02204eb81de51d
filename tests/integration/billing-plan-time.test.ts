import { describe, expect, it } from "vitest";
import { planTimeFor } from "@/server/billing/plan-time";
import { updateBillingSettings } from "@/server/billing/settings";
import { savePlanDraft } from "@/server/plans/mutations";
import { getPlan } from "@/server/plans/queries";
import { baseRequest, createPlanJob, createPlanShop } from "./plans-fixtures";
import { logRunsAsPlanned } from "./billing-fixtures";

const settings = { currency: "EUR", paymentTermsDays: 30, paymentTermsNote: "", invoicePrefix: "T-", cylinderSetUpMin: 4, stoneChangeMin: 1.5, jobSetUpMin: 20 };

describe("machine time of a plan", () => {
  it("times each stage as strokes ÷ rate, adds the allowances from settings, and shows logged time once runs exist", async () => {
    const shop = await createPlanShop("plan-time");
    await updateBillingSettings({ actor: shop.actors.owner, input: settings });
    const job = await createPlanJob(shop.actors.machinist, 2);
    const { planId } = await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) });
    const plan = await getPlan({ actor: shop.actors.machinist, jobId: job.jobId, planId });
    const before = await planTimeFor({ actor: shop.actors.apprentice, planId, cylinders: plan.cylinders });

    expect(before.allowances).toEqual({ cylinderSetUpMin: 4, stoneChangeMin: 1.5, jobSetUpMin: 0 }); // no torque plate on this job
    for (const [i, c] of before.cylinders.entries()) {
      const hone = plan.cylinders[i]!.plan.stages.filter((s) => s.kind !== "bore");
      const spindle = hone.reduce((n, s) => n + s.strokes.nominal / s.speeds.doubleStrokesPerMin + (s.dwell ? s.dwell.doubleStrokes.nominal / s.dwell.speeds.doubleStrokesPerMin : 0), 0);
      expect(c.planned.spindleMin).toBeCloseTo(spindle, 9);
      expect(c.stages.reduce((n, s) => n + s.plannedMin, 0)).toBeCloseTo(spindle, 9);
      expect(c.planned.totalMin).toBeCloseTo(spindle + 4 + 1.5 * c.planned.stoneChanges, 9);
      expect(c.logged).toBeNull();
    }
    expect(before.plannedTotalMin).toBeCloseTo(before.cylinders.reduce((n, c) => n + c.planned.totalMin, 0), 9);
    expect(before.loggedTotalMin).toBeNull();

    await logRunsAsPlanned(shop.actors.machinist, planId, [1], 0.5);
    const after = await planTimeFor({ actor: shop.actors.apprentice, planId, cylinders: plan.cylinders });
    const [one, two] = after.cylinders;
    expect(one!.logged!.spindleMin).toBeGreaterThan(0);
    expect(one!.logged!.spindleMin).toBeLessThan(one!.planned.spindleMin);
    expect(two!.logged).toBeNull();
    expect(after.loggedTotalMin).toBeCloseTo(one!.logged!.totalMin, 9);
  });
});
