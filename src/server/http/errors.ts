import "server-only";
import { z } from "zod";
import { AppError, type FieldErrors } from "@/server/errors";
import { dbErrorCode } from "@/server/db/retry";
import { logError } from "@/server/log";

/** Field errors keyed by the dotted path of each invalid input. */
export function fieldErrorsOf(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "_form";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

export type PublicError = { status: number; retryAfterSeconds?: number; body: { error: string; message: string; fieldErrors?: FieldErrors } };

// No connection was ever made: the statement never reached the server, so nothing was written.
const NEVER_CONNECTED = new Set(["ECONNREFUSED", "ENOTFOUND", "EHOSTUNREACH", "ER_CON_COUNT_ERROR", "ER_ACCESS_DENIED_ERROR"]);
// The connection went away mid-way: a COMMIT may have landed before the answer was lost.
const LOST_MIDWAY = new Set(["PROTOCOL_CONNECTION_LOST", "ECONNRESET", "EPIPE", "ETIMEDOUT", "PROTOCOL_SEQUENCE_TIMEOUT", "ER_SERVER_SHUTDOWN", "ER_CONNECTION_KILLED"]);
export const DATABASE_RETRY_AFTER_SECONDS = 5;

function databaseUnavailable(error: unknown): PublicError | null {
  const code = dbErrorCode(error);
  const queueFull = (error as Error | null)?.message === "Queue limit reached.";
  if (!queueFull && (!code || (!NEVER_CONNECTED.has(code) && !LOST_MIDWAY.has(code)))) return null;
  const saved = queueFull || NEVER_CONNECTED.has(code!)
    ? "Nothing was saved; try again in a few seconds."
    : "Your change may or may not have been saved: reload the page to check before you send it again.";
  return { status: 503, retryAfterSeconds: DATABASE_RETRY_AFTER_SECONDS, body: { error: "unavailable", message: `The database cannot be reached right now. ${saved}` } };
}

/** The one place where thrown errors become what a caller may see. */
export function toPublicError(error: unknown): PublicError {
  if (error instanceof AppError) {
    return { status: error.status, retryAfterSeconds: error.retryAfterSeconds, body: { error: error.code, message: error.message, fieldErrors: error.fieldErrors } };
  }
  if (error instanceof z.ZodError) {
    return {
      status: 400,
      body: { error: "bad_request", message: "Some fields need attention.", fieldErrors: fieldErrorsOf(error) },
    };
  }
  const unavailable = databaseUnavailable(error);
  logError(unavailable ? "request.database_unavailable" : "request.failed", error);
  if (unavailable) return unavailable;
  return { status: 500, body: { error: "internal", message: "Something went wrong. Nothing was changed." } };
}
