"use server";
import { revalidatePath } from "next/cache";
import { defineAction } from "@/server/http/action";
import { updateShopSettings } from "@/server/shop-settings/mutations";
import { shopSettingsSchema } from "@/shared/shop-settings/schema";
import { floorSettingsSchema } from "@/shared/shop-settings/floor-schema";
import { updateFloorSettings } from "@/server/shop-settings/floor";

/** Saves the shop's tolerances; the input is the same object the form validated with shopSettingsSchema. */
export const saveTolerancesAction = defineAction(shopSettingsSchema, "shop.edit", async (actor, input) => {
  await updateShopSettings({ actor, input });
  revalidatePath("/settings/tolerances");
  return { ok: true as const, message: "Saved. New readings are judged against these figures." };
});

/** Saves the floor's temperature settings (owner and lead: floor.settings). */
export const saveFloorSettingsAction = defineAction(floorSettingsSchema, "floor.settings", async (actor, input) => {
  await updateFloorSettings({ actor, input });
  revalidatePath("/settings/tolerances");
  return { ok: true as const, message: "Saved. Final checks from now on use these figures." };
});
