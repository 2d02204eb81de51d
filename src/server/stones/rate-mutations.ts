import "server-only";
import { inTransaction } from "@/server/db/retry";
import { and, eq } from "drizzle-orm";
import type { Tx } from "@/server/db";
import { rateRows, type RateRow } from "@/server/db/schema";
import { newId } from "@/server/db/ids";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { isDuplicateKey, notFound } from "@/server/errors";
import { DEFAULT_CLEANUP_RZ_MULTIPLE } from "@/shared/stones/constants";
import { createRateRowSchema, updateRateRowSchema, type RateInput } from "@/shared/stones/schema";
import { optionalReason } from "@/shared/stones/fields";
import { changedFields, rateSnapshot, writeRateVersion } from "./history";
import { assertVersion, fieldError, lockStone } from "./mutations";

/** Stored columns of a rate row: the clean-up figure that does not apply is cleared, not kept stale. */
export function rateColumns(input: RateInput) {
  const explicit = input.cleanupMode === "explicit";
  return {
    ...input,
    rkUm: input.rkUm ?? null,
    rpkUm: input.rpkUm ?? null,
    rvkUm: input.rvkUm ?? null,
    referenceDiameterUm: input.referenceDiameterUm ?? null,
    cleanupStockUm: explicit ? (input.cleanupStockUm ?? null) : null,
    cleanupRzMultiple: explicit ? null : (input.cleanupRzMultiple ?? DEFAULT_CLEANUP_RZ_MULTIPLE),
  };
}

export async function lockRateRow(tx: Tx, actor: Actor, rateRowId: string): Promise<RateRow> {
  const [row] = await tx.select().from(rateRows).where(and(eq(rateRows.id, rateRowId), eq(rateRows.shopId, actor.shopId))).for("update");
  if (!row) throw notFound("That rate row");
  return row;
}

/** Adds the rate row of a stone on one bore material, with its first version. */
export async function createRateRow({ actor, input, reason }: { actor: Actor; input: unknown; reason?: unknown }) {
  assertCan(actor, "stones.edit");
  const { stoneId, boreMaterial, ...fields } = createRateRowSchema.parse(input);
  const why = optionalReason(reason, "Added to the rate table");
  const id = newId();
  try {
    await inTransaction(async (tx) => {
      await lockStone(tx, actor, stoneId);
      await tx.insert(rateRows).values({ id, shopId: actor.shopId, stoneId, boreMaterial, ...rateColumns(fields), version: 1 });
      const row = await lockRateRow(tx, actor, id);
      await writeRateVersion(tx, row, { actor, version: 1, kind: "create", oldValues: null, newValues: rateSnapshot(row), reason: why });
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw fieldError("boreMaterial", "This stone already has a rate row for that bore material: edit it instead.");
    throw error;
  }
  return { rateRowId: id, version: 1 };
}

/** Changes a rate row; the old and new values and the reason go into its history. */
export async function updateRateRow({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "stones.edit");
  const { rateRowId, expectedVersion, reason, ...fields } = updateRateRowSchema.parse(input);
  return inTransaction(async (tx) => {
    const before = await lockRateRow(tx, actor, rateRowId);
    assertVersion(before.version, expectedVersion);
    return writeRateChange(tx, actor, before, rateColumns(fields), reason);
  });
}

/** A locked rate row's next version with its history entry: the one path for edits and Adopt (learning/adopt.ts). */
export async function writeRateChange(tx: Tx, actor: Actor, before: RateRow, columns: Partial<RateRow>, reason: string) {
  const rateRowId = before.id;
  const next = { ...before, ...columns };
  if (changedFields(rateSnapshot(before), rateSnapshot(next)).length === 0) return { rateRowId, stoneId: before.stoneId, version: before.version, changed: false };
  const version = before.version + 1;
  await tx.update(rateRows).set({ ...columns, version, updatedAt: new Date() }).where(eq(rateRows.id, rateRowId));
  await writeRateVersion(tx, before, { actor, version, kind: "update", oldValues: rateSnapshot(before), newValues: rateSnapshot(next), reason });
  return { rateRowId, stoneId: before.stoneId, version, changed: true };
}
