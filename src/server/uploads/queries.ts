import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { attachments, users } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { notFound } from "@/server/errors";

/** A job's attachments, newest first; only what the list shows, never the stored file names. */
export async function listAttachments({ shopId, jobId }: { shopId: string; jobId: string }) {
  const rows = await db
    .select({
      id: attachments.id, cylinderId: attachments.cylinderId, kind: attachments.kind, displayName: attachments.displayName,
      contentType: attachments.contentType, sizeBytes: attachments.sizeBytes, thumbnailName: attachments.thumbnailName,
      createdAt: attachments.createdAt, uploadedByName: users.name,
    })
    .from(attachments)
    .leftJoin(users, eq(users.id, attachments.uploadedBy))
    .where(and(eq(attachments.jobId, jobId), eq(attachments.shopId, shopId)))
    .orderBy(desc(attachments.createdAt));
  return rows.map(({ thumbnailName, createdAt, ...r }) => ({ ...r, hasThumbnail: thumbnailName !== null, createdAt: createdAt.toISOString() }));
}
export type AttachmentView = Awaited<ReturnType<typeof listAttachments>>[number];

/** The stored attachment row for serving; another shop's attachment is "not found". */
export async function loadAttachment({ actor, attachmentId }: { actor: Actor; attachmentId: string }) {
  assertCan(actor, "attachments.view");
  const [row] = await db.select().from(attachments).where(and(eq(attachments.id, attachmentId), eq(attachments.shopId, actor.shopId))).limit(1);
  if (!row) throw notFound("That attachment");
  return row;
}
