import type { AttachmentKind } from "@/shared/jobs/constants";
import { describeBytes } from "@/shared/bytes";

// What each upload accepts, read by the server's checks and by the file picker that states them, so
// the words on screen and the refusal can never disagree. The server still sniffs the content.

/** Every file type an upload may be (ASVS V5.1.1: photos JPEG/PNG, reports PDF, gauge files CSV). */
export const FILE_TYPES = {
  jpg: { mime: "image/jpeg", kind: "photo", label: "JPEG" },
  jpeg: { mime: "image/jpeg", kind: "photo", label: "JPEG" },
  png: { mime: "image/png", kind: "photo", label: "PNG" },
  pdf: { mime: "application/pdf", kind: "report", label: "PDF" },
  csv: { mime: "text/csv", kind: "gauge", label: "CSV" },
} as const satisfies Record<string, { mime: string; kind: AttachmentKind; label: string }>;
export type FileExtension = keyof typeof FILE_TYPES;

const ALL_EXTENSIONS = Object.keys(FILE_TYPES) as FileExtension[];

/** The file types of some attachment kinds (the floor's surface report takes reports, gauge files, photos). */
export const extensionsOfKinds = (kinds: readonly AttachmentKind[]): FileExtension[] => ALL_EXTENSIONS.filter((e) => kinds.includes(FILE_TYPES[e].kind));

export const ATTACHMENT_EXTENSIONS: readonly FileExtension[] = ALL_EXTENSIONS;
export const GAUGE_CSV_EXTENSIONS: readonly FileExtension[] = ["csv"];
export const LOGO_EXTENSIONS: readonly FileExtension[] = ["png", "jpg", "jpeg"];

/** A gauge CSV for one block is a few KB; the import refuses more than this. */
export const GAUGE_CSV_MAX_BYTES = 256 * 1024;

/** What one picker accepts: its file types and the byte limit the server applies to it. */
export type FileRule = { extensions: readonly FileExtension[]; maxBytes: number };

export const isFileExtension = (ext: string): ext is FileExtension => Object.hasOwn(FILE_TYPES, ext);

/** The extension of a file name, lower case, without the dot ("" for none). */
export function extensionOf(name: string): string {
  const dot = name.lastIndexOf(".");
  return dot > 0 ? name.slice(dot + 1).toLowerCase() : "";
}

/** "JPEG, PNG, PDF or CSV": the types as people read them, each once. */
export function typesText(extensions: readonly FileExtension[]): string {
  const labels = [...new Set(extensions.map((e) => FILE_TYPES[e].label))];
  return labels.length <= 1 ? (labels[0] ?? "") : `${labels.slice(0, -1).join(", ")} or ${labels.at(-1)}`;
}

/** The input's accept attribute: extensions and their media types. */
export function acceptAttribute(extensions: readonly FileExtension[]): string {
  return [...new Set([...extensions.map((e) => `.${e}`), ...extensions.map((e) => FILE_TYPES[e].mime)])].join(",");
}

/** What is wrong with a chosen file before it is sent (its type by name, its size), or null. */
export function fileProblem(file: { name: string; size: number }, rule: FileRule): string | null {
  const ext = extensionOf(file.name);
  if (!rule.extensions.some((e) => e === ext)) return `${file.name} is not a ${typesText(rule.extensions)} file. Choose a ${typesText(rule.extensions)} file.`;
  if (file.size === 0) return `${file.name} is empty.`;
  if (file.size > rule.maxBytes) return `${file.name} is larger than the ${describeBytes(rule.maxBytes)} limit.`;
  return null;
}
