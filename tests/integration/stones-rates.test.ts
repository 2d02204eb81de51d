import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { rateRowVersions, rateRows } from "@/server/db/schema";
import { createStone, updateStone } from "@/server/stones/mutations";
import { createRateRow, updateRateRow } from "@/server/stones/rate-mutations";
import { getStoneDetail, listStones } from "@/server/stones/queries";
import { getVersion, listStoneHistory } from "@/server/stones/history";
import { restoreVersion } from "@/server/stones/restore";
import { createShopWithMembers } from "../support/fixtures";
import { fieldErrorsOf, rateInput, stoneInput, stoneWithRate } from "./stones-fixtures";


describe("rate rows", () => {
  it("adds a row per stone × material and shows it with its version and no learned value yet", async () => {
    const shop = await createShopWithMembers("rates-add");
    const { stoneId, rateRowId } = await stoneWithRate(shop.actors.lead);
    await createRateRow({ actor: shop.actors.lead, input: rateInput(stoneId, { boreMaterial: "al_iron_liner", removalPerDoubleStrokeUm: 1.2 }) });
    const { rates } = await getStoneDetail({ actor: shop.actors.apprentice, stoneId });
    expect(rates.map((r) => [r.boreMaterial, r.removalPerDoubleStrokeUm, r.version, r.learned])).toEqual([
      ["grey_iron", 1.5, 1, null],
      ["al_iron_liner", 1.2, 1, null],
    ]); // in the order of BORE_MATERIALS
    expect((await listStones({ actor: shop.actors.apprentice })).map((s) => s.rateCount)).toEqual([2]);
    expect(rates.find((r) => r.id === rateRowId)).toMatchObject({ referencePressure: 10, referencePressureUnit: "bar", cleanupMode: "explicit", cleanupStockUm: 20 });
  });

  it("a second row for the same material is a field error", async () => {
    const shop = await createShopWithMembers("rates-dup");
    const { stoneId } = await stoneWithRate(shop.actors.lead);
    expect(await fieldErrorsOf(createRateRow({ actor: shop.actors.lead, input: rateInput(stoneId) }))).toHaveProperty("boreMaterial");
  });

  it("an edit with a reason writes a history row with old and new values; the row's version goes up", async () => {
    const shop = await createShopWithMembers("rates-edit");
    const { stoneId, rateRowId } = await stoneWithRate(shop.actors.lead);
    const result = await updateRateRow({
      actor: shop.actors.lead,
      input: { ...rateInput(stoneId, { removalPerDoubleStrokeUm: 1.8 }), rateRowId, expectedVersion: 1, reason: "Five blocks this month took fewer strokes" },
    });
    expect(result).toMatchObject({ version: 2, changed: true });
    const [latest] = await listStoneHistory({ actor: shop.actors.machinist, stoneId });
    expect(latest).toMatchObject({ subject: "rate", rateRowId, version: 2, kind: "update", reason: "Five blocks this month took fewer strokes", changed: ["removalPerDoubleStrokeUm"] });
    expect(latest!.oldValues).toMatchObject({ removalPerDoubleStrokeUm: 1.5 });
    expect(latest!.newValues).toMatchObject({ removalPerDoubleStrokeUm: 1.8 });
  });

  it("an edit without a reason is refused and changes nothing", async () => {
    const shop = await createShopWithMembers("rates-noreason");
    const { stoneId, rateRowId } = await stoneWithRate(shop.actors.lead);
    const errors = await fieldErrorsOf(updateRateRow({ actor: shop.actors.lead, input: { ...rateInput(stoneId, { raUm: 2 }), rateRowId, expectedVersion: 1, reason: " " } }));
    expect(errors).toHaveProperty("reason");
    const [row] = await db.select().from(rateRows).where(eq(rateRows.id, rateRowId));
    expect(row).toMatchObject({ raUm: 1.6, version: 1 });
    expect(await db.select().from(rateRowVersions).where(eq(rateRowVersions.rateRowId, rateRowId))).toHaveLength(1);
  });

  it("switching clean-up to “from Rz” clears the explicit figure and defaults the multiple to 3", async () => {
    const shop = await createShopWithMembers("rates-cleanup");
    const { stoneId, rateRowId } = await stoneWithRate(shop.actors.lead);
    await updateRateRow({ actor: shop.actors.lead, input: { ...rateInput(stoneId, { cleanupMode: "from_rz", cleanupStockUm: "" }), rateRowId, expectedVersion: 1, reason: "Use the Rz rule" } });
    const [row] = await db.select().from(rateRows).where(eq(rateRows.id, rateRowId));
    expect(row).toMatchObject({ cleanupMode: "from_rz", cleanupStockUm: null, cleanupRzMultiple: 3 }); // 2 × 3 × Rz [C, DESIGN §5.3]
  });
});

