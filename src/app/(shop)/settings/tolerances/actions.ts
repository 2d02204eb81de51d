"use server";
import { revalidatePath } from "next/cache";
import { defineAction } from "@/server/http/action";
import { updateShopSettings } from "@/server/shop-settings/mutations";
import { shopSettingsSchema } from "@/shared/shop-settings/schema";

/** Saves the shop's tolerances; the input is the same object the form validated with shopSettingsSchema. */
export const saveTolerancesAction = defineAction(shopSettingsSchema, "shop.edit", async (actor, input) => {
  await updateShopSettings({ actor, input });
  revalidatePath("/settings/tolerances");
  return { ok: true as const, message: "Saved. New readings are judged against these figures." };
});
