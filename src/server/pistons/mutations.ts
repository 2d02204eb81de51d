import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { newId } from "@/server/db/ids";
import { pistons, type Job } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { notFound } from "@/server/errors";
import { loadCylinder, loadJob } from "@/server/jobs/access";
import { pistonSchema, type PistonInput } from "@/shared/pistons/schema";

async function checkedValues(job: Job, input: PistonInput) {
  if (input.cylinderId) await loadCylinder({ job, cylinderId: input.cylinderId });
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
export async function createPiston({ actor, jobId, input }: { actor: Actor; jobId: string; input: unknown }) {
  assertCan(actor, "pistons.edit");
  const parsed = pistonSchema.parse(input);
  const job = await loadJob({ actor, jobId });
  const id = newId();
  await db.insert(pistons).values({ id, shopId: actor.shopId, jobId: job.id, ...(await checkedValues(job, parsed)) });
  return { id };
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
