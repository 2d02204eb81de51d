import "server-only";
import { db, type Tx } from "@/server/db";
import { dbErrorCode } from "./error-code";
import { log } from "@/server/log";

export { dbErrorCode };

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
      const code = dbErrorCode(error)!;
      // Counted by `npm run test:cluster`: on Galera a write conflict between nodes arrives as ER_LOCK_DEADLOCK.
      log.warn({ event: "transaction.retried", code, attempt }, "transaction.retried");
      onRetry?.(attempt, code);
      await new Promise((resolve) => setTimeout(resolve, retryDelayMs(attempt)));
    }
  }
}
