"use server";
import { z } from "zod";
import { revalidatePath } from "next/cache";
import { defineAction } from "@/server/http/action";
import { addPriceItem, addTaxRate, archivePriceItem, updateBillingSettings } from "@/server/billing/settings";
import { billingSettingsSchema, priceItemSchema, taxRateSchema } from "@/shared/billing/schema";
import { id } from "@/shared/fields";

const done = (message: string) => {
  revalidatePath("/settings/billing");
  return { ok: true as const, message };
};

export const updateBillingSettingsAction = defineAction(billingSettingsSchema, "billing.settings", async (actor, input) => {
  await updateBillingSettings({ actor, input });
  return done("Billing settings saved.");
});

export const addTaxRateAction = defineAction(taxRateSchema, "billing.settings", async (actor, input) => {
  await addTaxRate({ actor, input });
  return done(`Tax rate ${input.name} added.`);
});

export const addPriceItemAction = defineAction(priceItemSchema, "billing.settings", async (actor, input) => {
  await addPriceItem({ actor, input });
  return done(`${input.name} added to the price list.`);
});

export const archivePriceItemAction = defineAction(z.object({ itemId: id }), "billing.settings", async (actor, { itemId }) => {
  await archivePriceItem({ actor, itemId });
  return done("Removed from the price list.");
});
