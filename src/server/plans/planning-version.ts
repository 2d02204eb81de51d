import "server-only";
import { pool } from "@/server/db";

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
