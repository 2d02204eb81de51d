import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import { db } from "@/server/db";
import { recordLinks, recordVersions } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import { hashToken, isWellFormedToken } from "@/server/auth/tokens";
import { notFound } from "@/server/errors";
import { readStored } from "@/server/uploads/storage";
import { fromJson } from "@/server/plans/store";
import type { Actor } from "@/shared/auth/policy";
import { revokeRecordLinkSchema } from "@/shared/records/schema";
import type { RecordView } from "@/shared/records/view";
import { recordSettingsFor } from "./source";

// The customer's link: a random token (only its hash is stored) that opens the latest record of its
// job, read-only, until it expires or the shop revokes it. A bad, unknown, expired or revoked token
// all look the same: nothing.

/** `hasLogo` is the shop's logo now (the link serves the current one). */
export type PublicRecord = { record: RecordView; version: number; replaces: number | null; sentAt: string; versionId: string; hasLogo: boolean };

async function liveLink(token: unknown) {
  if (!isWellFormedToken(token)) return null;
  const [link] = await db.select().from(recordLinks).where(eq(recordLinks.tokenHash, hashToken(token))).limit(1);
  if (!link || link.revokedAt !== null || link.expiresAt.getTime() <= Date.now()) return null;
  return link;
}

async function latestVersion(shopId: string, jobId: string) {
  const [row] = await db.select().from(recordVersions)
    .where(and(eq(recordVersions.shopId, shopId), eq(recordVersions.jobId, jobId)))
    .orderBy(desc(recordVersions.version)).limit(1);
  return row ?? null;
}

/** The record a customer's link opens (its job's latest version), or null. */
export async function recordForToken(token: unknown): Promise<PublicRecord | null> {
  const link = await liveLink(token);
  if (!link) return null;
  const row = await latestVersion(link.shopId, link.jobId);
  if (!row) return null;
  const { logoStoredName } = await recordSettingsFor(link.shopId);
  return { record: fromJson<RecordView>(row.data), version: row.version, replaces: row.version > 1 ? row.version - 1 : null, sentAt: row.sentAt.toISOString(), versionId: row.id, hasLogo: logoStoredName !== null };
}

/** The shop whose record a live link opens (for its logo), or null. */
export async function shopOfRecordToken(token: unknown): Promise<string | null> {
  return (await liveLink(token))?.shopId ?? null;
}

/** The job a live link opens (for its invoice), or null. */
export async function jobOfRecordToken(token: unknown): Promise<{ shopId: string; jobId: string } | null> {
  const link = await liveLink(token);
  return link ? { shopId: link.shopId, jobId: link.jobId } : null;
}

/** The PDF of the latest version behind a customer's link, or null. */
export async function recordPdfForToken(token: unknown): Promise<{ bytes: Buffer; filename: string } | null> {
  const link = await liveLink(token);
  if (!link) return null;
  const row = await latestVersion(link.shopId, link.jobId);
  if (!row) return null;
  const record = fromJson<RecordView>(row.data);
  return { bytes: await readStored(row.shopId, row.pdfStoredName), filename: `machining-record-job-${record.job.number}-v${row.version}.pdf` };
}

/** Ends a customer's link at once (machinist or above); revoking twice is the same as once. */
export async function revokeRecordLink({ actor, input }: { actor: Actor; input: unknown }): Promise<{ linkId: string }> {
  assertCan(actor, "records.send");
  const { jobId, linkId } = revokeRecordLinkSchema.parse(input);
  const [link] = await db.select({ id: recordLinks.id }).from(recordLinks)
    .where(and(eq(recordLinks.id, linkId), eq(recordLinks.jobId, jobId), eq(recordLinks.shopId, actor.shopId))).limit(1);
  if (!link) throw notFound("That link");
  await db.update(recordLinks).set({ revokedAt: new Date(), revokedBy: actor.userId })
    .where(and(eq(recordLinks.id, linkId), eq(recordLinks.shopId, actor.shopId), isNull(recordLinks.revokedAt)));
  return { linkId };
}
