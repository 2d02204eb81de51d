import "server-only";
import { inTransaction } from "@/server/db/retry";
import { assertRoomFor, MAX_CHILDREN } from "@/server/db/bounds";
import { and, asc, eq, lte } from "drizzle-orm";
import type { Tx } from "@/server/db";
import { machines, stones, type Stone } from "@/server/db/schema";
import { newId } from "@/server/db/ids";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey, notFound } from "@/server/errors";
import { mmAndInchText } from "@/shared/fields";
import { createStoneSchema, setStoneActiveSchema, updateStoneSchema, type StoneInput } from "@/shared/stones/schema";
import { optionalReason } from "@/shared/stones/fields";
import { changedFields, stoneSnapshot, writeStoneVersion } from "./history";
import { isStoneInReleasedPlan } from "./released-plans";

export const fieldError = (field: string, message: string) =>
  new AppError("bad_request", "Some fields need attention.", { fieldErrors: { [field]: [message] } });

/** A stone must fit every active machine: longer than a machine's stroke, it could never pass through. */
export async function assertFitsMachines(tx: Tx, shopId: string, stoneLengthUm: number): Promise<void> {
  const [tooShort] = await tx
    .select({ name: machines.name, maxStrokeLengthUm: machines.maxStrokeLengthUm })
    .from(machines)
    .where(and(eq(machines.shopId, shopId), eq(machines.active, true), lte(machines.maxStrokeLengthUm, stoneLengthUm)))
    .orderBy(asc(machines.maxStrokeLengthUm))
    .limit(1);
  if (tooShort) {
    const stroke = mmAndInchText(tooShort.maxStrokeLengthUm);
    throw fieldError("stoneLengthUm", `The stone must be shorter than every active machine's maximum stroke: ${tooShort.name} strokes at most ${stroke}.`);
  }
}

export function stoneColumns(input: StoneInput) {
  const { grit, ...rest } = input;
  return { ...rest, gritScale: grit.scale, gritNumber: grit.number };
}

function rethrowDuplicateCode(error: unknown): never {
  if (isDuplicateKey(error)) throw fieldError("code", "Another stone set of this shop already has that code.");
  throw error;
}

/** Adds a stone set to the shop's library, with its first version. */
export async function createStone({ actor, input, reason }: { actor: Actor; input: unknown; reason?: unknown }) {
  assertCan(actor, "stones.edit");
  const parsed = createStoneSchema.parse(input);
  const why = optionalReason(reason, "Added to the library");
  const id = newId();
  try {
    await inTransaction(async (tx) => {
      await assertFitsMachines(tx, actor.shopId, parsed.stoneLengthUm);
      await assertRoomFor({ tx, table: stones, where: eq(stones.shopId, actor.shopId), max: MAX_CHILDREN.stonesPerShop, what: "stone sets per shop" });
      await tx.insert(stones).values({ id, shopId: actor.shopId, ...stoneColumns(parsed), version: 1 });
      const row = await lockStone(tx, actor, id);
      await writeStoneVersion(tx, id, { actor, version: 1, kind: "create", oldValues: null, newValues: stoneSnapshot(row), reason: why });
    });
  } catch (error) {
    rethrowDuplicateCode(error);
  }
  return { stoneId: id, version: 1 };
}

export async function lockStone(tx: Tx, actor: Actor, stoneId: string): Promise<Stone> {
  const [row] = await tx.select().from(stones).where(and(eq(stones.id, stoneId), eq(stones.shopId, actor.shopId))).for("update");
  if (!row) throw notFound("That stone set");
  return row;
}

export function assertVersion(current: number, expected: number): void {
  if (current !== expected) {
    throw new AppError("conflict", `Someone saved a newer version (${current}) since you opened this one (${expected}). Reload and make your change again.`);
  }
}

/** Changes a stone set's figures; writes a version with the reason. An unchanged form writes nothing. */
export async function updateStone({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "stones.edit");
  const { stoneId, expectedVersion, reason, ...fields } = updateStoneSchema.parse(input);
  try {
    return await inTransaction(async (tx) => {
      const before = await lockStone(tx, actor, stoneId);
      assertVersion(before.version, expectedVersion);
      const next = { ...before, ...stoneColumns(fields) };
      if (changedFields(stoneSnapshot(before), stoneSnapshot(next)).length === 0) return { stoneId, version: before.version, changed: false };
      if (next.stoneLengthUm !== before.stoneLengthUm) await assertFitsMachines(tx, actor.shopId, next.stoneLengthUm);
      const version = before.version + 1;
      await tx.update(stones).set({ ...stoneColumns(fields), version, updatedAt: new Date() }).where(eq(stones.id, stoneId));
      await writeStoneVersion(tx, stoneId, { actor, version, kind: "update", oldValues: stoneSnapshot(before), newValues: stoneSnapshot(next), reason });
      return { stoneId, version, changed: true };
    });
  } catch (error) {
    rethrowDuplicateCode(error);
  }
}

/** Retires or brings back a stone set. A stone a released plan uses cannot be retired. */
export async function setStoneActive({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "stones.edit");
  const { stoneId, active, reason } = setStoneActiveSchema.parse(input);
  return inTransaction(async (tx) => {
    const before = await lockStone(tx, actor, stoneId);
    if (before.active === active) return { stoneId, version: before.version, changed: false };
    if (!active && (await isStoneInReleasedPlan(actor.shopId, stoneId))) {
      throw new AppError("conflict", "This stone set is used by a released plan. Finish or withdraw that plan before retiring it.");
    }
    const version = before.version + 1;
    await tx.update(stones).set({ active, version, updatedAt: new Date() }).where(eq(stones.id, stoneId));
    const kind = active ? "reactivate" : "retire";
    await writeStoneVersion(tx, stoneId, { actor, version, kind, oldValues: stoneSnapshot(before), newValues: stoneSnapshot({ ...before, active }), reason });
    return { stoneId, version, changed: true };
  });
}
