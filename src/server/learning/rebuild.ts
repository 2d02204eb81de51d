import "server-only";
import { and, asc, eq, isNotNull } from "drizzle-orm";
import { updateLearnedState, type LearnedState } from "@/lib/honing";
import type { BoreMaterial } from "@/lib/bore-materials";
import { inTransaction } from "@/server/db/retry";
import { learnedRates, rateRows, runs } from "@/server/db/schema";
import { lockPlanningVersion, raisePlanningVersion } from "@/server/plans/planning-version";
import type { RunLearning } from "@/shared/learning/types";
import { NO_RATE_VERSION, startingState } from "./store";

// The learned rates of a shop replayed from its run log: every stored observation (runs.learning),
// per stone × material × machine in its replay order, the runs of the rate row's current version
// folded through the same O(1) update the logging transaction makes. So the rebuild and the stored
// state give identical numbers (tests/integration/learning-store.test.ts compares them).

type Folded = { key: { stoneId: string; boreMaterial: BoreMaterial; machineId: string }; rateVersion: number; sequence: number; state: LearnedState };

export async function rebuildShopLearning(shopId: string): Promise<{ keys: number; runs: number }> {
  return inTransaction(async (tx) => {
    await lockPlanningVersion(tx, shopId);
    const rates = new Map((await tx.select({ id: rateRows.id, version: rateRows.version, uncertaintyFraction: rateRows.uncertaintyFraction })
      .from(rateRows).where(eq(rateRows.shopId, shopId))).map((r) => [r.id, r]));
    const logged = await tx
      .select({ stoneId: runs.stoneId, machineId: runs.machineId, strokes: runs.strokesDone, doneAt: runs.doneAt, learning: runs.learning })
      .from(runs)
      .where(and(eq(runs.shopId, shopId), isNotNull(runs.learning), isNotNull(runs.stoneId)))
      .orderBy(asc(runs.createdAt));
    const folded = new Map<string, Folded>();
    const ordered = logged
      .map((r) => ({ ...r, learning: r.learning as RunLearning }))
      .sort((a, b) => a.learning.sequence - b.learning.sequence);
    let used = 0;
    for (const r of ordered) {
      const key = { stoneId: r.stoneId!, boreMaterial: r.learning.boreMaterial, machineId: r.machineId };
      const id = `${key.stoneId}|${key.boreMaterial}|${key.machineId}`;
      const rate = rates.get(r.learning.rateRowId);
      const entry = folded.get(id) ?? { key, rateVersion: NO_RATE_VERSION, sequence: 0, state: startingState(rate ?? { uncertaintyFraction: 0.25 }) };
      entry.sequence = Math.max(entry.sequence, r.learning.sequence);
      if (rate && r.learning.rateVersion === rate.version) {
        entry.state = updateLearnedState(entry.rateVersion === rate.version ? entry.state : startingState(rate), {
          stockRemovedUm: r.learning.stockRemovedUm, modelRatePerStrokeUm: r.learning.modelRatePerStrokeUm, strokes: r.strokes, loggedAt: r.doneAt.toISOString(),
        });
        entry.rateVersion = rate.version;
        used++;
      }
      folded.set(id, entry);
    }
    await tx.delete(learnedRates).where(eq(learnedRates.shopId, shopId));
    for (const f of folded.values()) {
      await tx.insert(learnedRates).values({ shopId, ...f.key, rateVersion: f.rateVersion, sequence: f.sequence, state: f.state });
    }
    await raisePlanningVersion(tx, shopId);
    return { keys: folded.size, runs: used };
  });
}
