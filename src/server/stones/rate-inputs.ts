import "server-only";
// A rate row as planHone takes it, and the rows the honing allowance rests on (the planning library
// itself: src/server/plans/library.ts).
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { rateRows, stones, type RateRow, type Stone } from "@/server/db/schema";
import type { StoneRateInput } from "@/lib/honing";
import type { BoreMaterial } from "@/lib/bore-materials";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";

/** The rate row columns planHone's stone rate is built from. */
export type RateInputRow = Pick<
  RateRow,
  "removalPerDoubleStrokeUm" | "referencePressure" | "referenceBoreLengthUm" | "uncertaintyFraction" | "raUm" | "rzUm" | "wearUmPerUmStock" | "cleanupMode" | "cleanupStockUm" | "cleanupRzMultiple" | "referenceAngleDeg" | "referenceDiameterUm"
>;

export function toStoneRateInput(r: RateInputRow): StoneRateInput {
  const cleanup = r.cleanupMode === "explicit" && r.cleanupStockUm !== null ? { cleanupStockUm: r.cleanupStockUm } : { cleanupRzMultiple: r.cleanupRzMultiple ?? undefined };
  return {
    removalPerDoubleStrokeUm: r.removalPerDoubleStrokeUm, referencePressure: r.referencePressure,
    referenceBoreLengthUm: r.referenceBoreLengthUm, uncertaintyFraction: r.uncertaintyFraction,
    raUm: r.raUm, rzUm: r.rzUm, wearUmPerUmStock: r.wearUmPerUmStock, ...cleanup,
    referenceAngleDeg: r.referenceAngleDeg, ...(r.referenceDiameterUm !== null && { referenceDiameterUm: r.referenceDiameterUm }),
  };
}

/**
 * The rate rows the honing allowance rests on: per role, the first active stone with a row for the
 * material, in the order the planning library lists them (role, then code).
 */
export async function sequenceRatesFor({ actor, boreMaterial }: { actor: Actor; boreMaterial: BoreMaterial }): Promise<Record<Stone["role"], StoneRateInput | null>> {
  assertCan(actor, "stones.view");
  const rows = await db
    .select({ role: stones.role, rate: rateRows })
    .from(stones)
    .innerJoin(rateRows, and(eq(rateRows.stoneId, stones.id), eq(rateRows.shopId, actor.shopId), eq(rateRows.boreMaterial, boreMaterial)))
    .where(and(eq(stones.shopId, actor.shopId), eq(stones.active, true)))
    .orderBy(asc(stones.role), asc(stones.code));
  const first = (role: Stone["role"]) => {
    const row = rows.find((r) => r.role === role);
    return row ? toStoneRateInput(row.rate) : null;
  };
  return { coarse: first("coarse"), finish: first("finish"), plateau: first("plateau") };
}
