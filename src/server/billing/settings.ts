import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db, type Db, type Tx } from "@/server/db";
import { billingSettings, priceItems, taxRates, type BillingSettingsRow } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey } from "@/server/errors";
import { billingSettingsSchema, priceItemSchema, taxRateSchema } from "@/shared/billing/schema";

// The shop's price list and billing settings (owner only to change; machinist+ to read, for drafting).

/** The shop's row, made with the defaults on first use (INSERT IGNORE: two first readers make one row). */
export async function settingsFor(shopId: string, tx: Db | Tx = db): Promise<BillingSettingsRow> {
  await tx.insert(billingSettings).ignore().values({ shopId });
  const [row] = await tx.select().from(billingSettings).where(eq(billingSettings.shopId, shopId)).limit(1);
  return row!;
}

export type PriceList = Awaited<ReturnType<typeof priceListFor>>;

export async function priceListFor(shopId: string, tx: Db | Tx = db) {
  const rates = await tx
    .select({ id: taxRates.id, name: taxRates.name, rateBp: taxRates.rateBp })
    .from(taxRates)
    .where(and(eq(taxRates.shopId, shopId), isNull(taxRates.archivedAt)))
    .orderBy(asc(taxRates.createdAt));
  const items = await tx
    .select({ id: priceItems.id, kind: priceItems.kind, name: priceItems.name, unitPriceMinor: priceItems.unitPriceMinor, taxRateId: priceItems.taxRateId })
    .from(priceItems)
    .where(and(eq(priceItems.shopId, shopId), isNull(priceItems.archivedAt)))
    .orderBy(asc(priceItems.createdAt));
  const rateOf = (id: string | null) => rates.find((r) => r.id === id)?.rateBp ?? 0;
  return { rates, items: items.map((i) => ({ ...i, taxRateBp: rateOf(i.taxRateId) })) };
}

export async function getBillingSetup({ actor }: { actor: Actor }) {
  assertCan(actor, "billing.view");
  return { settings: await settingsFor(actor.shopId), ...(await priceListFor(actor.shopId)) };
}

export async function updateBillingSettings({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "billing.settings");
  const values = billingSettingsSchema.parse(input);
  await settingsFor(actor.shopId);
  await db.update(billingSettings).set({ ...values, updatedAt: new Date() }).where(eq(billingSettings.shopId, actor.shopId));
  return { ok: true as const };
}

async function insertOnce(write: () => Promise<unknown>): Promise<void> {
  try {
    await write();
  } catch (error) {
    if (!isDuplicateKey(error)) throw error; // a retried submission with the same client id: already saved
  }
}

export async function addTaxRate({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "billing.settings");
  const { id, name, rate } = taxRateSchema.parse(input);
  await insertOnce(() => db.insert(taxRates).values({ id, shopId: actor.shopId, name, rateBp: rate }));
  return { id };
}

export async function addPriceItem({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "billing.settings");
  const { id, kind, name, unitPrice, taxRateId } = priceItemSchema.parse(input);
  if (taxRateId) {
    const [rate] = await db.select({ id: taxRates.id }).from(taxRates).where(and(eq(taxRates.id, taxRateId), eq(taxRates.shopId, actor.shopId))).limit(1);
    if (!rate) throw new AppError("bad_request", "Choose one of the shop's tax rates.", { fieldErrors: { taxRateId: ["Choose one of the shop's tax rates."] } });
  }
  await insertOnce(() => db.insert(priceItems).values({ id, shopId: actor.shopId, kind, name, unitPriceMinor: unitPrice, taxRateId }));
  return { id };
}

export async function archivePriceItem({ actor, itemId }: { actor: Actor; itemId: string }) {
  assertCan(actor, "billing.settings");
  const [result] = await db.update(priceItems).set({ archivedAt: new Date() }).where(and(eq(priceItems.id, itemId), eq(priceItems.shopId, actor.shopId), isNull(priceItems.archivedAt)));
  if (result.affectedRows !== 1) throw new AppError("not_found", "That price item was not found.");
  return { ok: true as const };
}
