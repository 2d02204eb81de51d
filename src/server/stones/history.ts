import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db, type Tx } from "@/server/db";
import { rateRowVersions, stoneVersions, users, type RateRow, type Stone } from "@/server/db/schema";
import { newId } from "@/server/db/ids";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { notFound } from "@/server/errors";
import type { ChangeKind } from "@/shared/stones/constants";

/** The figures of a stone that a version records (and a restore brings back). */
export const STONE_VERSIONED_FIELDS = [
  "code", "role", "abrasive", "gritScale", "gritNumber", "bond", "stoneLengthUm", "stoneWidthUm", "stonesPerHead",
  "startHeightUm", "wearLimitHeightUm", "currentHeightUm", "notes", "active",
] as const satisfies readonly (keyof Stone)[];

export const RATE_VERSIONED_FIELDS = [
  "boreMaterial", "removalPerDoubleStrokeUm", "referencePressure", "referencePressureUnit", "referenceBoreLengthUm",
  "referenceAngleDeg", "referenceDiameterUm",
  "raUm", "rzUm", "rkUm", "rpkUm", "rvkUm", "cleanupMode", "cleanupStockUm", "cleanupRzMultiple",
  "wearUmPerUmStock", "uncertaintyFraction", "source", "notes",
] as const satisfies readonly (keyof RateRow)[];

export type Snapshot = Record<string, string | number | boolean | null>;

function pick(row: Record<string, unknown>, fields: readonly string[]): Snapshot {
  const out: Snapshot = {};
  for (const f of fields) out[f] = (row[f] ?? null) as Snapshot[string];
  return out;
}
export const stoneSnapshot = (row: Stone): Snapshot => pick(row, STONE_VERSIONED_FIELDS);
export const rateSnapshot = (row: RateRow): Snapshot => pick(row, RATE_VERSIONED_FIELDS);

/** Fields whose value differs between two snapshots (numbers compared as numbers). */
export function changedFields(before: Snapshot | null, after: Snapshot): string[] {
  return Object.keys(after).filter((k) => !before || !sameValue(before[k] ?? null, after[k] ?? null));
}
function sameValue(a: Snapshot[string], b: Snapshot[string]): boolean {
  if (typeof a === "number" || typeof b === "number") return a !== null && b !== null && Number(a) === Number(b);
  return a === b;
}

type VersionWrite = {
  actor: Actor;
  version: number;
  kind: ChangeKind;
  oldValues: Snapshot | null;
  newValues: Snapshot;
  reason: string;
  restoredFromVersion?: number;
};

export async function writeStoneVersion(tx: Tx, stoneId: string, w: VersionWrite): Promise<string> {
  const id = newId();
  await tx.insert(stoneVersions).values({ id, stoneId, shopId: w.actor.shopId, changedBy: w.actor.userId, ...versionValues(w) });
  return id;
}

export async function writeRateVersion(tx: Tx, row: { id: string; stoneId: string }, w: VersionWrite): Promise<string> {
  const id = newId();
  await tx.insert(rateRowVersions).values({ id, rateRowId: row.id, stoneId: row.stoneId, shopId: w.actor.shopId, changedBy: w.actor.userId, ...versionValues(w) });
  return id;
}

function versionValues(w: VersionWrite) {
  return {
    version: w.version,
    kind: w.kind,
    oldValues: w.oldValues,
    newValues: w.newValues,
    reason: w.reason,
    restoredFromVersion: w.restoredFromVersion ?? null,
  };
}

export type HistoryEntry = {
  id: string;
  subject: "stone" | "rate";
  rateRowId: string | null;
  version: number;
  kind: ChangeKind;
  restoredFromVersion: number | null;
  oldValues: Snapshot | null;
  newValues: Snapshot;
  changed: string[];
  reason: string;
  changedAt: Date;
  changedByName: string | null;
};

/** Every change of a stone and its rate rows, newest first. */
export async function listStoneHistory({ actor, stoneId }: { actor: Actor; stoneId: string }): Promise<HistoryEntry[]> {
  assertCan(actor, "stones.view");
  const [stoneRows, rateRowsHistory] = await Promise.all([
    db
      .select({ v: stoneVersions, changedByName: users.name })
      .from(stoneVersions)
      .leftJoin(users, eq(users.id, stoneVersions.changedBy))
      .where(and(eq(stoneVersions.shopId, actor.shopId), eq(stoneVersions.stoneId, stoneId)))
      .orderBy(desc(stoneVersions.changedAt)),
    db
      .select({ v: rateRowVersions, changedByName: users.name })
      .from(rateRowVersions)
      .leftJoin(users, eq(users.id, rateRowVersions.changedBy))
      .where(and(eq(rateRowVersions.shopId, actor.shopId), eq(rateRowVersions.stoneId, stoneId)))
      .orderBy(desc(rateRowVersions.changedAt)),
  ]);
  const entries = [
    ...stoneRows.map(({ v, changedByName }) => toEntry(v, "stone", null, changedByName)),
    ...rateRowsHistory.map(({ v, changedByName }) => toEntry(v, "rate", v.rateRowId, changedByName)),
  ];
  return entries.sort((a, b) => b.changedAt.getTime() - a.changedAt.getTime() || b.version - a.version);
}

type VersionRow = typeof stoneVersions.$inferSelect | typeof rateRowVersions.$inferSelect;
function toEntry(v: VersionRow, subject: "stone" | "rate", rateRowId: string | null, changedByName: string | null): HistoryEntry {
  const oldValues = (v.oldValues ?? null) as Snapshot | null;
  const newValues = v.newValues as Snapshot;
  return {
    id: v.id, subject, rateRowId, version: v.version, kind: v.kind, restoredFromVersion: v.restoredFromVersion,
    oldValues, newValues, changed: changedFields(oldValues, newValues), reason: v.reason, changedAt: v.changedAt, changedByName,
  };
}

/** One version of a stone or of one of its rate rows; another shop's version is "not found". */
export async function getVersion({ actor, stoneId, versionId }: { actor: Actor; stoneId: string; versionId: string }): Promise<HistoryEntry> {
  const entry = (await listStoneHistory({ actor, stoneId })).find((e) => e.id === versionId);
  if (!entry) throw notFound("That version");
  return entry;
}
