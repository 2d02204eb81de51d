import "server-only";
import { eq, sql } from "drizzle-orm";
import { pool, type Tx } from "@/server/db";
import { planningVersions } from "@/server/db/schema";

// A shop's planning counter (planning_versions): database triggers raise it inside every write to a
// table the plan preview reads (drizzle/0002_planning-version-triggers.sql). 0 until the first write.

/**
 * The shop's current planning counter: one primary-key lookup on every preview. It goes through the
 * callback pool under the promise pool: the promise API captures a stack trace per query (measured:
 * about 2% of the preview route's CPU), which this one-line lookup does not need.
 */
export function readPlanningVersion(shopId: string): Promise<number> {
  return new Promise((resolve, reject) => {
    pool.pool.execute("SELECT version FROM planning_versions WHERE shop_id = ?", [shopId], (error, rows) => {
      if (error) return reject(error);
      const version = (rows as Array<{ version: number | string }>)[0]?.version;
      resolve(version === undefined ? 0 : Number(version));
    });
  });
}

/** The shop's counter row, made with the shop so its first concurrent writes find it (no insert gap lock). */
export async function createPlanningVersion(tx: Tx, shopId: string): Promise<void> {
  await tx.insert(planningVersions).ignore().values({ shopId, version: 1 });
}

/**
 * Locks the shop's counter row first in a transaction that writes planning tables: the triggers raise
 * it anyway, so taking it up front gives every such transaction one lock order (no deadlock between,
 * say, a CSV import and a cylinder assignment).
 */
export async function lockPlanningVersion(tx: Tx, shopId: string): Promise<void> {
  await tx.select({ version: planningVersions.version }).from(planningVersions).where(eq(planningVersions.shopId, shopId)).for("update");
}

/**
 * Raises the shop's counter from app code, for a planning table without triggers (learned_rates:
 * only src/server/learning writes it, and every write there calls this in its transaction).
 */
export async function raisePlanningVersion(tx: Tx, shopId: string): Promise<void> {
  await tx.insert(planningVersions).values({ shopId, version: 1 }).onDuplicateKeyUpdate({ set: { version: sql`${planningVersions.version} + 1` } });
}
