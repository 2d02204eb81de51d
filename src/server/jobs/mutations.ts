import "server-only";
import { inTransaction } from "@/server/db/retry";
import { and, eq, gt, inArray, sql } from "drizzle-orm";
import { db, type Db, type Tx } from "@/server/db";
import { clientIdOrNew } from "@/server/http/client-id";
import { lockPlanningVersion } from "@/server/plans/planning-version";
import { newId } from "@/server/db/ids";
import { customers, cylinders, jobNumberSequences, jobs, pistons, readingSets } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey } from "@/server/errors";
import { createCustomer } from "@/server/customers/mutations";
import { assertMember, loadCylinder, loadJob } from "./access";
import { jobSchema, jobStatusSchema, type JobInput } from "@/shared/jobs/schema";

/** The next number of the shop's own job sequence; the row lock serialises concurrent creators. */
async function nextJobNumber(tx: Tx, shopId: string): Promise<number> {
  await tx
    .insert(jobNumberSequences)
    .values({ shopId, lastNumber: 1 })
    .onDuplicateKeyUpdate({ set: { lastNumber: sql`${jobNumberSequences.lastNumber} + 1` } });
  const [row] = await tx.select({ n: jobNumberSequences.lastNumber }).from(jobNumberSequences).where(eq(jobNumberSequences.shopId, shopId));
  return row!.n;
}

async function resolveCustomer(tx: Tx, actor: Actor, input: JobInput): Promise<string | null> {
  if (input.customerId) {
    const [row] = await tx
      .select({ id: customers.id })
      .from(customers)
      .where(and(eq(customers.id, input.customerId), eq(customers.shopId, actor.shopId)))
      .limit(1);
    if (!row) throw new AppError("bad_request", "Pick a customer of this shop.", { fieldErrors: { customerId: ["Pick a customer of this shop."] } });
    return row.id;
  }
  if (input.customerName) return (await createCustomer({ actor, input: { name: input.customerName }, tx })).id;
  return null;
}

function jobColumns(input: JobInput) {
  return {
    engineDescription: input.engineDescription,
    boreMaterial: input.boreMaterial,
    cylinderCount: input.cylinderCount,
    standardBoreUm: input.standardBoreUm,
    boreLengthUm: input.boreLengthUm,
    bottomClearanceUm: input.bottomClearanceUm ?? null,
    wallThicknessUm: input.wallThicknessUm ?? null,
    minWallUm: input.minWallUm ?? null,
    torquePlate: input.torquePlate,
    dueDate: input.dueDate ?? null,
    notes: input.notes || null,
    assignedUserId: input.assignedUserId || null,
  };
}

/**
 * Books a block in: the job with its own number and cylinders 1..n, in one transaction. `input.clientId`
 * (the device's id for the job) makes a retried submission answer with the first job, never a second.
 */
export async function createJob({ actor, input, tx: outer }: { actor: Actor; input: unknown; tx?: Tx }): Promise<{ id: string; number: number }> {
  assertCan(actor, "jobs.create");
  const parsed = jobSchema.parse(input);
  const id = clientIdOrNew((input as { clientId?: unknown } | null)?.clientId);
  const earlier = async (runner: Db | Tx) => {
    const [row] = await runner.select({ id: jobs.id, number: jobs.number }).from(jobs).where(and(eq(jobs.id, id), eq(jobs.shopId, actor.shopId)));
    return row ?? null;
  };
  const work = async (tx: Tx) => {
    await lockPlanningVersion(tx, actor.shopId);
    const first = await earlier(tx);
    if (first) return first;
    if (parsed.assignedUserId) await assertMember({ shopId: actor.shopId, userId: parsed.assignedUserId, tx });
    const customerId = await resolveCustomer(tx, actor, parsed);
    const number = await nextJobNumber(tx, actor.shopId);
    await tx.insert(jobs).values({ id, shopId: actor.shopId, number, customerId, createdBy: actor.userId, ...jobColumns(parsed) });
    await tx.insert(cylinders).values(
      Array.from({ length: parsed.cylinderCount }, (_, i) => ({ id: newId(), shopId: actor.shopId, jobId: id, number: i + 1 })),
    );
    return { id, number };
  };
  if (outer) return work(outer);
  try {
    return await inTransaction(work);
  } catch (error) {
    if (!isDuplicateKey(error)) throw error;
    // The same submission twice at once: the first one's job is the answer.
    const first = await earlier(db);
    if (first) return first;
    throw new AppError("conflict", "That job id is already used. Reload the page and try again.");
  }
}

