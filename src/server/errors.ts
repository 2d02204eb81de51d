import "server-only";
import type { FieldErrors } from "@/shared/action-result";
// Errors the server layer throws on purpose. Their messages are safe to show; anything else that is
// thrown becomes "Something went wrong" at the edge (src/server/http/*).
export type AppErrorCode =
  | "bad_request"
  | "unauthorized"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "too_large"
  | "rate_limited"
  | "unavailable";

const STATUS: Record<AppErrorCode, number> = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  too_large: 413,
  rate_limited: 429,
  unavailable: 503,
};

export type { FieldErrors };

export class AppError extends Error {
  readonly code: AppErrorCode;
  readonly fieldErrors?: FieldErrors;
  readonly retryAfterSeconds?: number;

  constructor(code: AppErrorCode, message: string, extra: { fieldErrors?: FieldErrors; retryAfterSeconds?: number } = {}) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.fieldErrors = extra.fieldErrors;
    this.retryAfterSeconds = extra.retryAfterSeconds;
  }

  get status(): number {
    return STATUS[this.code];
  }
}

export const notFound = (what = "That") => new AppError("not_found", `${what} was not found.`);

export function isDuplicateKey(error: unknown): boolean {
  const cause = (error as { cause?: { code?: string } } | null)?.cause;
  const code = (error as { code?: string } | null)?.code;
  return code === "ER_DUP_ENTRY" || cause?.code === "ER_DUP_ENTRY";
}
