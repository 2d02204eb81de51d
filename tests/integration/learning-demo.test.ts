import { describe, expect, it } from "vitest";
import { and, eq, isNotNull } from "drizzle-orm";
import { db } from "@/server/db";
import { finalInspections, runs } from "@/server/db/schema";
import { seedDemoRunHistory } from "@/server/demo/runs";
import { seedDemoStones } from "@/server/demo/stones";
import { getStoneLearning } from "@/server/learning/queries";
import { createShopWithMembers } from "../support/fixtures";

describe("demo run history", () => {
  it("logs finished jobs on both demo machines through the floor path, so the stones have learned rates and three bores of each job final checks", async () => {
    const s = await createShopWithMembers("demo-history");
    const context = { shopId: s.shopId, signIns: [], userIdsByRole: Object.fromEntries(Object.entries(s.actors).map(([r, a]) => [r, a.userId])) };
    await seedDemoStones(context);
    await seedDemoRunHistory(context);
    const observed = await db.select({ stoneId: runs.stoneId }).from(runs).where(and(eq(runs.shopId, s.shopId), isNotNull(runs.learning)));
    expect(observed.length).toBeGreaterThanOrEqual(24);
    const stopped = await db.select({ id: runs.id }).from(runs).where(and(eq(runs.shopId, s.shopId), eq(runs.outcome, "stopped")));
    expect(stopped).toHaveLength(0);
    const checks = await db.select({ status: finalInspections.status }).from(finalInspections).where(eq(finalInspections.shopId, s.shopId));
    expect(checks).toHaveLength(18);
    expect(checks.filter((c) => c.status !== "pass")).toEqual([]);
    const coarse = observed[0]!.stoneId!;
    const learned = (await getStoneLearning({ actor: s.actors.lead, stoneId: coarse })).filter((e) => e.learned);
    expect(learned.length).toBeGreaterThan(0);
  });
});
