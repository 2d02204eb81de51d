// Enumerations of the jobs domain, shared by the tables, the zod schemas and the client.
export const JOB_STATUSES = ["received", "measured", "planned", "in_work", "inspected", "delivered"] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

export const JOB_STATUS_LABELS: Record<JobStatus, string> = {
  received: "received",
  measured: "measured",
  planned: "planned",
  in_work: "in work",
  inspected: "inspected",
  delivered: "delivered",
};

export const READING_KINDS = ["as_received", "after_boring", "checkpoint", "final"] as const;
export type ReadingKind = (typeof READING_KINDS)[number];

export const READING_KIND_LABELS: Record<ReadingKind, string> = {
  as_received: "As received",
  after_boring: "After boring",
  checkpoint: "Checkpoint",
  final: "Final",
};

/** The reading sets an apprentice may enter on work assigned to them (DESIGN.md §2). */
export const FLOOR_READING_KINDS: readonly ReadingKind[] = ["checkpoint", "final"];

export const PISTON_TYPES = ["cast", "hypereutectic", "forged", "coated_skirt"] as const;
export type PistonType = (typeof PISTON_TYPES)[number];

export const PISTON_TYPE_LABELS: Record<PistonType, string> = {
  cast: "Cast",
  hypereutectic: "Hypereutectic",
  forged: "Forged",
  coated_skirt: "Coated skirt",
};

export const ATTACHMENT_KINDS = ["photo", "report", "gauge"] as const;
export type AttachmentKind = (typeof ATTACHMENT_KINDS)[number];

export const DIRECTIONS = ["A", "B"] as const;
export type Direction = (typeof DIRECTIONS)[number];
