import "server-only";
import { env } from "@/env";
import { logError } from "@/server/log";
import { drainDueMail } from "./outbox";

export const OUTBOX_POLL_MS = env.OUTBOX_POLL_MS;

const state = globalThis as unknown as { borewiseOutboxTimer?: ReturnType<typeof setInterval> };

/** Starts the retry loop once per process; a tick that is still running is not overlapped. */
export function startOutboxWorker(): void {
  if (state.borewiseOutboxTimer) return;
  let busy = false;
  state.borewiseOutboxTimer = setInterval(() => {
    if (busy) return;
    busy = true;
    drainDueMail()
      .catch((error) => logError("mail.outbox_retry_failed", error))
      .finally(() => {
        busy = false;
      });
  }, OUTBOX_POLL_MS);
  state.borewiseOutboxTimer.unref?.();
}
