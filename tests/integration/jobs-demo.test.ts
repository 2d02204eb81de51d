import { describe, expect, it } from "vitest";
import { createShopWithMembers } from "../support/fixtures";
import { seedDemoJobs } from "@/server/demo/jobs";
import { getJobDetail } from "@/server/jobs/detail";
import { listJobs, listDashboardJobs } from "@/server/jobs/queries";

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
});