/** Adds cylinders when the count grows; refuses to drop cylinders that already hold readings or pistons. */
async function resizeCylinders(tx: Tx, actor: Actor, jobId: string, from: number, to: number): Promise<void> {
  if (to > from) {
    await tx.insert(cylinders).values(Array.from({ length: to - from }, (_, i) => ({ id: newId(), shopId: actor.shopId, jobId, number: from + i + 1 })));
    return;
  }
  const dropped = await tx.select({ id: cylinders.id }).from(cylinders).where(and(eq(cylinders.jobId, jobId), gt(cylinders.number, to)));
  const ids = dropped.map((c) => c.id);
  if (ids.length === 0) return;
  const [usedBySet] = await tx.select({ id: readingSets.id }).from(readingSets).where(inArray(readingSets.cylinderId, ids)).limit(1);
  const [usedByPiston] = await tx.select({ id: pistons.id }).from(pistons).where(inArray(pistons.cylinderId, ids)).limit(1);
  if (usedBySet || usedByPiston) {
    throw new AppError("conflict", `Cylinders above ${to} already have readings or pistons; remove those first.`, {
      fieldErrors: { cylinderCount: ["Those cylinders already have readings or pistons."] },
    });
  }
  await tx.delete(cylinders).where(inArray(cylinders.id, ids));
}

export async function updateJob({ actor, jobId, input }: { actor: Actor; jobId: string; input: unknown }) {
  assertCan(actor, "jobs.edit");
  const parsed = jobSchema.parse(input);
  await inTransaction(async (tx) => {
    const job = await loadJob({ actor, jobId, tx, forUpdate: true });
    if (parsed.assignedUserId) await assertMember({ shopId: actor.shopId, userId: parsed.assignedUserId, tx });
    const customerId = await resolveCustomer(tx, actor, parsed);
    if (parsed.cylinderCount !== job.cylinderCount) await resizeCylinders(tx, actor, job.id, job.cylinderCount, parsed.cylinderCount);
    await tx
      .update(jobs)
      .set({ ...jobColumns(parsed), customerId, updatedAt: sql`CURRENT_TIMESTAMP(3)` })
      .where(and(eq(jobs.id, job.id), eq(jobs.shopId, actor.shopId)));
  });
  return { id: jobId };
}

/** Sets the status by hand (a machinist or above); the work moves it too (see readings). */
export async function setJobStatus({ actor, jobId, input }: { actor: Actor; jobId: string; input: unknown }) {
  assertCan(actor, "jobs.setStatus");
  const { status } = jobStatusSchema.parse(input);
  const job = await loadJob({ actor, jobId });
  await db.update(jobs).set({ status, updatedAt: sql`CURRENT_TIMESTAMP(3)` }).where(and(eq(jobs.id, job.id), eq(jobs.shopId, actor.shopId)));
  return { id: jobId, status };
}

export async function setJobArchived({ actor, jobId, archived }: { actor: Actor; jobId: string; archived: boolean }) {
  assertCan(actor, "jobs.edit");
  const job = await loadJob({ actor, jobId });
  await db.update(jobs).set({ archivedAt: archived ? new Date() : null }).where(and(eq(jobs.id, job.id), eq(jobs.shopId, actor.shopId)));
  return { id: jobId, archived };
}

/** Assigns a cylinder to a member (e.g. the apprentice who will hone it), or clears it. */
export async function assignCylinder({ actor, jobId, cylinderId, userId }: { actor: Actor; jobId: string; cylinderId: string; userId: string | null }) {
  assertCan(actor, "jobs.edit");
  return inTransaction(async (tx) => {
    // The planning counter first, like every write to planning tables: one lock order, no deadlock with a CSV import.
    await lockPlanningVersion(tx, actor.shopId);
    const job = await loadJob({ actor, jobId, tx });
    const cylinder = await loadCylinder({ job, cylinderId, tx });
    if (userId) await assertMember({ shopId: actor.shopId, userId, tx });
    await tx.update(cylinders).set({ assignedUserId: userId }).where(eq(cylinders.id, cylinder.id));
    return { id: cylinder.id, assignedUserId: userId };
  });
}
