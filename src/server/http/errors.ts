import "server-only";
import { z } from "zod";
import { AppError, type FieldErrors } from "@/server/errors";

/** Field errors keyed by the dotted path of each invalid input. */
export function fieldErrorsOf(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "_form";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

export type PublicError = { status: number; body: { error: string; message: string; fieldErrors?: FieldErrors } };

/** The one place where thrown errors become what a caller may see. */
export function toPublicError(error: unknown): PublicError {
  if (error instanceof AppError) {
    return { status: error.status, body: { error: error.code, message: error.message, fieldErrors: error.fieldErrors } };
  }
  if (error instanceof z.ZodError) {
    return {
      status: 400,
      body: { error: "bad_request", message: "Some fields need attention.", fieldErrors: fieldErrorsOf(error) },
    };
  }
  console.error(error);
  return { status: 500, body: { error: "internal", message: "Something went wrong. Nothing was changed." } };
}
