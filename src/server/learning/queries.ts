import "server-only";
import { and, asc, desc, eq, isNotNull } from "drizzle-orm";
import type { BoreMaterial } from "@/lib/bore-materials";
import { db } from "@/server/db";
import { learnedRates, machines, rateRows, runs } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import type { RunLearning } from "@/shared/learning/types";
import { learnedView, type LearnedView } from "./view";

// The lead's view of a stone's learning (/stones/[stoneId]): per bore material × machine, the table's
// rate, the learned one with its interval and runs, and every run's observed rate over time.

/** Points on the chart per stone, newest kept: enough to see drift, bounded for the page. */
export const CHART_POINTS_MAX = 400;

export type RatePoint = { at: string; observedUm: number; current: boolean };
export type StoneLearning = {
  rateRowId: string; rateVersion: number; boreMaterial: BoreMaterial; machineId: string; machineName: string;
  tableRateUm: number; learned: LearnedView | null; points: RatePoint[];
};

export async function getStoneLearning({ actor, stoneId }: { actor: Actor; stoneId: string }): Promise<StoneLearning[]> {
  assertCan(actor, "stones.view");
  const [rates, states, machineRows, logged] = await Promise.all([
    db.select({ id: rateRows.id, version: rateRows.version, boreMaterial: rateRows.boreMaterial, removal: rateRows.removalPerDoubleStrokeUm })
      .from(rateRows).where(and(eq(rateRows.shopId, actor.shopId), eq(rateRows.stoneId, stoneId))).orderBy(asc(rateRows.boreMaterial)),
    db.select().from(learnedRates).where(and(eq(learnedRates.shopId, actor.shopId), eq(learnedRates.stoneId, stoneId))),
    db.select({ id: machines.id, name: machines.name }).from(machines).where(eq(machines.shopId, actor.shopId)).orderBy(asc(machines.name)),
    db.select({ machineId: runs.machineId, strokes: runs.strokesDone, doneAt: runs.doneAt, learning: runs.learning })
      .from(runs).where(and(eq(runs.shopId, actor.shopId), eq(runs.stoneId, stoneId), isNotNull(runs.learning)))
      .orderBy(desc(runs.doneAt)).limit(CHART_POINTS_MAX),
  ]);
  const out: StoneLearning[] = [];
  for (const rate of rates) {
    for (const machine of machineRows) {
      const state = states.find((s) => s.boreMaterial === rate.boreMaterial && s.machineId === machine.id);
      const points = logged
        .filter((r) => r.machineId === machine.id && (r.learning as RunLearning).boreMaterial === rate.boreMaterial)
        .map((r) => {
          const l = r.learning as RunLearning;
          return { at: r.doneAt.toISOString(), observedUm: (l.stockRemovedUm / r.strokes / l.modelRatePerStrokeUm) * l.tableRateUm, current: l.rateVersion === rate.version };
        })
        .reverse();
      if (!state && points.length === 0) continue;
      out.push({
        rateRowId: rate.id, rateVersion: rate.version, boreMaterial: rate.boreMaterial, machineId: machine.id, machineName: machine.name,
        tableRateUm: rate.removal, learned: state && state.rateVersion === rate.version ? learnedView(state.state) : null, points,
      });
    }
  }
  return out;
}
