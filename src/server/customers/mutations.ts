import "server-only";
import { assertRoomFor, MAX_CHILDREN } from "@/server/db/bounds";
import { and, eq, sql } from "drizzle-orm";
import { db, type Db, type Tx } from "@/server/db";
import { newId } from "@/server/db/ids";
import { customers } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { notFound } from "@/server/errors";
import { customerSchema } from "@/shared/customers/schema";

/** Adds a customer to the actor's shop. */
export async function createCustomer({ actor, input, tx = db }: { actor: Actor; input: unknown; tx?: Db | Tx }) {
  assertCan(actor, "customers.edit");
  const parsed = customerSchema.parse(input);
  const id = newId();
  await assertRoomFor({ tx, table: customers, where: eq(customers.shopId, actor.shopId), max: MAX_CHILDREN.customersPerShop, what: "customers per shop" });
  await tx.insert(customers).values({ id, shopId: actor.shopId, name: parsed.name, email: parsed.email ?? null, phone: parsed.phone ?? null, notes: parsed.notes ?? null, unitSystem: parsed.unitSystem ?? null });
  return { id };
}

export async function updateCustomer({ actor, customerId, input }: { actor: Actor; customerId: string; input: unknown }) {
  assertCan(actor, "customers.edit");
  const parsed = customerSchema.parse(input);
  const [result] = await db
    .update(customers)
    .set({ name: parsed.name, email: parsed.email ?? null, phone: parsed.phone ?? null, notes: parsed.notes ?? null, unitSystem: parsed.unitSystem ?? null, updatedAt: sql`CURRENT_TIMESTAMP(3)` })
    .where(and(eq(customers.id, customerId), eq(customers.shopId, actor.shopId)));
  if (result.affectedRows === 0) throw notFound("That customer");
  return { id: customerId };
}

/** Archives (or restores) a customer; their jobs keep pointing at them. */
export async function setCustomerArchived({ actor, customerId, archived }: { actor: Actor; customerId: string; archived: boolean }) {
  assertCan(actor, "customers.edit");
  const [result] = await db
    .update(customers)
    .set({ archivedAt: archived ? new Date() : null })
    .where(and(eq(customers.id, customerId), eq(customers.shopId, actor.shopId)));
  if (result.affectedRows === 0) throw notFound("That customer");
  return { id: customerId, archived };
}
