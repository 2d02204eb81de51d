import { describe, expect, it, vi } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { stoneVersions, stones } from "@/server/db/schema";
import { createStone, setStoneActive, updateStone } from "@/server/stones/mutations";
import { getStoneDetail, listStones, listStonesNearWearLimit } from "@/server/stones/queries";
import { listStoneHistory } from "@/server/stones/history";
import * as releasedPlans from "@/server/stones/released-plans";
import { createShopWithMembers } from "../support/fixtures";
import { machineFor, stoneInput } from "./stones-fixtures";

describe("stone sets", () => {
  it("creates, lists and shows a stone with its grit and grain size", async () => {
    const shop = await createShopWithMembers("stones-create");
    const { stoneId, version } = await createStone({ actor: shop.actors.lead, input: stoneInput({ code: "C-1", grit: "JIS #400", role: "finish" }) });
    expect(version).toBe(1);
    const list = await listStones({ actor: shop.actors.apprentice });
    expect(list.map((s) => s.code)).toEqual(["C-1"]);
    const { stone, rates } = await getStoneDetail({ actor: shop.actors.machinist, stoneId });
    expect(stone.gritLabel).toBe("JIS #400");
    expect(stone.grainSizeUm).toBe(30.0); // JIS R 6001:1987 #400 d50 30.0 µm [V S11]
    expect(rates).toEqual([]);
    expect(list[0]!.rateCount).toBe(0);
    const history = await listStoneHistory({ actor: shop.actors.lead, stoneId });
    expect(history).toHaveLength(1);
    expect(history[0]).toMatchObject({ kind: "create", version: 1, oldValues: null, changedByName: "Test lead" });
  });

  it("an update writes a version with who, old and new values and the reason", async () => {
    const shop = await createShopWithMembers("stones-update");
    const { stoneId } = await createStone({ actor: shop.actors.lead, input: stoneInput({ currentHeightUm: 7_000 }) });
    const result = await updateStone({
      actor: shop.actors.owner,
      input: { ...stoneInput({ code: "C-2", currentHeightUm: 6_500 }), stoneId, expectedVersion: 1, reason: "Measured the stones after the last block" },
    });
    expect(result).toMatchObject({ version: 2, changed: true });
    const [latest] = await listStoneHistory({ actor: shop.actors.apprentice, stoneId });
    expect(latest).toMatchObject({ kind: "update", version: 2, reason: "Measured the stones after the last block", changedByName: "Test owner" });
    expect(latest!.oldValues).toMatchObject({ currentHeightUm: 7000 });
    expect(latest!.newValues).toMatchObject({ currentHeightUm: 6500, code: "C-2" });
    expect(latest!.changed).toEqual(expect.arrayContaining(["code", "currentHeightUm"]));
  });

  it("an unchanged save writes no version; a stale version is refused", async () => {
    const shop = await createShopWithMembers("stones-stale");
    const input = stoneInput();
    const { stoneId } = await createStone({ actor: shop.actors.lead, input });
    expect(await updateStone({ actor: shop.actors.lead, input: { ...input, stoneId, expectedVersion: 1, reason: "No change" } })).toMatchObject({ changed: false, version: 1 });
    await updateStone({ actor: shop.actors.lead, input: { ...input, notes: "dressed", stoneId, expectedVersion: 1, reason: "Dressed" } });
    await expect(updateStone({ actor: shop.actors.lead, input: { ...input, notes: "again", stoneId, expectedVersion: 1, reason: "Late" } })).rejects.toMatchObject({ code: "conflict" });
    const versions = await db.select().from(stoneVersions).where(eq(stoneVersions.stoneId, stoneId));
    expect(versions.map((v) => v.version).sort()).toEqual([1, 2]);
  });

  it("a duplicate code is a field error", async () => {
    const shop = await createShopWithMembers("stones-dup");
    await createStone({ actor: shop.actors.lead, input: stoneInput({ code: "SAME" }) });
    await expect(createStone({ actor: shop.actors.lead, input: stoneInput({ code: "SAME" }) })).rejects.toMatchObject({ fieldErrors: { code: [expect.any(String)] } });
  });

  it("another shop's stone is not found, for reads and writes", async () => {
    const a = await createShopWithMembers("stones-a");
    const b = await createShopWithMembers("stones-b");
    const { stoneId } = await createStone({ actor: a.actors.lead, input: stoneInput() });
    await expect(getStoneDetail({ actor: b.actors.lead, stoneId })).rejects.toMatchObject({ code: "not_found" });
    await expect(updateStone({ actor: b.actors.lead, input: { ...stoneInput(), stoneId, expectedVersion: 1, reason: "Not mine" } })).rejects.toMatchObject({ code: "not_found" });
    expect(await listStones({ actor: b.actors.lead })).toEqual([]);
  });

  it("retires and brings back a stone, each with a version", async () => {
    const shop = await createShopWithMembers("stones-retire");
    const { stoneId } = await createStone({ actor: shop.actors.lead, input: stoneInput() });
    await expect(setStoneActive({ actor: shop.actors.lead, input: { stoneId, active: false, reason: "" } })).rejects.toMatchObject({ name: "ZodError" });
    expect(await setStoneActive({ actor: shop.actors.lead, input: { stoneId, active: false, reason: "Worn out" } })).toMatchObject({ version: 2 });
    expect(await setStoneActive({ actor: shop.actors.lead, input: { stoneId, active: true, reason: "Found a spare set" } })).toMatchObject({ version: 3 });
    const kinds = (await listStoneHistory({ actor: shop.actors.lead, stoneId })).map((h) => h.kind);
    expect(kinds).toEqual(["reactivate", "retire", "create"]);
  });

  it("refuses to retire a stone a released plan uses, with the reason, and writes nothing", async () => {
    const shop = await createShopWithMembers("stones-released");
    const { stoneId } = await createStone({ actor: shop.actors.lead, input: stoneInput() });
    const spy = vi.spyOn(releasedPlans, "isStoneInReleasedPlan").mockResolvedValue(true);
    try {
      await expect(setStoneActive({ actor: shop.actors.lead, input: { stoneId, active: false, reason: "Worn out" } })).rejects.toMatchObject({
        code: "conflict",
        message: expect.stringContaining("released plan"),
      });
    } finally {
      spy.mockRestore();
    }
    const [row] = await db.select().from(stones).where(and(eq(stones.id, stoneId), eq(stones.shopId, shop.shopId)));
    expect(row).toMatchObject({ active: true, version: 1 });
  });

  it("lists the stones at or near their wear limit, most worn first", async () => {
    const shop = await createShopWithMembers("stones-wear");
    await machineFor(shop.actors.lead);
    await createStone({ actor: shop.actors.lead, input: stoneInput({ code: "FRESH", currentHeightUm: 7_500 }) });
    await createStone({ actor: shop.actors.lead, input: stoneInput({ code: "NEAR", currentHeightUm: 3_000 }) }); // 1 of 6 mm left
    await createStone({ actor: shop.actors.lead, input: stoneInput({ code: "WORN", currentHeightUm: 1_900 }) });
    const near = await listStonesNearWearLimit({ actor: shop.actors.apprentice });
    expect(near.map((s) => [s.code, s.wear.state])).toEqual([["WORN", "worn"], ["NEAR", "near"]]);
  });
});
