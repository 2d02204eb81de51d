"use server";
import { z } from "zod";
import { defineAction } from "@/server/http/action";
import { removeLogo } from "@/server/records/logo";
import { updateRecordSettings } from "@/server/records/settings";
import type { ActionResult } from "@/shared/action-result";
import { recordSettingsSchema } from "@/shared/records/schema";

export const updateRecordSettingsAction = defineAction(recordSettingsSchema, "shop.edit", async (actor, input): Promise<ActionResult> => {
  await updateRecordSettings({ actor, input });
  return { ok: true, message: "Saved. The next record sent carries these." };
});

/** The logo is uploaded through POST /api/settings/logo (multipart); removing it is this action. */
export const removeLogoAction = defineAction(z.object({}), "shop.edit", async (actor): Promise<ActionResult> => {
  await removeLogo({ actor });
  return { ok: true, message: "Logo removed." };
});
