import "server-only";
import { AppError } from "@/server/errors";
import { describeBytes } from "@/shared/bytes";

// The largest JSON body any route takes: a plan request for a 16-cylinder job with every field filled
// is ~40 KiB; 256 KiB leaves room without letting anyone stream megabytes into a parser.
export const JSON_MAX_BYTES = 256 * 1024;
// Multipart framing and the small text fields around one file.
export const FORM_OVERHEAD_BYTES = 64 * 1024;

export { describeBytes };

function tooLarge(maxBytes: number, what: string): AppError {
  const limit = describeBytes(maxBytes);
  return new AppError("too_large", `The ${what} is larger than the ${limit} limit. Nothing was saved.`, { fieldErrors: { file: [`Larger than ${limit}.`] } });
}

/**
 * Reads a body counting bytes as they arrive (a chunked body declares no length) and stops at the
 * limit, cancelling the stream: at most `maxBytes` plus one chunk is ever held in memory.
 */
export async function readBodyBytes(request: Request, maxBytes: number, what = "request", shownLimit = maxBytes): Promise<Uint8Array> {
  const declared = request.headers.get("content-length");
  if (declared !== null && Number(declared) > maxBytes) throw tooLarge(shownLimit, what);
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(shownLimit, what);
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    out.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return out;
}

/** Parses JSON read within the byte limit; a body that is not JSON is a 400, not a 500. */
export async function readJsonValue(request: Request, maxBytes = JSON_MAX_BYTES): Promise<unknown> {
  const bytes = await readBodyBytes(request, maxBytes);
  try {
    return JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes));
  } catch {
    throw new AppError("bad_request", "The request body must be JSON.");
  }
}

/** Reads a multipart body with one `file` within the byte limit, then parses the bytes already held. */
export async function readUploadForm(request: Request, maxFileBytes: number) {
  const contentType = request.headers.get("content-type") ?? "";
  if (!contentType.toLowerCase().startsWith("multipart/form-data")) throw new AppError("bad_request", "Send the file as a multipart form.");
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxFileBytes + FORM_OVERHEAD_BYTES) throw tooLarge(maxFileBytes, "file");
  const bytes = await readBodyBytes(request, maxFileBytes + FORM_OVERHEAD_BYTES, "file", maxFileBytes);
  let form: FormData;
  try {
    form = await new Response(bytes as BodyInit, { headers: { "content-type": contentType } }).formData();
  } catch {
    throw new AppError("bad_request", "Send the file as a multipart form.");
  }
  const entry = form.get("file");
  const file = entry instanceof File ? { name: entry.name, bytes: new Uint8Array(await entry.arrayBuffer()) } : null;
  if (file && file.bytes.byteLength > maxFileBytes) throw tooLarge(maxFileBytes, "file");
  const fields: Record<string, string | undefined> = {};
  for (const [key, value] of form.entries()) if (typeof value === "string") fields[key] = value;
  return { file, fields };
}
