import { describe, expect, it } from "vitest";
import { seedDemoRecordJob } from "@/server/demo/record";
import { seedDemoStones } from "@/server/demo/stones";
import { getRecordView } from "@/server/records/queries";
import { createShopWithMembers } from "../support/fixtures";

describe("demo record job", () => {
  it("seeds a job that passed final inspection, so its record can be made", async () => {
    const s = await createShopWithMembers("demo-record");
    const context = { shopId: s.shopId, signIns: [], userIdsByRole: Object.fromEntries(Object.entries(s.actors).map(([r, a]) => [r, a.userId])) };
    await seedDemoStones(context);
    const { jobId } = await seedDemoRecordJob(context);
    const record = await getRecordView({ actor: s.actors.machinist, jobId, unitSystem: "metric" });
    expect(record.job.engineDescription).toMatch(/demo/);
    expect(record.cylinders.map((c) => c.number)).toEqual([1, 2]);
    expect(record.cylinders[0]!.finish.map((f) => f.name)).toEqual(["Ra", "Rz", "Rk", "Rpk", "Rvk"]);
  });
});
