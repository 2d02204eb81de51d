import "server-only";
import { pool } from "@/server/db";

export type Health = { ok: true; database: "up"; latencyMs: number } | { ok: false; database: "down"; reason: string };

/** One round trip to MariaDB, bounded in time so a hung server cannot hang the check. */
export async function checkHealth(timeoutMs = 2000): Promise<Health> {
  const started = performance.now();
  let timer: NodeJS.Timeout | undefined;
  try {
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error(`no answer within ${timeoutMs} ms`)), timeoutMs);
    });
    await Promise.race([pool.query("SELECT 1"), timeout]);
    return { ok: true, database: "up", latencyMs: Math.round(performance.now() - started) };
  } catch (error) {
    const reason = (error as { code?: string; message?: string }).code ?? (error as Error).message ?? "unknown";
    return { ok: false, database: "down", reason: `database unreachable: ${reason}` };
  } finally {
    clearTimeout(timer);
  }
}
