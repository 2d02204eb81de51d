import "server-only";
import { fileTypeFromBuffer } from "file-type";
import { AppError } from "@/server/errors";
import type { AttachmentKind } from "@/shared/jobs/constants";
import { describeBytes } from "@/shared/bytes";
import { ATTACHMENT_EXTENSIONS, FILE_TYPES, extensionOf, isFileExtension, typesText, type FileExtension } from "@/shared/uploads/file-rules";

// Allowlist by extension AND content (OWASP File Upload Cheat Sheet, web-anchors A4). The list is
// FILE_TYPES (src/shared/uploads/file-rules.ts), the one the file pickers state; size limit UPLOAD_MAX_BYTES.
export type AllowedExtension = FileExtension;
const ACCEPTED = typesText(ATTACHMENT_EXTENSIONS);

const CONTENT_NAMES: Record<string, string> = {
  "image/png": "a PNG image",
  "image/jpeg": "a JPEG image",
  "application/pdf": "a PDF document",
  "image/svg+xml": "an SVG drawing",
  "text/csv": "CSV text",
};

const refuse = (message: string) => new AppError("bad_request", message, { fieldErrors: { file: [message] } });

/** The cleaned display name and its extension; names with folders, "..", or control characters are refused. */
export function checkFileName(raw: string): { displayName: string; ext: string } {
  const name = raw.normalize("NFC");
  if (name.length === 0) throw refuse("The file has no name.");
  if (name.length > 200) throw refuse("The file name is longer than 200 characters.");
  if (/[/\\]/.test(name) || name.includes("..")) throw refuse("The file name contains a folder path or \"..\"; rename the file and try again.");
  if (/[\u0000-\u001f\u007f]/.test(name)) throw refuse("The file name contains control characters.");
  const ext = extensionOf(name);
  const displayName = name.replace(/[^\p{L}\p{N} ._()+-]/gu, "_").slice(0, 120);
  return { displayName, ext };
}

function extensionProblem(ext: string): string | null {
  if (isFileExtension(ext)) return null;
  if (ext === "svg") return "SVG files are not accepted: they can carry scripts. Export the picture as JPEG or PNG.";
  if (ext === "") return `The file has no extension. Accepted: ${ACCEPTED}.`;
  return `.${ext.slice(0, 10)} files are not accepted. Accepted: ${ACCEPTED}.`;
}

/** CSV must be plain UTF-8 text: no NUL bytes, no binary signature, decodable. */
export function decodeText(bytes: Uint8Array): string | null {
  if (bytes.includes(0)) return null;
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return null;
  }
}

async function contentMime(bytes: Uint8Array): Promise<string | null> {
  const detected = await fileTypeFromBuffer(bytes);
  if (detected) return detected.mime;
  const text = decodeText(bytes.subarray(0, 4096));
  if (text !== null && /<svg[\s>]/i.test(text)) return "image/svg+xml";
  return null;
}

export type CheckedUpload = { ext: AllowedExtension; mime: string; kind: AttachmentKind; displayName: string };

/** Size, name, extension and magic bytes must all agree, or the upload is refused with the reason. */
export async function checkUpload(input: { name: string; bytes: Uint8Array; maxBytes: number }): Promise<CheckedUpload> {
  const { displayName, ext } = checkFileName(input.name);
  if (input.bytes.byteLength > input.maxBytes) throw refuse(`The file is larger than the ${describeBytes(input.maxBytes)} limit.`);
  if (input.bytes.byteLength === 0) throw refuse("The file is empty.");
  const extProblem = extensionProblem(ext);
  if (extProblem) throw refuse(extProblem);
  const expected = FILE_TYPES[ext as AllowedExtension];
  const actual = await contentMime(input.bytes);
  const matches = expected.mime === "text/csv" ? actual === null && decodeText(input.bytes) !== null : actual === expected.mime;
  if (!matches) {
    const what = actual ? CONTENT_NAMES[actual] ?? `a ${actual} file` : "not what the name says";
    throw refuse(`The file is named .${ext} but its content is ${what}. Nothing was saved.`);
  }
  return { ext: ext as AllowedExtension, mime: expected.mime, kind: expected.kind, displayName };
}
