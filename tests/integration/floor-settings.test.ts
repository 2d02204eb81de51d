// The floor's temperature settings are the shop's (owner and lead), checked with the form's schema, and
// the final verdict on the server holds or judges by them.
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { submitInspection } from "@/server/runs/inspect";
import { submitRun } from "@/server/runs/submit-run";
import { getFloorSettings, updateFloorSettings } from "@/server/shop-settings/floor";
import { getShopSettings } from "@/server/shop-settings/queries";
import { DEFAULT_FLOOR_SETTINGS } from "@/shared/shop-settings/floor-schema";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { createFloorPlan, honeStages, runBody } from "./floor-fixtures";

let shop: TestShop;
beforeAll(async () => {
  shop = await createShopWithMembers("floor settings");
});

describe("floor temperature settings", () => {
  it("start at the defaults, are saved by a lead within the limits, and leave the intake settings as they were", async () => {
    expect(await getFloorSettings({ shopId: shop.shopId })).toEqual(DEFAULT_FLOOR_SETTINGS);
    const intake = await getShopSettings({ shopId: shop.shopId });
    await expect(updateFloorSettings({ actor: shop.actors.lead, input: { maxTemperatureDifferenceK: 11, gaugeTemperatureC: 21 } })).rejects.toThrow(/0.5 to 10 K/);
    await expect(updateFloorSettings({ actor: shop.actors.machinist, input: { maxTemperatureDifferenceK: 3, gaugeTemperatureC: null } })).rejects.toMatchObject({ code: "forbidden" });
    expect(await getFloorSettings({ shopId: shop.shopId })).toEqual(DEFAULT_FLOOR_SETTINGS);
    await updateFloorSettings({ actor: shop.actors.lead, input: { maxTemperatureDifferenceK: "4", gaugeTemperatureC: "" } });
    expect(await getFloorSettings({ shopId: shop.shopId })).toEqual({ maxTemperatureDifferenceK: 4, gaugeTemperatureC: null });
    await updateFloorSettings({ actor: shop.actors.owner, input: { maxTemperatureDifferenceK: 4, gaugeTemperatureC: 20.5 } });
    expect(await getFloorSettings({ shopId: shop.shopId })).toEqual({ maxTemperatureDifferenceK: 4, gaugeTemperatureC: 20.5 });
    expect(await getShopSettings({ shopId: shop.shopId })).toEqual(intake);
  });

  it("the final verdict waits or judges by the shop's allowed difference, not a constant", async () => {
    const other = await createShopWithMembers("floor settings default");
    const verdictAt = async (s: TestShop, blockC: number) => {
      const floor = await createFloorPlan(s);
      for (const { position } of honeStages(floor.plan.cylinders[0]!.plan.stages)) await submitRun({ actor: s.actors.apprentice, input: runBody(floor.planId, { cylinder: 1, stagePosition: position }) });
      const t = floor.plan.cylinders[0]!.plan.sizing!.targetUm;
      return submitInspection({
        actor: s.actors.apprentice,
        input: { id: randomUUID(), planId: floor.planId, cylinder: 1, temperatures: { blockC, gaugeC: 20 }, surface: null, inspectedAt: new Date().toISOString(), readings: ["top", "middle", "bottom"].map((name) => ({ name, aUm: t, bUm: t })) },
      });
    };
    await updateFloorSettings({ actor: shop.actors.lead, input: { maxTemperatureDifferenceK: 4, gaugeTemperatureC: null } });
    // 3 K above the gauge: past the default 2 K (held), inside this shop's 4 K (judged).
    expect((await verdictAt(other, 23)).status).toBe("held");
    const judged = await verdictAt(shop, 23);
    expect(judged.status).not.toBe("held");
    expect(judged.verdict.temperatureDifferenceK).toBeCloseTo(3, 6);
  });
});
