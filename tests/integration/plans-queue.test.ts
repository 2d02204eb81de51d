import { beforeAll, describe, expect, it } from "vitest";
import { releasePlan, savePlanDraft } from "@/server/plans/mutations";
import { listPlansAwaitingRelease } from "@/server/plans/queries";
import { baseRequest, createPlanJob, createPlanShop, type PlanShop } from "./plans-fixtures";

let shop: PlanShop;
let other: PlanShop;

beforeAll(async () => {
  [shop, other] = await Promise.all([createPlanShop("queue"), createPlanShop("queue-other")]);
});

describe("plans waiting for release (dashboard)", () => {
  it("lists the shop's releasable drafts, oldest first, and drops a plan once released", async () => {
    const first = await createPlanJob(shop.actors.machinist, 2);
    const second = await createPlanJob(shop.actors.machinist, 2);
    const a = await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, first.jobId) });
    const b = await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, second.jobId) });
    const queue = await listPlansAwaitingRelease({ actor: shop.actors.lead });
    expect(queue.map((p) => p.id)).toEqual([a.planId, b.planId]);

    await releasePlan({ actor: shop.actors.lead, planId: a.planId });
    expect((await listPlansAwaitingRelease({ actor: shop.actors.lead })).map((p) => p.id)).toEqual([b.planId]);
  });

  it("never shows another shop's plans", async () => {
    const job = await createPlanJob(other.actors.machinist, 1);
    const { planId } = await savePlanDraft({ actor: other.actors.machinist, input: baseRequest(other, job.jobId) });
    const ours = await listPlansAwaitingRelease({ actor: shop.actors.lead });
    expect(ours.map((p) => p.id)).not.toContain(planId);
  });
});
