import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { newId } from "@/server/db/ids";
import { attachments } from "@/server/db/schema";
import { env } from "@/env";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { notFound } from "@/server/errors";
import { loadCylinder, loadJob } from "@/server/jobs/access";
import { checkUpload } from "./check";
import { removeStored, reencodeImage, writeStored } from "./storage";

export type UploadFile = { name: string; bytes: Uint8Array };

/** Checks, re-encodes (images) and stores a file on a job or one of its cylinders. */
export async function uploadAttachment({ actor, jobId, cylinderId, file }: { actor: Actor; jobId: string; cylinderId?: string | null; file: UploadFile }) {
  assertCan(actor, "attachments.upload");
  const job = await loadJob({ actor, jobId });
  if (cylinderId) await loadCylinder({ job, cylinderId });
  const checked = await checkUpload({ ...file, maxBytes: env.UPLOAD_MAX_BYTES });
  const id = newId();
  const storedExt = checked.ext === "jpeg" ? "jpg" : checked.ext;
  const storedName = `${id}.${storedExt}`;
  let bytes: Uint8Array = file.bytes;
  let thumbnailName: string | null = null;
  if (checked.kind === "photo") {
    const image = await reencodeImage(file.bytes, checked.ext as "jpg" | "png");
    bytes = image.clean;
    thumbnailName = `${id}.thumb.webp`;
    await writeStored(actor.shopId, thumbnailName, image.thumbnail);
  }
  await writeStored(actor.shopId, storedName, bytes);
  try {
    await db.insert(attachments).values({
      id, shopId: actor.shopId, jobId: job.id, cylinderId: cylinderId || null, kind: checked.kind, displayName: checked.displayName,
      storedName, thumbnailName, contentType: checked.mime, sizeBytes: bytes.byteLength, uploadedBy: actor.userId,
    });
  } catch (error) {
    // No row, no file: a failed write leaves nothing behind on disk.
    await removeStored(actor.shopId, storedName);
    if (thumbnailName) await removeStored(actor.shopId, thumbnailName);
    throw error;
  }
  return { id, kind: checked.kind, displayName: checked.displayName };
}

export async function deleteAttachment({ actor, jobId, attachmentId }: { actor: Actor; jobId: string; attachmentId: string }) {
  assertCan(actor, "attachments.upload");
  const job = await loadJob({ actor, jobId });
  const [row] = await db.select().from(attachments).where(and(eq(attachments.id, attachmentId), eq(attachments.jobId, job.id), eq(attachments.shopId, actor.shopId)));
  if (!row) throw notFound("That attachment");
  await db.delete(attachments).where(eq(attachments.id, row.id));
  await removeStored(actor.shopId, row.storedName);
  if (row.thumbnailName) await removeStored(actor.shopId, row.thumbnailName);
  return { id: row.id };
}
