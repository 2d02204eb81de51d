import "server-only";
import { db, type Tx } from "@/server/db";

/** The MariaDB/mysql2 error code of an error or of any error in its `cause` chain. */
export function dbErrorCode(error: unknown): string | undefined {
  for (let e = error as { code?: unknown; cause?: unknown } | undefined, depth = 0; e && depth < 5; e = e.cause as typeof e, depth++) {
    if (typeof e.code === "string" && /^(ER_|E[A-Z]+$|PROTOCOL_)/.test(e.code)) return e.code;
  }
  return undefined;
}

// InnoDB rolls back the whole transaction on a deadlock and the statement on a lock-wait timeout;
// both are safe to run again from the start (MariaDB KB "Deadlocks", common practice).
const RETRYABLE = new Set(["ER_LOCK_DEADLOCK", "ER_LOCK_WAIT_TIMEOUT"]);
export const TRANSACTION_ATTEMPTS = 4;

export function isRetryableTransactionError(error: unknown): boolean {
  const code = dbErrorCode(error);
  return code !== undefined && RETRYABLE.has(code);
}

/** Full jitter over a doubling window (25, 50, 100 ms ...), so two retried callers do not meet again. */
export function retryDelayMs(attempt: number, random = Math.random): number {
  return Math.floor(random() * 25 * 2 ** attempt);
}

/** One transaction, run again (bounded, with jitter) when InnoDB chose it as a deadlock victim or a lock wait timed out. */
export async function inTransaction<T>(work: (tx: Tx) => Promise<T>, { attempts = TRANSACTION_ATTEMPTS, onRetry }: { attempts?: number; onRetry?: (attempt: number, code: string) => void } = {}): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await db.transaction(work);
    } catch (error) {
      if (attempt >= attempts || !isRetryableTransactionError(error)) throw error;
      onRetry?.(attempt, dbErrorCode(error)!);
      await new Promise((resolve) => setTimeout(resolve, retryDelayMs(attempt)));
    }
  }
}
