import "server-only";
import { and, asc, count, desc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { rateRows, stones, type RateRow, type Stone } from "@/server/db/schema";
import { formatGrit, gritGrainSizeUm, type GritScale } from "@/lib/honing";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { notFound } from "@/server/errors";
import { NEAR_WEAR_LIMIT_FRACTION } from "@/shared/stones/constants";

export type WearState = "ok" | "near" | "worn";
export type WearStatus = { usableUm: number; leftUm: number; fractionLeft: number; state: WearState };

/** Height left above the wear limit as a share of the usable height (start − limit). */
export function wearStatus(s: Pick<Stone, "startHeightUm" | "wearLimitHeightUm" | "currentHeightUm">): WearStatus {
  const usableUm = Math.max(s.startHeightUm - s.wearLimitHeightUm, 0);
  const leftUm = s.currentHeightUm - s.wearLimitHeightUm;
  const fractionLeft = usableUm > 0 ? Math.min(Math.max(leftUm / usableUm, 0), 1) : 0;
  const state: WearState = leftUm <= 0 ? "worn" : fractionLeft <= NEAR_WEAR_LIMIT_FRACTION ? "near" : "ok";
  return { usableUm, leftUm, fractionLeft, state };
}

/** What a screen or API caller sees of a stone set (explicit fields, no internals). */
export function toStoneView(s: Stone) {
  const grit = { scale: s.gritScale as GritScale, number: s.gritNumber };
  return {
    id: s.id, code: s.code, role: s.role, abrasive: s.abrasive, bond: s.bond,
    grit, gritLabel: formatGrit(grit), grainSizeUm: gritGrainSizeUm(grit),
    stoneLengthUm: s.stoneLengthUm, stoneWidthUm: s.stoneWidthUm, stonesPerHead: s.stonesPerHead,
    startHeightUm: s.startHeightUm, wearLimitHeightUm: s.wearLimitHeightUm, currentHeightUm: s.currentHeightUm,
    wear: wearStatus(s), notes: s.notes, active: s.active, isDemo: s.isDemo, version: s.version, updatedAt: s.updatedAt,
  };
}
export type StoneView = ReturnType<typeof toStoneView>;

export function toRateView(r: RateRow) {
  return {
    id: r.id, stoneId: r.stoneId, boreMaterial: r.boreMaterial, removalPerDoubleStrokeUm: r.removalPerDoubleStrokeUm,
    referencePressure: r.referencePressure, referencePressureUnit: r.referencePressureUnit, referenceBoreLengthUm: r.referenceBoreLengthUm,
    referenceAngleDeg: r.referenceAngleDeg, referenceDiameterUm: r.referenceDiameterUm,
    raUm: r.raUm, rzUm: r.rzUm, rkUm: r.rkUm, rpkUm: r.rpkUm, rvkUm: r.rvkUm,
    cleanupMode: r.cleanupMode, cleanupStockUm: r.cleanupStockUm, cleanupRzMultiple: r.cleanupRzMultiple,
    wearUmPerUmStock: r.wearUmPerUmStock, uncertaintyFraction: r.uncertaintyFraction, source: r.source, notes: r.notes,
    /** The version a plan records when it uses this row. */
    version: r.version,
    /** Learned rate from logged runs: filled by the learning issue; null until then. */
    learned: null as null | { removalPerDoubleStrokeUm: number; runs: number },
    updatedAt: r.updatedAt,
  };
}
export type RateView = ReturnType<typeof toRateView>;

/** The shop's stone sets, active first, each with how many rate rows it has. */
export async function listStones({ actor }: { actor: Actor }) {
  assertCan(actor, "stones.view");
  const [rows, counts] = await Promise.all([
    db.select().from(stones).where(eq(stones.shopId, actor.shopId)).orderBy(desc(stones.active), asc(stones.role), asc(stones.code)),
    db.select({ stoneId: rateRows.stoneId, n: count() }).from(rateRows).where(eq(rateRows.shopId, actor.shopId)).groupBy(rateRows.stoneId),
  ]);
  const countOf = new Map(counts.map((c) => [c.stoneId, Number(c.n)]));
  return rows.map((stone) => ({ ...toStoneView(stone), rateCount: countOf.get(stone.id) ?? 0 }));
}

/** One stone set with its rate rows; another shop's stone is "not found". */
export async function getStoneDetail({ actor, stoneId }: { actor: Actor; stoneId: string }) {
  assertCan(actor, "stones.view");
  const [stone] = await db.select().from(stones).where(and(eq(stones.id, stoneId), eq(stones.shopId, actor.shopId))).limit(1);
  if (!stone) throw notFound("That stone set");
  const rates = await db
    .select()
    .from(rateRows)
    .where(and(eq(rateRows.shopId, actor.shopId), eq(rateRows.stoneId, stoneId)))
    .orderBy(asc(rateRows.boreMaterial));
  return { stone: toStoneView(stone), rates: rates.map(toRateView) };
}

export async function getRateRow({ actor, rateRowId }: { actor: Actor; rateRowId: string }) {
  assertCan(actor, "stones.view");
  const [row] = await db.select().from(rateRows).where(and(eq(rateRows.id, rateRowId), eq(rateRows.shopId, actor.shopId))).limit(1);
  if (!row) throw notFound("That rate row");
  return toRateView(row);
}

/** Active stone sets at or near their wear limit, the most worn first (for the dashboard). */
export async function listStonesNearWearLimit({ actor }: { actor: Actor }) {
  assertCan(actor, "stones.view");
  const rows = await db.select().from(stones).where(and(eq(stones.shopId, actor.shopId), eq(stones.active, true)));
  return rows
    .map(toStoneView)
    .filter((s) => s.wear.state !== "ok")
    .sort((a, b) => a.wear.fractionLeft - b.wear.fractionLeft || a.code.localeCompare(b.code))
    .map((s) => ({ id: s.id, code: s.code, role: s.role, gritLabel: s.gritLabel, currentHeightUm: s.currentHeightUm, wearLimitHeightUm: s.wearLimitHeightUm, wear: s.wear }));
}
