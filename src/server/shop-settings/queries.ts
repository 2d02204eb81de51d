import "server-only";
import { eq } from "drizzle-orm";
import { db, type Db, type Tx } from "@/server/db";
import { shopSettings } from "@/server/db/schema";
import { DEFAULT_SHOP_SETTINGS, type ShopSettings } from "@/shared/shop-settings/schema";

function parseList<T>(json: string, fallback: readonly T[]): T[] {
  try {
    const value: unknown = JSON.parse(json);
    return Array.isArray(value) ? (value as T[]) : [...fallback];
  } catch {
    return [...fallback];
  }
}

/** The shop's intake settings, or the defaults where the shop has not set its own. */
export async function getShopSettings({ shopId, tx = db }: { shopId: string; tx?: Db | Tx }): Promise<ShopSettings> {
  const [row] = await tx.select().from(shopSettings).where(eq(shopSettings.shopId, shopId)).limit(1);
  if (!row) {
    return {
      ...DEFAULT_SHOP_SETTINGS,
      oversizeStepsUm: [...DEFAULT_SHOP_SETTINGS.oversizeStepsUm],
      readingLevels: [...DEFAULT_SHOP_SETTINGS.readingLevels],
    };
  }
  return {
    taperToleranceUm: row.taperToleranceUm,
    outOfRoundToleranceUm: row.outOfRoundToleranceUm,
    boringMarginUm: row.boringMarginUm,
    boringRzUm: row.boringRzUm,
    asReceivedCleanupUm: row.asReceivedCleanupUm,
    boreAboveStockUm: row.boreAboveStockUm,
    oversizeStepsUm: parseList<number>(row.oversizeStepsUm, DEFAULT_SHOP_SETTINGS.oversizeStepsUm),
    readingLevels: parseList<string>(row.readingLevels, DEFAULT_SHOP_SETTINGS.readingLevels),
  };
}
