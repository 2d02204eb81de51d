import "server-only";
import { eq, sql } from "drizzle-orm";
import { db, type Db, type Tx } from "@/server/db";
import { shopSettings } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { DEFAULT_SHOP_SETTINGS } from "@/shared/shop-settings/schema";
import { DEFAULT_FLOOR_SETTINGS, floorSettingsSchema, type FloorSettings } from "@/shared/shop-settings/floor-schema";

/** The floor's settings of a shop, or the defaults where it has not set its own. */
export async function getFloorSettings({ shopId, tx = db }: { shopId: string; tx?: Db | Tx }): Promise<FloorSettings> {
  const [row] = await tx
    .select({ maxTemperatureDifferenceK: shopSettings.maxTemperatureDifferenceK, gaugeTemperatureC: shopSettings.gaugeTemperatureC })
    .from(shopSettings)
    .where(eq(shopSettings.shopId, shopId))
    .limit(1);
  return row ? { maxTemperatureDifferenceK: Number(row.maxTemperatureDifferenceK), gaugeTemperatureC: row.gaugeTemperatureC === null ? null : Number(row.gaugeTemperatureC) } : { ...DEFAULT_FLOOR_SETTINGS };
}

/** Saves them (owner and lead: floor.settings); a shop without a settings row gets one with the intake defaults. */
export async function updateFloorSettings({ actor, input }: { actor: Actor; input: unknown }): Promise<FloorSettings> {
  assertCan(actor, "floor.settings");
  const parsed = floorSettingsSchema.parse(input);
  const values = { maxTemperatureDifferenceK: parsed.maxTemperatureDifferenceK, gaugeTemperatureC: parsed.gaugeTemperatureC };
  await db
    .insert(shopSettings)
    .values({
      shopId: actor.shopId, ...values, taperToleranceUm: DEFAULT_SHOP_SETTINGS.taperToleranceUm, outOfRoundToleranceUm: DEFAULT_SHOP_SETTINGS.outOfRoundToleranceUm,
      oversizeStepsUm: JSON.stringify(DEFAULT_SHOP_SETTINGS.oversizeStepsUm), readingLevels: JSON.stringify(DEFAULT_SHOP_SETTINGS.readingLevels),
    })
    .onDuplicateKeyUpdate({ set: { ...values, updatedAt: sql`CURRENT_TIMESTAMP(3)` } });
  return values;
}
