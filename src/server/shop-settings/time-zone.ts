import "server-only";
import { cache } from "react";
import { eq } from "drizzle-orm";
import { db, type Db, type Tx } from "@/server/db";
import { shops } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { knownTimeZone, shopTimeZoneSchema } from "@/shared/time";

/** The shop's time zone (UTC until the owner sets one). */
export async function getShopTimeZone({ shopId, tx = db }: { shopId: string; tx?: Db | Tx }): Promise<string> {
  const [row] = await tx.select({ timeZone: shops.timeZone }).from(shops).where(eq(shops.id, shopId)).limit(1);
  return knownTimeZone(row?.timeZone);
}

/** The actor's shop's time zone, read once per request for a page and its pieces. */
export const shopTimeZone = cache((actor: Actor): Promise<string> => getShopTimeZone({ shopId: actor.shopId }));

/** Saves it (owner: shop.edit); an unknown name is refused and changes nothing. */
export async function updateShopTimeZone({ actor, input }: { actor: Actor; input: unknown }): Promise<string> {
  assertCan(actor, "shop.edit");
  const { timeZone } = shopTimeZoneSchema.parse(input);
  await db.update(shops).set({ timeZone }).where(eq(shops.id, actor.shopId));
  return timeZone;
}
