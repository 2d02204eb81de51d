import "server-only";
import pino, { type DestinationStream, type Logger } from "pino";
import { env } from "@/env";
import { dbErrorCode } from "@/server/db/error-code";

// Log policy (README "Security"): structured JSON lines with an event name, error codes and short
// messages only. Never a query's text or parameters (a reset link, an argon2 hash, a customer's
// address), never a token, cookie or request body. Database errors are reduced to their codes: the
// driver's message can quote values ("Duplicate entry '…'") and drizzle's quotes every parameter.

type ErrorFields = { kind: string; code?: string; errno?: number; sqlState?: string; message?: string };

/** What may be logged of an error: codes for database errors, a first-line message for the rest. */
export function safeErrorFields(error: unknown): ErrorFields {
  const code = dbErrorCode(error);
  if (code) {
    let e = error as { errno?: unknown; sqlState?: unknown; cause?: unknown } | undefined;
    for (let depth = 0; e && depth < 5 && typeof e.errno !== "number"; depth++) e = e.cause as typeof e;
    return { kind: "database", code, ...(typeof e?.errno === "number" && { errno: e.errno }), ...(typeof e?.sqlState === "string" && { sqlState: e.sqlState }) };
  }
  const e = error as { name?: unknown; message?: unknown } | null;
  const first = String(e?.message ?? error).split("\n")[0] ?? "";
  // A message that quotes a query is cut at the quote.
  const message = first.replace(/(Failed query|params):.*$/i, "$1: [omitted]").replace(/[0-9a-f]{32,}/gi, "[hex omitted]").slice(0, 200);
  return { kind: typeof e?.name === "string" ? e.name : typeof error, message };
}

export function createLogger(destination?: DestinationStream): Logger {
  return pino({ level: env.NODE_ENV === "test" && !destination ? "silent" : env.LOG_LEVEL, base: { app: "borewise" } }, destination);
}

export const log = createLogger();

/** Logs a failure under an event name with only the safe fields of the error. */
export function logError(event: string, error: unknown, logger: Logger = log): void {
  logger.error({ event, err: safeErrorFields(error) }, event);
}
