import "server-only";
import { and, eq } from "drizzle-orm";
import { db, type Db, type Tx } from "@/server/db";
import { assertRoomFor, MAX_CHILDREN } from "@/server/db/bounds";
import { inTransaction } from "@/server/db/retry";
import { clientIdOrNew } from "@/server/http/client-id";
import { pistons, type Job } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey, notFound } from "@/server/errors";
import { loadCylinder, loadJob } from "@/server/jobs/access";
import { pistonSchema, type PistonInput } from "@/shared/pistons/schema";

async function checkedValues(job: Job, input: PistonInput, tx: Db | Tx = db) {
  if (input.cylinderId) await loadCylinder({ job, cylinderId: input.cylinderId, tx });
  return {
    cylinderId: input.cylinderId || null,
    label: input.label,
    diameterUm: input.diameterUm,
    sizingHeightUm: input.sizingHeightUm,
    type: input.type,
    clearanceMinUm: input.clearanceMinUm,
    clearanceMaxUm: input.clearanceMaxUm,
    notes: input.notes || null,
  };
}

/** Records a measured piston on a cylinder, or loose in the job's set to match later. */
/** `input.clientId`, the device's id for this piston, makes a retried create answer once with one row. */
export async function createPiston({ actor, jobId, input }: { actor: Actor; jobId: string; input: unknown }) {
  assertCan(actor, "pistons.edit");
  const parsed = pistonSchema.parse(input);
  const id = clientIdOrNew((input as { clientId?: unknown } | null)?.clientId);
  try {
    return await inTransaction(async (tx) => {
      // The job row lock orders concurrent creates, so the count below cannot be passed by two at once.
      const job = await loadJob({ actor, jobId, tx, forUpdate: true });
      const [earlier] = await tx.select({ id: pistons.id }).from(pistons).where(and(eq(pistons.id, id), eq(pistons.shopId, actor.shopId), eq(pistons.jobId, job.id)));
      if (earlier) return { id };
      await assertRoomFor({ tx, table: pistons, where: eq(pistons.jobId, job.id), max: MAX_CHILDREN.pistonsPerJob, what: "pistons per job" });
      await tx.insert(pistons).values({ id, shopId: actor.shopId, jobId: job.id, ...(await checkedValues(job, parsed, tx)) });
      return { id };
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw new AppError("conflict", "That piston id is already used. Nothing was saved.");
    throw error;
  }
}

export async function updatePiston({ actor, jobId, pistonId, input }: { actor: Actor; jobId: string; pistonId: string; input: unknown }) {
  assertCan(actor, "pistons.edit");
  const parsed = pistonSchema.parse(input);
  const job = await loadJob({ actor, jobId });
  const values = await checkedValues(job, parsed);
  const [result] = await db.update(pistons).set(values).where(and(eq(pistons.id, pistonId), eq(pistons.jobId, job.id), eq(pistons.shopId, actor.shopId)));
  if (result.affectedRows === 0) throw notFound("That piston");
  return { id: pistonId };
}

export async function deletePiston({ actor, jobId, pistonId }: { actor: Actor; jobId: string; pistonId: string }) {
  assertCan(actor, "pistons.edit");
  const job = await loadJob({ actor, jobId });
  const [result] = await db.delete(pistons).where(and(eq(pistons.id, pistonId), eq(pistons.jobId, job.id), eq(pistons.shopId, actor.shopId)));
  if (result.affectedRows === 0) throw notFound("That piston");
  return { id: pistonId };
}
