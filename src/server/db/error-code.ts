import "server-only";

/** The MariaDB/mysql2 error code of an error or of any error in its `cause` chain. */
export function dbErrorCode(error: unknown): string | undefined {
  for (let e = error as { code?: unknown; cause?: unknown } | undefined, depth = 0; e && depth < 5; e = e.cause as typeof e, depth++) {
    if (typeof e.code === "string" && /^(ER_|E[A-Z]+$|PROTOCOL_)/.test(e.code)) return e.code;
  }
  return undefined;
}
