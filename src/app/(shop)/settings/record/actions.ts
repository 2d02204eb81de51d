"use server";
import { defineAction } from "@/server/http/action";
import { updateRecordSettings } from "@/server/records/settings";
import type { ActionResult } from "@/shared/action-result";
import { recordSettingsSchema } from "@/shared/records/schema";

export const updateRecordSettingsAction = defineAction(recordSettingsSchema, "shop.edit", async (actor, input): Promise<ActionResult> => {
  await updateRecordSettings({ actor, input });
  return { ok: true, message: "Saved. The next record sent carries these." };
});
