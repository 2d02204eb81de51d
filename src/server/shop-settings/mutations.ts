import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/server/db";
import { shopSettings } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { shopSettingsSchema, type ShopSettings } from "@/shared/shop-settings/schema";

/** Saves the shop's tolerances, oversize steps and reading levels (owner: shop.edit). */
export async function updateShopSettings({ actor, input }: { actor: Actor; input: unknown }): Promise<ShopSettings> {
  assertCan(actor, "shop.edit");
  const parsed = shopSettingsSchema.parse(input);
  const values = {
    taperToleranceUm: parsed.taperToleranceUm,
    outOfRoundToleranceUm: parsed.outOfRoundToleranceUm,
    boringMarginUm: parsed.boringMarginUm,
    boringRzUm: parsed.boringRzUm,
    asReceivedCleanupUm: parsed.asReceivedCleanupUm,
    boreAboveStockUm: parsed.boreAboveStockUm,
    oversizeStepsUm: JSON.stringify([...parsed.oversizeStepsUm].sort((a, b) => a - b)),
    readingLevels: JSON.stringify(parsed.readingLevels),
  };
  await db
    .insert(shopSettings)
    .values({ shopId: actor.shopId, ...values })
    .onDuplicateKeyUpdate({ set: { ...values, updatedAt: sql`CURRENT_TIMESTAMP(3)` } });
  return { ...parsed, oversizeStepsUm: [...parsed.oversizeStepsUm].sort((a, b) => a - b) };
}
