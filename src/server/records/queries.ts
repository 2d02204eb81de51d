import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { jobs, recordLinks, recordVersions, users } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import { notFound } from "@/server/errors";
import { readStored } from "@/server/uploads/storage";
import type { Actor } from "@/shared/auth/policy";
import type { UnitSystem } from "@/shared/units";
import { buildRecordView, type RecordView } from "@/shared/records/view";
import { loadRecordSource } from "./source";

/** The record of a job that passed final inspection, as it would be sent now, in the given units. */
export async function getRecordView({ actor, jobId, unitSystem }: { actor: Actor; jobId: string; unitSystem: UnitSystem }): Promise<RecordView> {
  return buildRecordView(await loadRecordSource({ actor, jobId }), unitSystem);
}

export type LinkState = "active" | "expired" | "revoked";
export type RecordVersionItem = {
  id: string; version: number; unitSystem: UnitSystem; sentTo: string; sentAt: string; sentByName: string; pdfBytes: number;
  links: { id: string; state: LinkState; expiresAt: string; revokedAt: string | null }[];
};

/** Every record sent for a job, newest first, with the state of each customer link. */
export async function listRecordVersions({ actor, jobId }: { actor: Actor; jobId: string }): Promise<RecordVersionItem[]> {
  assertCan(actor, "jobs.view");
  const [job] = await db.select({ id: jobs.id }).from(jobs).where(and(eq(jobs.id, jobId), eq(jobs.shopId, actor.shopId))).limit(1);
  if (!job) throw notFound("That job");
  const versions = await db
    .select({ id: recordVersions.id, version: recordVersions.version, unitSystem: recordVersions.unitSystem, sentTo: recordVersions.sentTo, sentAt: recordVersions.sentAt, sentByName: users.name, pdfBytes: recordVersions.pdfBytes })
    .from(recordVersions).leftJoin(users, eq(users.id, recordVersions.sentBy))
    .where(and(eq(recordVersions.jobId, jobId), eq(recordVersions.shopId, actor.shopId)))
    .orderBy(desc(recordVersions.version));
  const links = await db.select({ id: recordLinks.id, versionId: recordLinks.versionId, expiresAt: recordLinks.expiresAt, revokedAt: recordLinks.revokedAt })
    .from(recordLinks).where(and(eq(recordLinks.jobId, jobId), eq(recordLinks.shopId, actor.shopId)));
  const now = Date.now();
  return versions.map((v) => ({
    ...v, sentAt: v.sentAt.toISOString(), sentByName: v.sentByName ?? "a former member",
    links: links.filter((l) => l.versionId === v.id).map((l) => ({
      id: l.id, expiresAt: l.expiresAt.toISOString(), revokedAt: l.revokedAt?.toISOString() ?? null,
      state: l.revokedAt ? ("revoked" as const) : l.expiresAt.getTime() <= now ? ("expired" as const) : ("active" as const),
    })),
  }));
}

/** The PDF of one sent version, exactly as it went out. */
export async function getVersionPdf({ actor, jobId, versionId }: { actor: Actor; jobId: string; versionId: string }): Promise<{ bytes: Buffer; filename: string }> {
  assertCan(actor, "jobs.view");
  const [row] = await db.select({ version: recordVersions.version, pdfStoredName: recordVersions.pdfStoredName, number: jobs.number })
    .from(recordVersions).innerJoin(jobs, eq(jobs.id, recordVersions.jobId))
    .where(and(eq(recordVersions.id, versionId), eq(recordVersions.jobId, jobId), eq(recordVersions.shopId, actor.shopId))).limit(1);
  if (!row) throw notFound("That record");
  return { bytes: await readStored(actor.shopId, row.pdfStoredName), filename: `machining-record-job-${row.number}-v${row.version}.pdf` };
}
