import "server-only";
import { count, type SQL } from "drizzle-orm";
import type { MySqlTable } from "drizzle-orm/mysql-core";
import { db, type Db, type Tx } from "@/server/db";
import { AppError } from "@/server/errors";

// Most rows one parent may hold. Far above any real shop (a block has at most 16 bores, a shop a few
// dozen stones and machines: common practice), low enough that every list and computation over them
// stays bounded for a tenant that signs up to abuse the service.
export const MAX_CHILDREN = {
  pistonsPerJob: 48, // = MAX_MATCH_COUNT in src/lib/honing: the matching takes every piston of a job
  readingSetsPerCylinder: 200,
  stonesPerShop: 500,
  machinesPerShop: 200,
  rateRowsPerStone: 50,
  customersPerShop: 20_000,
  recordVersionsPerJob: 50, // a record corrected fifty times is a process problem, not a document
} as const;

/** Refuses one more row under a parent that already holds `max` (inside the caller's transaction where it has one). */
export async function assertRoomFor({ table, where, max, what, tx = db, adding = 1 }: { table: MySqlTable; where: SQL | undefined; max: number; what: string; tx?: Db | Tx; adding?: number }): Promise<void> {
  const [row] = await tx.select({ n: count() }).from(table).where(where);
  if ((row?.n ?? 0) + adding > max) {
    throw new AppError("conflict", `At most ${max} ${what}. Remove one you no longer need first. Nothing was saved.`);
  }
}
