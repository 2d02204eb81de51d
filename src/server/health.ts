import "server-only";
import { pool } from "@/server/db";
import { logError } from "@/server/log";

// Public: anyone may ask, so the answer says only up or down; why it is down goes to the log.
export type Health = { ok: true; database: "up" } | { ok: false; database: "down" };

/** One round trip to MariaDB, bounded in time so a hung server cannot hang the check. */
export async function checkHealth(timeoutMs = 2000): Promise<Health> {
  let timer: NodeJS.Timeout | undefined;
  try {
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error(`no answer within ${timeoutMs} ms`)), timeoutMs);
    });
    await Promise.race([pool.query("SELECT 1"), timeout]);
    return { ok: true, database: "up" };
  } catch (error) {
    logError("health.database_down", error);
    return { ok: false, database: "down" };
  } finally {
    clearTimeout(timer);
  }
}
