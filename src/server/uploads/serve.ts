import "server-only";
import type { Actor } from "@/shared/auth/policy";
import { notFound } from "@/server/errors";
import { loadAttachment } from "./queries";
import { readStored } from "./storage";

const EXT_OF: Record<string, string> = { "image/jpeg": "jpg", "image/png": "png", "application/pdf": "pdf", "text/csv": "csv" };

/**
 * Serves a stored file to a member of its shop. The name in Content-Disposition is fixed by the server,
 * the type comes from the allowlist, and the response may not be sniffed or run scripts.
 */
export async function serveAttachment({ actor, attachmentId, thumbnail }: { actor: Actor; attachmentId: string; thumbnail: boolean }): Promise<Response> {
  const row = await loadAttachment({ actor, attachmentId });
  if (thumbnail && !row.thumbnailName) throw notFound("That thumbnail");
  const bytes = await readStored(row.shopId, thumbnail ? row.thumbnailName! : row.storedName);
  const contentType = thumbnail ? "image/webp" : EXT_OF[row.contentType] ? row.contentType : "application/octet-stream";
  const ext = thumbnail ? "webp" : EXT_OF[row.contentType] ?? "bin";
  const disposition = row.kind === "photo" ? "inline" : "attachment";
  return new Response(new Uint8Array(bytes), {
    headers: {
      "content-type": contentType === "text/csv" ? "text/csv; charset=utf-8" : contentType,
      "content-disposition": `${disposition}; filename="${row.kind}-${row.id.slice(0, 8)}${thumbnail ? "-thumb" : ""}.${ext}"`,
      "content-length": String(bytes.byteLength),
      "x-content-type-options": "nosniff",
      "content-security-policy": "default-src 'none'; sandbox",
      "cache-control": "private, max-age=300",
    },
  });
}
