// Names of the floor domain, shared by the tables, the schemas, the device and the server.
export const RUN_BLOCKS = ["full", "dwell"] as const;
export type RunBlock = (typeof RUN_BLOCKS)[number];

/** How a block of strokes ended: at its checkpoint reading, with the stage done, or stopped for the machinist. */
export const RUN_OUTCOMES = ["checkpoint", "done", "stopped"] as const;
export type RunOutcome = (typeof RUN_OUTCOMES)[number];

export const VERDICT_STATUSES = ["pass", "fail", "held"] as const;
export type VerdictStatus = (typeof VERDICT_STATUSES)[number];
