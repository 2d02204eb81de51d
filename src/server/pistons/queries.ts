import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { pistons } from "@/server/db/schema";

/** The job's piston records, in label order. */
export async function listPistons({ shopId, jobId }: { shopId: string; jobId: string }) {
  return db
    .select({
      id: pistons.id, cylinderId: pistons.cylinderId, label: pistons.label, diameterUm: pistons.diameterUm,
      sizingHeightUm: pistons.sizingHeightUm, type: pistons.type, clearanceMinUm: pistons.clearanceMinUm,
      clearanceMaxUm: pistons.clearanceMaxUm, notes: pistons.notes,
    })
    .from(pistons)
    .where(and(eq(pistons.jobId, jobId), eq(pistons.shopId, shopId)))
    .orderBy(asc(pistons.label), asc(pistons.id));
}
export type PistonView = Awaited<ReturnType<typeof listPistons>>[number];
