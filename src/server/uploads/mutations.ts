import "server-only";
import { inTransaction } from "@/server/db/retry";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { attachments } from "@/server/db/schema";
import { env } from "@/env";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey, notFound } from "@/server/errors";
import { clientIdOrNew } from "@/server/http/client-id";
import { loadCylinder, loadJob } from "@/server/jobs/access";
import { checkUpload } from "./check";
import { removeStored, reencodeImage, writeStored } from "./storage";
import { assertQuotaFor } from "./gate";
import type { AttachmentKind } from "@/shared/jobs/constants";

export type UploadFile = { name: string; bytes: Uint8Array };

/** Checks, re-encodes (images) and stores a file on a job or one of its cylinders. */
async function storedAnswer(shopId: string, jobId: string, id: string) {
  const [row] = await db.select({ id: attachments.id, kind: attachments.kind, displayName: attachments.displayName }).from(attachments)
    .where(and(eq(attachments.id, id), eq(attachments.shopId, shopId), eq(attachments.jobId, jobId)));
  return row ?? null;
}

/** `clientId` is the id the device made for this upload: a retry gets the first answer, one row, one file. */
export async function uploadAttachment({ actor, jobId, cylinderId, file, clientId }: { actor: Actor; jobId: string; cylinderId?: string | null; file: UploadFile; clientId?: string }) {
  assertCan(actor, "attachments.upload");
  const job = await loadJob({ actor, jobId });
  if (cylinderId) await loadCylinder({ job, cylinderId });
  return storeAttachment({ actor, jobId: job.id, cylinderId: cylinderId || null, file, clientId });
}

/**
 * Checks, re-encodes (images) and stores a file on a job (and cylinder) the caller has already
 * authorised and loaded within the actor's shop; `kinds` narrows what the file may be.
 */
export async function storeAttachment({ actor, jobId, cylinderId, file, clientId, kinds }: { actor: Actor; jobId: string; cylinderId: string | null; file: UploadFile; clientId?: string; kinds?: readonly AttachmentKind[] }) {
  const job = { id: jobId };
  const id = clientIdOrNew(clientId);
  const earlier = clientId ? await storedAnswer(actor.shopId, job.id, id) : null;
  if (earlier) return earlier;
  const checked = await checkUpload({ ...file, maxBytes: env.UPLOAD_MAX_BYTES });
  if (kinds && !kinds.includes(checked.kind)) throw new AppError("bad_request", "That file is not accepted here.", { fieldErrors: { file: ["That file is not accepted here."] } });
  const storedExt = checked.ext === "jpeg" ? "jpg" : checked.ext;
  const storedName = `${id}.${storedExt}`;
  let bytes: Uint8Array = file.bytes;
  let thumbnailName: string | null = null;
  if (checked.kind === "photo") {
    const image = await reencodeImage(file.bytes, checked.ext as "jpg" | "png");
    bytes = image.clean;
    thumbnailName = `${id}.thumb.webp`;
    await assertQuotaFor(actor.shopId, bytes.byteLength + image.thumbnail.byteLength);
    await writeStored(actor.shopId, thumbnailName, image.thumbnail);
  } else {
    await assertQuotaFor(actor.shopId, bytes.byteLength);
  }
  await writeStored(actor.shopId, storedName, bytes);
  try {
    // In a retried transaction: two inserts of one id at once can meet as a deadlock, not a duplicate key.
    await inTransaction((tx) => tx.insert(attachments).values({
      id, shopId: actor.shopId, jobId: job.id, cylinderId, kind: checked.kind, displayName: checked.displayName,
      storedName, thumbnailName, contentType: checked.mime, sizeBytes: bytes.byteLength, uploadedBy: actor.userId,
    }));
  } catch (error) {
    // The same upload sent twice at once: the first row (and its identical file) stands.
    if (isDuplicateKey(error)) {
      const first = await storedAnswer(actor.shopId, job.id, id);
      if (first) return first;
    }
    // No row, no file: a failed write leaves nothing behind on disk.
    await removeStored(actor.shopId, storedName);
    if (thumbnailName) await removeStored(actor.shopId, thumbnailName);
    if (isDuplicateKey(error)) throw new AppError("conflict", "That upload id is already used. Nothing was saved.");
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
