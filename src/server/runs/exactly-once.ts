import "server-only";
import type { Tx } from "@/server/db";
import { inTransaction } from "@/server/db/retry";
import { AppError, isDuplicateKey } from "@/server/errors";
import { sendAfterCommit } from "@/server/mail/outbox";

/**
 * A floor entry written once under the id the device made: an entry already stored is the answer; else
 * one transaction writes it. A twin that committed first hits the key, or its own effects (the stage
 * already done) refuse this one: either way the stored row is the answer, the same as to the first.
 */
export async function writeOnce<T>(options: {
  read: () => Promise<T | null>;
  /** Writes the entry; answers the outbox id of a notice to send once it commits, if any. */
  write: (tx: Tx) => Promise<string | null>;
  what: string;
}): Promise<T> {
  const earlier = await options.read();
  if (earlier) return earlier;
  try {
    // Retried on a deadlock: on a Galera cluster a write conflict between two nodes arrives as one.
    const mail = await inTransaction(options.write);
    if (mail) sendAfterCommit([mail]);
  } catch (error) {
    const twin = await options.read();
    if (twin) return twin;
    if (!isDuplicateKey(error)) throw error;
  }
  const stored = await options.read();
  if (!stored) throw new AppError("unavailable", `The ${options.what} could not be read back; send it again.`);
  return stored;
}
