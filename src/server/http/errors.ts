import "server-only";
import { z } from "zod";
import { AppError, type FieldErrors } from "@/server/errors";
import { connectionFailure, DATABASE_RETRY_AFTER_SECONDS } from "@/server/db/availability";
import { isRetryableTransactionError } from "@/server/db/retry";
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

function databaseUnavailable(error: unknown): PublicError | null {
  // Still a deadlock or lock wait after inTransaction's retries (hot rows written from two Galera
  // nodes at once): the transaction was rolled back, so the client may simply send it again.
  if (isRetryableTransactionError(error)) {
    return { status: 503, retryAfterSeconds: 1, body: { error: "busy", message: "The workshop is busy with the same records right now. Nothing was saved; try again in a moment." } };
  }
  const failure = connectionFailure(error);
  if (!failure) return null;
  const saved = failure === "never-connected"
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
