"use server";
import { unstable_rethrow } from "next/navigation";
import { revalidatePath } from "next/cache";
import { requireActor } from "@/server/auth/current";
import { toPublicError } from "@/server/http/errors";
import type { ActionResult } from "@/shared/action-result";
import { updateShopSettings } from "@/server/shop-settings/mutations";

/** Saves the shop's tolerances; the input is the same object the form validated with shopSettingsSchema. */
export async function saveTolerancesAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    await updateShopSettings({ actor, input });
    revalidatePath("/settings/tolerances");
    return { ok: true, message: "Saved. New readings are judged against these figures." };
  } catch (error) {
    unstable_rethrow(error);
    const { body } = toPublicError(error);
    return { ok: false, message: body.message, fieldErrors: body.fieldErrors };
  }
}
