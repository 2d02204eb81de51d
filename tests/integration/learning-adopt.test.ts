import { beforeAll, describe, expect, it } from "vitest";
import { and, desc, eq } from "drizzle-orm";
import { adoptLearnedAction } from "@/app/(shop)/stones/actions";
import { db } from "@/server/db";
import { rateRows, rateRowVersions } from "@/server/db/schema";
import { adoptLearnedRate } from "@/server/learning/adopt";
import { getStoneLearning } from "@/server/learning/queries";
import { getPlanningLibrary } from "@/server/plans/library";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { asUser, callAction } from "../support/session";
import { logCoarseStage } from "./learning-fixtures";

// Adopt (issue 13): the learned value becomes the rate row's next version with the lead's reason, and
// learning restarts against it; a machinist is refused and nothing changes.

let shop: TestShop;
beforeAll(async () => {
  shop = await createShopWithMembers("learning adopt");
});

const rateRow = async (id: string) => (await db.select().from(rateRows).where(eq(rateRows.id, id)))[0]!;

describe("Adopt", () => {
  it("is refused for a machinist and changes nothing", async () => {
    const { planShop } = await logCoarseStage(shop, 1.25);
    const id = planShop.rateRowIds.coarse;
    const before = await rateRow(id);
    await asUser(shop.actors.machinist);
    const result = await callAction(adoptLearnedAction, { rateRowId: id, machineId: planShop.machineId, expectedVersion: before.version, reason: "Runs agree" });
    expect(result).toMatchObject({ ok: false });
    expect(result.ok ? "" : result.message).toMatch(/role/i);
    await expect(adoptLearnedRate({ actor: shop.actors.machinist, input: { rateRowId: id, machineId: planShop.machineId, expectedVersion: before.version, reason: "Runs agree" } }))
      .rejects.toMatchObject({ code: "forbidden" });
    expect(await rateRow(id)).toEqual(before);
  });

  it("writes the learned rate as a new version with the reason, and learning starts again from the new row", async () => {
    const { planShop, coarse } = await logCoarseStage(shop, 1.25);
    const id = planShop.rateRowIds.coarse;
    const before = await rateRow(id);
    const [entry] = (await getStoneLearning({ actor: shop.actors.lead, stoneId: coarse.stoneId })).filter((e) => e.machineId === planShop.machineId);
    expect(entry!.learned!.runsUsed).toBe(2);
    expect(entry!.points).toHaveLength(2);
    const m = entry!.learned!.multiplier;
    await asUser(shop.actors.lead);
    const result = await callAction(adoptLearnedAction, { rateRowId: id, machineId: planShop.machineId, expectedVersion: before.version, reason: "Two runs agree, the stone cuts faster" });
    expect(result).toMatchObject({ ok: true });
    const after = await rateRow(id);
    expect(after.version).toBe(before.version + 1);
    expect(after.removalPerDoubleStrokeUm).toBeCloseTo(before.removalPerDoubleStrokeUm * m, 3);
    const [history] = await db.select().from(rateRowVersions).where(and(eq(rateRowVersions.rateRowId, id))).orderBy(desc(rateRowVersions.version)).limit(1);
    expect(history!.version).toBe(after.version);
    expect(history!.reason).toMatch(/^Adopted the rate learned from 2 runs on .*: Two runs agree, the stone cuts faster$/);
    expect(history!.changedBy).toBe(shop.actors.lead.userId);
    // Learning restarts: the new version has no runs yet, so plans use the new table alone.
    const library = await getPlanningLibrary({ actor: shop.actors.machinist, boreMaterial: "grey_iron", machineId: planShop.machineId });
    const stone = library.stones.find((s) => s.id === coarse.stoneId)!;
    expect(stone.learned).toBeNull();
    expect(stone.input.learnedMultiplier).toBeUndefined();
    // A stale version (the page opened before the adoption) is refused.
    await expect(adoptLearnedRate({ actor: shop.actors.lead, input: { rateRowId: id, machineId: planShop.machineId, expectedVersion: before.version, reason: "Again" } }))
      .rejects.toMatchObject({ code: "conflict" });
  });
});
