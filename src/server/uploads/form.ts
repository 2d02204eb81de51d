import "server-only";
import { AppError } from "@/server/errors";

const FORM_OVERHEAD_BYTES = 64 * 1024;

/** Reads a multipart body with one file, refusing a declared size over the limit before reading it. */
export async function readUploadForm(request: Request, maxFileBytes: number) {
  const declared = Number(request.headers.get("content-length") ?? "0");
  const limitMb = Math.max(1, Math.floor(maxFileBytes / (1024 * 1024)));
  const tooLarge = maxFileBytes >= 1024 * 1024 ? `${limitMb} MB` : `${Math.floor(maxFileBytes / 1024)} KB`;
  if (declared > maxFileBytes + FORM_OVERHEAD_BYTES) {
    throw new AppError("bad_request", `The file is larger than the ${tooLarge} limit.`, { fieldErrors: { file: [`Larger than ${tooLarge}.`] } });
  }
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw new AppError("bad_request", "Send the file as a multipart form.");
  }
  const entry = form.get("file");
  const file = entry instanceof File ? { name: entry.name, bytes: new Uint8Array(await entry.arrayBuffer()) } : null;
  const fields: Record<string, string | undefined> = {};
  for (const [key, value] of form.entries()) if (typeof value === "string") fields[key] = value;
  return { file, fields };
}
