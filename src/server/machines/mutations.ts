import "server-only";
import { assertRoomFor, MAX_CHILDREN } from "@/server/db/bounds";
import { and, desc, eq, gte } from "drizzle-orm";
import { db } from "@/server/db";
import { machines, stones } from "@/server/db/schema";
import { newId } from "@/server/db/ids";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { isDuplicateKey, notFound } from "@/server/errors";
import { mmAndInchText } from "@/shared/fields";
import { fieldError } from "@/server/stones/mutations";
import { createMachineSchema, setMachineActiveSchema, updateMachineSchema } from "@/shared/machines/schema";

function rethrowDuplicateName(error: unknown): never {
  if (isDuplicateKey(error)) throw fieldError("name", "Another machine of this shop already has that name.");
  throw error;
}

/** Every active stone must stay shorter than an active machine's maximum stroke (issue 6). */
async function assertStonesFit(shopId: string, maxStrokeLengthUm: number): Promise<void> {
  const [longest] = await db
    .select({ code: stones.code, stoneLengthUm: stones.stoneLengthUm })
    .from(stones)
    .where(and(eq(stones.shopId, shopId), eq(stones.active, true), gte(stones.stoneLengthUm, maxStrokeLengthUm)))
    .orderBy(desc(stones.stoneLengthUm))
    .limit(1);
  if (longest) {
    throw fieldError("maxStrokeLengthUm", `The maximum stroke must be longer than every active stone: ${longest.code} is ${mmAndInchText(longest.stoneLengthUm)} long.`);
  }
}

export async function createMachine({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "machines.edit");
  const parsed = createMachineSchema.parse(input);
  await assertStonesFit(actor.shopId, parsed.maxStrokeLengthUm);
  const id = newId();
  try {
    await assertRoomFor({ table: machines, where: eq(machines.shopId, actor.shopId), max: MAX_CHILDREN.machinesPerShop, what: "machines per shop" });
    await db.insert(machines).values({ id, shopId: actor.shopId, ...parsed });
  } catch (error) {
    rethrowDuplicateName(error);
  }
  return { machineId: id };
}

export async function updateMachine({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "machines.edit");
  const { machineId, ...fields } = updateMachineSchema.parse(input);
  const [row] = await db.select({ active: machines.active }).from(machines).where(and(eq(machines.id, machineId), eq(machines.shopId, actor.shopId)));
  if (!row) throw notFound("That machine");
  if (row.active) await assertStonesFit(actor.shopId, fields.maxStrokeLengthUm);
  try {
    await db.update(machines).set({ ...fields, updatedAt: new Date() }).where(and(eq(machines.id, machineId), eq(machines.shopId, actor.shopId)));
  } catch (error) {
    rethrowDuplicateName(error);
  }
  return { machineId };
}

/** Retires a machine (kept for the plans and runs that name it) or brings it back. */
export async function setMachineActive({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "machines.edit");
  const { machineId, active } = setMachineActiveSchema.parse(input);
  const [row] = await db.select().from(machines).where(and(eq(machines.id, machineId), eq(machines.shopId, actor.shopId)));
  if (!row) throw notFound("That machine");
  if (active && !row.active) await assertStonesFit(actor.shopId, row.maxStrokeLengthUm);
  await db.update(machines).set({ active, updatedAt: new Date() }).where(and(eq(machines.id, machineId), eq(machines.shopId, actor.shopId)));
  return { machineId, active };
}
