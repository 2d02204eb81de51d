"use server";
import { z } from "zod";
import { revalidatePath } from "next/cache";
import { defineAction } from "@/server/http/action";
import { createMachine, setMachineActive, updateMachine } from "@/server/machines/mutations";
import { MACHINE_LENGTH_FIELDS } from "@/shared/stones/fields";
import { withUserLengths } from "@/server/units";

const form = z.record(z.string(), z.unknown());

export const createMachineAction = defineAction(form, "machines.edit", async (actor, input) => {
  await createMachine({ actor, input: await withUserLengths(actor, input, MACHINE_LENGTH_FIELDS) });
  revalidatePath("/machines");
  return { ok: true as const, message: "Machine added." };
});

export const updateMachineAction = defineAction(form, "machines.edit", async (actor, input) => {
  await updateMachine({ actor, input: await withUserLengths(actor, input, MACHINE_LENGTH_FIELDS) });
  revalidatePath("/machines");
  return { ok: true as const, message: "Machine saved." };
});

export const setMachineActiveAction = defineAction(form, "machines.edit", async (actor, input) => {
  const { active } = await setMachineActive({ actor, input });
  revalidatePath("/machines");
  return { ok: true as const, message: active ? "Machine back in service." : "Machine retired." };
});