describe("history and restore", () => {
  it("the lead views an old version and restores it as a new version with its own reason", async () => {
    const shop = await createShopWithMembers("rates-restore");
    const lead = shop.actors.lead;
    const { stoneId, rateRowId } = await stoneWithRate(lead);
    await updateRateRow({ actor: lead, input: { ...rateInput(stoneId, { removalPerDoubleStrokeUm: 2.5 }), rateRowId, expectedVersion: 1, reason: "Trial of a higher figure" } });
    const history = await listStoneHistory({ actor: lead, stoneId });
    const original = history.find((h) => h.subject === "rate" && h.version === 1)!;
    expect((await getVersion({ actor: shop.actors.apprentice, stoneId, versionId: original.id })).newValues).toMatchObject({ removalPerDoubleStrokeUm: 1.5 });

    const restored = await restoreVersion({ actor: lead, input: { stoneId, versionId: original.id, reason: "The trial figure overshot" } });
    expect(restored).toMatchObject({ subject: "rate", version: 3, changed: true });
    const { rates } = await getStoneDetail({ actor: lead, stoneId });
    expect(rates[0]).toMatchObject({ removalPerDoubleStrokeUm: 1.5, version: 3 });
    const [latest] = await listStoneHistory({ actor: lead, stoneId });
    expect(latest).toMatchObject({ kind: "restore", restoredFromVersion: 1, version: 3, reason: "The trial figure overshot" });
    expect(latest!.oldValues).toMatchObject({ removalPerDoubleStrokeUm: 2.5 });
  });

  it("restoring a stone version keeps the stone's current height", async () => {
    const shop = await createShopWithMembers("stone-restore");
    const lead = shop.actors.lead;
    const input = stoneInput({ bond: "vitrified", currentHeightUm: 7_000 });
    const { stoneId } = await createStone({ actor: lead, input });
    await updateStone({ actor: lead, input: { ...input, bond: "resin", currentHeightUm: 6_000, stoneId, expectedVersion: 1, reason: "New bond and measured height" } });
    const first = (await listStoneHistory({ actor: lead, stoneId })).find((h) => h.version === 1)!;
    await restoreVersion({ actor: lead, input: { stoneId, versionId: first.id, reason: "Bond entered wrongly" } });
    const { stone } = await getStoneDetail({ actor: lead, stoneId });
    expect(stone).toMatchObject({ bond: "vitrified", currentHeightUm: 6_000, version: 3 });
  });

  it("restore needs the edit permission and a reason; another shop's version is not found", async () => {
    const shop = await createShopWithMembers("restore-perm");
    const other = await createShopWithMembers("restore-other");
    const { stoneId } = await stoneWithRate(shop.actors.lead);
    const [v] = await listStoneHistory({ actor: shop.actors.lead, stoneId });
    await expect(restoreVersion({ actor: shop.actors.machinist, input: { stoneId, versionId: v!.id, reason: "Try" } })).rejects.toMatchObject({ code: "forbidden" });
    expect(await fieldErrorsOf(restoreVersion({ actor: shop.actors.lead, input: { stoneId, versionId: v!.id, reason: "" } }))).toHaveProperty("reason");
    await expect(restoreVersion({ actor: other.actors.lead, input: { stoneId, versionId: v!.id, reason: "Not mine" } })).rejects.toMatchObject({ code: "not_found" });
    await expect(getVersion({ actor: other.actors.lead, stoneId, versionId: v!.id })).rejects.toMatchObject({ code: "not_found" });
  });
});
