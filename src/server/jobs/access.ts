import "server-only";
import { and, eq } from "drizzle-orm";
import { db, type Db, type Tx } from "@/server/db";
import { cylinders, jobs, memberships, type Cylinder, type Job } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import { can, type Actor } from "@/shared/auth/policy";
import { AppError, notFound } from "@/server/errors";
import { FLOOR_READING_KINDS, type ReadingKind } from "@/shared/jobs/constants";

/** A job of the actor's shop; another shop's job is answered exactly like a missing one. */
export async function loadJob({ actor, jobId, tx = db, forUpdate = false }: { actor: Actor; jobId: string; tx?: Db | Tx; forUpdate?: boolean }): Promise<Job> {
  assertCan(actor, "jobs.view");
  const query = tx.select().from(jobs).where(and(eq(jobs.id, jobId), eq(jobs.shopId, actor.shopId))).limit(1);
  const [job] = forUpdate ? await query.for("update") : await query;
  if (!job) throw notFound("That job");
  return job;
}

export async function loadCylinder({ job, cylinderId, tx = db }: { job: Job; cylinderId: string; tx?: Db | Tx }): Promise<Cylinder> {
  const [cylinder] = await tx
    .select()
    .from(cylinders)
    .where(and(eq(cylinders.id, cylinderId), eq(cylinders.jobId, job.id), eq(cylinders.shopId, job.shopId)))
    .limit(1);
  if (!cylinder) throw notFound("That cylinder");
  return cylinder;
}

/** Whether the actor may write a reading set of this kind on this cylinder (DESIGN.md §2). */
export function mayEnterReadings(actor: Actor, job: Job, cylinder: Pick<Cylinder, "assignedUserId"> | null, kind: ReadingKind): boolean {
  if (can(actor, "readings.edit")) return true;
  if (!can(actor, "readings.enterOnFloor") || !FLOOR_READING_KINDS.includes(kind)) return false;
  return job.assignedUserId === actor.userId || cylinder?.assignedUserId === actor.userId;
}

export function assertMayEnterReadings(actor: Actor, job: Job, cylinder: Pick<Cylinder, "assignedUserId">, kind: ReadingKind): void {
  if (mayEnterReadings(actor, job, cylinder, kind)) return;
  const floorKind = FLOOR_READING_KINDS.includes(kind);
  throw new AppError(
    "forbidden",
    can(actor, "readings.enterOnFloor") && floorKind
      ? "This cylinder is not assigned to you, so you cannot enter its readings."
      : "Your role may enter only checkpoint and final readings on work assigned to you.",
  );
}

/** A user id may be assigned only if that user is a member of the same shop. */
export async function assertMember({ shopId, userId, tx = db }: { shopId: string; userId: string; tx?: Db | Tx }): Promise<void> {
  const [row] = await tx
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.shopId, shopId), eq(memberships.userId, userId)))
    .limit(1);
  if (!row) throw new AppError("bad_request", "Pick a member of this shop.", { fieldErrors: { assignedUserId: ["Pick a member of this shop."] } });
}
