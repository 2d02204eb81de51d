"use server";
import { z } from "zod";
import { revalidatePath } from "next/cache";
import { defineAction } from "@/server/http/action";
import { createCustomer, setCustomerArchived, updateCustomer } from "@/server/customers/mutations";
import { customerSchema } from "@/shared/customers/schema";
import { id } from "@/shared/fields";

// The customer forms call these with the object they validated with customerSchema (one mutation path: DEVELOPERS.md).

export const createCustomerAction = defineAction(customerSchema, "customers.edit", async (actor, input) => {
  const created = await createCustomer({ actor, input });
  revalidatePath("/customers");
  return { ok: true as const, message: `${input.name} added.`, data: created };
});

export const updateCustomerAction = defineAction(customerSchema.extend({ customerId: id }), "customers.edit", async (actor, { customerId, ...input }) => {
  await updateCustomer({ actor, customerId, input });
  revalidatePath(`/customers/${customerId}`);
  return { ok: true as const, message: "Saved." };
});

export const setCustomerArchivedAction = defineAction(z.object({ customerId: id, archived: z.boolean() }), "customers.edit", async (actor, { customerId, archived }) => {
  await setCustomerArchived({ actor, customerId, archived });
  revalidatePath(`/customers/${customerId}`);
  revalidatePath("/customers");
  return { ok: true as const, message: archived ? "Archived." : "Restored." };
});
