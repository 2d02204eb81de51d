import { describe, expect, it } from "vitest";
import { seedDemoFloor } from "@/server/demo/floor";
import { seedDemoStones } from "@/server/demo/stones";
import { listFloorQueue } from "@/server/runs/queue";
import { createShopWithMembers } from "../support/fixtures";

describe("demo floor plan", () => {
  it("seeds a released two-cylinder plan whose cylinders wait for the demo apprentice", async () => {
    const s = await createShopWithMembers("demo-floor");
    const context = { shopId: s.shopId, signIns: [], userIdsByRole: Object.fromEntries(Object.entries(s.actors).map(([r, a]) => [r, a.userId])) };
    await seedDemoStones(context);
    await seedDemoFloor(context);
    const queue = await listFloorQueue({ actor: s.actors.apprentice });
    expect(queue).toHaveLength(1);
    expect(queue[0]!.cylinders.map((c) => [c.number, c.progress.state])).toEqual([[1, "not_started"], [2, "not_started"]]);
    expect(queue[0]!.engineDescription).toMatch(/demo/);
    expect(await listFloorQueue({ actor: s.actors.machinist })).toHaveLength(0);
    expect(await listFloorQueue({ actor: s.actors.lead })).toHaveLength(1);
  });
});
