// Names of the floor domain, shared by the tables, the schemas, the device and the server.
export const RUN_BLOCKS = ["full", "dwell"] as const;
export type RunBlock = (typeof RUN_BLOCKS)[number];

/** How a block of strokes ended: at its checkpoint reading, with the stage done, or stopped for the machinist. */
export const RUN_OUTCOMES = ["checkpoint", "done", "stopped"] as const;
export type RunOutcome = (typeof RUN_OUTCOMES)[number];

/** Attachment kinds a surface-finish report may be: a PDF report, the instrument's CSV, or a photo of its screen. */
export const SURFACE_REPORT_KINDS = ["report", "gauge", "photo"] as const;

export const VERDICT_STATUSES = ["pass", "fail", "held"] as const;
export type VerdictStatus = (typeof VERDICT_STATUSES)[number];
