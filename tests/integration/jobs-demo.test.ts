import { describe, expect, it } from "vitest";
import { createShopWithMembers } from "../support/fixtures";
import { seedDemoJobs } from "@/server/demo/jobs";
import { getJobDetail } from "@/server/jobs/detail";
import { listJobs, listDashboardJobs } from "@/server/jobs/queries";
import { seedDemoStones } from "@/server/demo/stones";
import { planRequestSchema } from "@/shared/plans/schema";
import { previewRequest } from "@/server/plans/preview";
import { getWizardContext } from "@/server/plans/wizard";
import { profileTaperUm } from "@/lib/honing/profile";

describe("demo jobs", () => {
  it("seeds a measured six-cylinder job with pistons and a proposed oversize, and a job in work", async () => {
    const s = await createShopWithMembers("demo-jobs");
    await seedDemoJobs({ shopId: s.shopId, signIns: [], userIdsByRole: Object.fromEntries(Object.entries(s.actors).map(([r, a]) => [r, a.userId])) });
    const list = await listJobs({ actor: s.actors.machinist, query: { sort: "number", dir: "asc" } });
    expect(list.rows.map((r) => r.cylinderCount)).toEqual([6, 4]);
    const detail = await getJobDetail({ actor: s.actors.machinist, jobId: list.rows[0]!.id });
    expect(detail.job.status).toBe("measured");
    expect(detail.readingSets).toHaveLength(6);
    expect(detail.pistons).toHaveLength(6);
    expect(detail.summary.worst?.cylinder).toBe(5);
    expect(detail.summary.oversize).toMatchObject({ ok: true, stepUm: 250 });
    // As received, the +0.25 mm pistons do not fit yet: the summary says so as information, not as an error.
    expect(detail.summary.pairing?.result.ok).toBe(false);
    expect(detail.summary.warnings.map((w) => w.code)).toContain("NO_FIT_YET");
    const dash = await listDashboardJobs({ actor: s.actors.apprentice });
    expect(dash.inWork).toHaveLength(1);
    expect(dash.dueSoon).toHaveLength(2);
  });

  it("the demo jobs plan as issue 10 asks: the worn six bores first, the bored four's tapered cylinder is corrected without overshoot", async () => {
    const s = await createShopWithMembers("demo-plans");
    const context = { shopId: s.shopId, signIns: [], userIdsByRole: Object.fromEntries(Object.entries(s.actors).map(([r, a]) => [r, a.userId])) };
    await seedDemoStones(context);
    await seedDemoJobs(context);
    const actor = s.actors.machinist;
    const [six, four] = (await listJobs({ actor, query: { sort: "number", dir: "asc" } })).rows;
    const planOf = async (jobId: string) => {
      const wizard = await getWizardContext({ actor, jobId });
      return previewRequest({ actor, request: planRequestSchema.parse(wizard.initialDraft) });
    };
    const worn = await planOf(six!.id);
    expect(worn.cylinders).toHaveLength(6);
    for (const c of worn.cylinders) expect(c.plan!.stages[0]!.kind).toBe("bore");
    expect(worn.canRelease).toBe(true);
    const bored = await planOf(four!.id);
    expect(bored.canRelease).toBe(true);
    const tapered = bored.cylinders.find((c) => c.cylinder === 3)!.plan!;
    expect(tapered.stages.some((st) => st.kind === "bore")).toBe(false);
    expect(tapered.taperCorrection).toMatchObject({ end: "bottom" });
    for (const level of tapered.expectedFinal!) {
      expect(Math.min(level.aUm, level.bUm)).toBeGreaterThanOrEqual(tapered.sizing!.minUm - 1e-6);
      expect(Math.max(level.aUm, level.bUm)).toBeLessThanOrEqual(tapered.sizing!.maxUm + 1e-6);
    }
    expect(profileTaperUm(tapered.expectedFinal!)).toBeLessThanOrEqual(10);
  });
});
