"use server";
import { z } from "zod";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { defineAction } from "@/server/http/action";
import { createStone, setStoneActive, updateStone } from "@/server/stones/mutations";
import { createRateRow, updateRateRow } from "@/server/stones/rate-mutations";
import { restoreVersion } from "@/server/stones/restore";
import { RATE_LENGTH_FIELDS, STONE_LENGTH_FIELDS } from "@/shared/stones/fields";
import { withUserLengths } from "@/server/units";
import { adoptLearnedRate } from "@/server/learning/adopt";
import { adoptLearnedSchema } from "@/shared/learning/schema";

// The server functions validate with the shared schemas themselves, so the actions pass the form on.
const form = z.record(z.string(), z.unknown());

export const createStoneAction = defineAction(form, "stones.edit", async (actor, input) => {
  const { stoneId } = await createStone({ actor, input: await withUserLengths(actor, input, STONE_LENGTH_FIELDS) });
  revalidatePath("/stones");
  redirect(`/stones/${stoneId}?saved=created`);
});

export const updateStoneAction = defineAction(form, "stones.edit", async (actor, input) => {
  const result = await updateStone({ actor, input: await withUserLengths(actor, input, STONE_LENGTH_FIELDS) });
  if (!result?.changed) return { ok: true as const, message: "Nothing changed, so no new version was written." };
  revalidatePath(`/stones/${result.stoneId}`);
  redirect(`/stones/${result.stoneId}?saved=stone#history`);
});

export const setStoneActiveAction = defineAction(form, "stones.edit", async (actor, input) => {
  const result = await setStoneActive({ actor, input });
  revalidatePath(`/stones/${result.stoneId}`);
  revalidatePath("/stones");
  return { ok: true as const, message: result.changed ? "Saved." : "Nothing changed." };
});

export const createRateRowAction = defineAction(form, "stones.edit", async (actor, input) => {
  await createRateRow({ actor, input: await withUserLengths(actor, input, RATE_LENGTH_FIELDS) });
  const stoneId = String(input.stoneId);
  revalidatePath(`/stones/${stoneId}`);
  redirect(`/stones/${stoneId}?saved=rate#rates`);
});

export const updateRateRowAction = defineAction(form, "stones.edit", async (actor, input) => {
  const result = await updateRateRow({ actor, input: await withUserLengths(actor, input, RATE_LENGTH_FIELDS) });
  if (!result.changed) return { ok: true as const, message: "Nothing changed, so no new version was written." };
  revalidatePath(`/stones/${result.stoneId}`);
  redirect(`/stones/${result.stoneId}?saved=rate#history`);
});

export const restoreVersionAction = defineAction(form, "stones.edit", async (actor, input) => {
  const result = await restoreVersion({ actor, input });
  const stoneId = String(input.stoneId);
  if (!result.changed) return { ok: true as const, message: "The current values already match that version; nothing was written." };
  revalidatePath(`/stones/${stoneId}`);
  redirect(`/stones/${stoneId}?saved=restored#history`);
});

export const adoptLearnedAction = defineAction(adoptLearnedSchema, "rates.adopt", async (actor, input) => {
  const result = await adoptLearnedRate({ actor, input });
  revalidatePath(`/stones/${result.stoneId}`);
  return { ok: true as const, message: `Adopted: the rate row is now version ${result.version}; learning starts again from it.` };
});
