import "server-only";
import { inTransaction } from "@/server/db/retry";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { rateRowVersions, rateRows, stoneVersions, stones } from "@/server/db/schema";
import { formatGrit, type GritScale } from "@/lib/honing";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey, notFound } from "@/server/errors";
import { rateInputSchema, restoreVersionSchema, stoneInputSchema } from "@/shared/stones/schema";
import { changedFields, rateSnapshot, stoneSnapshot, writeRateVersion, writeStoneVersion, type Snapshot } from "./history";
import { assertFitsMachines, fieldError, lockStone, stoneColumns } from "./mutations";
import { lockRateRow, rateColumns } from "./rate-mutations";

const withoutNulls = (s: Snapshot) => Object.fromEntries(Object.entries(s).filter(([, v]) => v !== null));

function invalidNow(error: unknown): never {
  if (error instanceof Error && error.name === "ZodError") {
    throw new AppError("conflict", "That version no longer passes today's checks (for example a height or a machine changed since). Edit the current values instead.");
  }
  throw error;
}

/**
 * Brings back the figures of an earlier version as a new version with its own reason. A stone's
 * current height and active state stay as they are: a restore returns the lead's figures, not the
 * wear the stone has had since.
 */
export async function restoreVersion({ actor, input }: { actor: Actor; input: unknown }) {
  assertCan(actor, "stones.edit");
  const { stoneId, versionId, reason } = restoreVersionSchema.parse(input);
  const scope = (t: typeof stoneVersions | typeof rateRowVersions) => and(eq(t.id, versionId), eq(t.shopId, actor.shopId), eq(t.stoneId, stoneId));
  const [stoneVersion] = await db.select().from(stoneVersions).where(scope(stoneVersions)).limit(1);
  if (stoneVersion) return restoreStone(actor, stoneId, stoneVersion.newValues as Snapshot, stoneVersion.version, reason);
  const [rateVersion] = await db.select().from(rateRowVersions).where(scope(rateRowVersions)).limit(1);
  if (rateVersion) return restoreRate(actor, rateVersion.rateRowId, rateVersion.newValues as Snapshot, rateVersion.version, reason);
  throw notFound("That version");
}

async function restoreStone(actor: Actor, stoneId: string, values: Snapshot, fromVersion: number, reason: string) {
  try {
    return await inTransaction(async (tx) => {
      const before = await lockStone(tx, actor, stoneId);
      const grit = formatGrit({ scale: values.gritScale as GritScale, number: Number(values.gritNumber) });
      const parsed = (() => {
        try {
          return stoneInputSchema.parse({ ...withoutNulls(values), grit, currentHeightUm: before.currentHeightUm });
        } catch (error) {
          invalidNow(error);
        }
      })();
      const next = { ...before, ...stoneColumns(parsed) };
      if (changedFields(stoneSnapshot(before), stoneSnapshot(next)).length === 0) return { subject: "stone" as const, version: before.version, changed: false };
      await assertFitsMachines(tx, actor.shopId, next.stoneLengthUm);
      const version = before.version + 1;
      await tx.update(stones).set({ ...stoneColumns(parsed), version, updatedAt: new Date() }).where(eq(stones.id, stoneId));
      await writeStoneVersion(tx, stoneId, { actor, version, kind: "restore", restoredFromVersion: fromVersion, oldValues: stoneSnapshot(before), newValues: stoneSnapshot(next), reason });
      return { subject: "stone" as const, version, changed: true };
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw fieldError("code", "Another stone set now has that version's code.");
    throw error;
  }
}

async function restoreRate(actor: Actor, rateRowId: string, values: Snapshot, fromVersion: number, reason: string) {
  return inTransaction(async (tx) => {
    const before = await lockRateRow(tx, actor, rateRowId);
    const parsed = (() => {
      try {
        return rateInputSchema.parse(withoutNulls(values));
      } catch (error) {
        invalidNow(error);
      }
    })();
    const columns = rateColumns(parsed);
    const next = { ...before, ...columns };
    if (changedFields(rateSnapshot(before), rateSnapshot(next)).length === 0) return { subject: "rate" as const, version: before.version, changed: false };
    const version = before.version + 1;
    await tx.update(rateRows).set({ ...columns, version, updatedAt: new Date() }).where(eq(rateRows.id, rateRowId));
    await writeRateVersion(tx, before, { actor, version, kind: "restore", restoredFromVersion: fromVersion, oldValues: rateSnapshot(before), newValues: rateSnapshot(next), reason });
    return { subject: "rate" as const, version, changed: true };
  });
}
