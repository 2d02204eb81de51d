import "server-only";
import { inTransaction } from "@/server/db/retry";
import { assertRoomFor, MAX_CHILDREN } from "@/server/db/bounds";
import { and, eq, inArray, sql } from "drizzle-orm";
import { db, type Tx } from "@/server/db";
import { newId } from "@/server/db/ids";
import { cylinders, jobs, readingSets, readings, type Job } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey, notFound, type FieldErrors } from "@/server/errors";
import { assertMayEnterReadings, loadCylinder, loadJob } from "@/server/jobs/access";
import type { ReadingKind } from "@/shared/jobs/constants";
import { readingOutOfRange, readingSetSchema, type ReadingSetInput } from "@/shared/readings/schema";

export type NewReadingSet = {
  cylinderId: string;
  kind: ReadingKind;
  gauge?: string | null;
  temperatureC?: number | null;
  source: "manual" | "csv";
  clientKey?: string;
  levels: ReadingSetInput["levels"];
};

function rangeErrors(levels: ReadingSetInput["levels"], standardBoreUm: number): FieldErrors {
  const errors: FieldErrors = {};
  levels.forEach((level, i) => {
    for (const key of ["aUm", "bUm"] as const) {
      const problem = readingOutOfRange(level[key], standardBoreUm);
      if (problem) errors[`levels.${i}.${key}`] = [problem];
    }
  });
  return errors;
}

/** Writes reading sets inside the caller's transaction (the job row is locked by the caller). */
export async function insertReadingSets(tx: Tx, actor: Actor, job: Job, sets: NewReadingSet[]): Promise<string[]> {
  const ids: string[] = [];
  for (const cylinderId of new Set(sets.map((s) => s.cylinderId))) {
    const adding = sets.filter((s) => s.cylinderId === cylinderId).length;
    await assertRoomFor({ tx, table: readingSets, where: eq(readingSets.cylinderId, cylinderId), max: MAX_CHILDREN.readingSetsPerCylinder, what: "reading sets per bore", adding });
  }
  for (const set of sets) {
    const id = newId();
    await tx.insert(readingSets).values({
      id, shopId: job.shopId, jobId: job.id, cylinderId: set.cylinderId, kind: set.kind, gauge: set.gauge ?? null,
      temperatureC: set.temperatureC ?? null, source: set.source, clientKey: set.clientKey ?? null, takenBy: actor.userId,
    });
    await tx.insert(readings).values(
      set.levels.flatMap((level, levelIndex) =>
        (["A", "B"] as const).map((direction) => ({
          id: newId(), shopId: job.shopId, readingSetId: id, levelIndex, level: level.name, direction,
          diameterUm: direction === "A" ? level.aUm : level.bUm,
        })),
      ),
    );
    ids.push(id);
  }
  await advanceStatus(tx, job);
  return ids;
}

/** The work moves the status: every bore measured → measured; every bore finished while in work → inspected. */
async function advanceStatus(tx: Tx, job: Job): Promise<void> {
  const next = job.status === "received" ? "measured" : job.status === "in_work" ? "inspected" : null;
  if (!next) return;
  const kinds: ReadingKind[] | null = next === "measured" ? null : ["final"];
  const rows = await tx
    .selectDistinct({ cylinderId: readingSets.cylinderId })
    .from(readingSets)
    .where(and(eq(readingSets.jobId, job.id), kinds ? inArray(readingSets.kind, kinds) : undefined));
  const [total] = await tx.select({ n: sql<number>`count(*)`.mapWith(Number) }).from(cylinders).where(eq(cylinders.jobId, job.id));
  if (rows.length >= (total?.n ?? Infinity)) await tx.update(jobs).set({ status: next }).where(eq(jobs.id, job.id));
}

async function findByClientKey(shopId: string, clientKey: string) {
  const [row] = await db.select({ id: readingSets.id }).from(readingSets).where(and(eq(readingSets.shopId, shopId), eq(readingSets.clientKey, clientKey))).limit(1);
  return row?.id ?? null;
}

/** Records one reading set; a retried submission with the same client key is written once. */
export async function createReadingSet({ actor, jobId, input }: { actor: Actor; jobId: string; input: unknown }): Promise<{ id: string; created: boolean }> {
  assertCan(actor, "jobs.view");
  const parsed = readingSetSchema.parse(input);
  try {
    return await inTransaction(async (tx) => {
      const job = await loadJob({ actor, jobId, tx, forUpdate: true });
      const cylinder = await loadCylinder({ job, cylinderId: parsed.cylinderId, tx });
      assertMayEnterReadings(actor, job, cylinder, parsed.kind);
      const existing = parsed.clientKey ? await findByClientKey(actor.shopId, parsed.clientKey) : null;
      if (existing) return { id: existing, created: false };
      const errors = rangeErrors(parsed.levels, job.standardBoreUm);
      if (Object.keys(errors).length > 0) throw new AppError("bad_request", "Some readings need attention.", { fieldErrors: errors });
      const [id] = await insertReadingSets(tx, actor, job, [{ ...parsed, source: "manual" }]);
      return { id: id!, created: true };
    });
  } catch (error) {
    if (parsed.clientKey && isDuplicateKey(error)) {
      const existing = await findByClientKey(actor.shopId, parsed.clientKey);
      if (existing) return { id: existing, created: false };
    }
    throw error;
  }
}

/** Removes a reading set entered by mistake (machinist and above). */
export async function deleteReadingSet({ actor, jobId, readingSetId }: { actor: Actor; jobId: string; readingSetId: string }) {
  assertCan(actor, "readings.edit");
  const job = await loadJob({ actor, jobId });
  const [result] = await db.delete(readingSets).where(and(eq(readingSets.id, readingSetId), eq(readingSets.jobId, job.id), eq(readingSets.shopId, actor.shopId)));
  if (result.affectedRows === 0) throw notFound("That reading set");
  return { id: readingSetId };
}
