import "server-only";
import { db } from "@/server/db";
import { recordSettings } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { recordSettingsSchema } from "@/shared/records/schema";
import { recordSettingsFor } from "./source";

/** The shop's record settings as the form shows them (owner only to change). */
export async function getRecordSettings({ actor }: { actor: Actor }) {
  assertCan(actor, "shop.edit");
  const { address, contact, remarks, logoStoredName } = await recordSettingsFor(actor.shopId);
  // The stored name changes with every upload, so it versions the preview's URL past any cache.
  return { address, contact, remarks, hasLogo: logoStoredName !== null, logoVersion: logoStoredName?.slice(0, 8) ?? null };
}

/** Writes the shop's address, contact and standard remarks; the next record sent carries them. */
export async function updateRecordSettings({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "shop.edit");
  const values = recordSettingsSchema.parse(input);
  await db.insert(recordSettings).values({ shopId: actor.shopId, ...values }).onDuplicateKeyUpdate({ set: { ...values, updatedAt: new Date() } });
  return values;
}
