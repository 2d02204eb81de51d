import "server-only";
import { sql } from "drizzle-orm";
import type { Db, Tx } from "@/server/db";

/**
 * A hand-written statement with `?` placeholders run through drizzle's public `execute`, so it reads
 * inside the caller's transaction (what that transaction wrote is visible) as well as on the pool.
 */
export async function executeRaw(runner: Db | Tx, text: string, params: readonly unknown[]): Promise<unknown[]> {
  const chunks = text.split("?");
  if (chunks.length !== params.length + 1) throw new Error(`executeRaw: ${chunks.length - 1} placeholders for ${params.length} values`);
  const query = sql.join(chunks.flatMap((chunk, i) => (i < params.length ? [sql.raw(chunk), sql`${params[i]}`] : [sql.raw(chunk)])), sql.raw(""));
  const [rows] = (await runner.execute(query)) as unknown as [unknown[]];
  return rows;
}
