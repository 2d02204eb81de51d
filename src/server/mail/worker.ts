import "server-only";
import { env } from "@/env";
import { logError } from "@/server/log";
import { drainDueMail } from "./outbox";

export const OUTBOX_POLL_MS = env.OUTBOX_POLL_MS;

const state = globalThis as unknown as { borewiseOutbox?: { timer: ReturnType<typeof setInterval>; tick: Promise<void> | null; stopping: boolean } };

/** Starts the retry loop once per process; a tick that is still running is not overlapped. */
export function startOutboxWorker(): void {
  if (state.borewiseOutbox) return;
  const loop = { timer: setInterval(() => {
    if (loop.tick || loop.stopping) return;
    loop.tick = drainDueMail(20, new Date(), () => loop.stopping)
      .then(() => undefined)
      .catch((error) => logError("mail.outbox_retry_failed", error))
      .finally(() => {
        loop.tick = null;
      });
  }, OUTBOX_POLL_MS), tick: null as Promise<void> | null, stopping: false };
  loop.timer.unref?.();
  state.borewiseOutbox = loop;
}

/** Stops the loop: no new tick starts, a running one ends after the row it is sending. */
export async function stopOutboxWorker(): Promise<void> {
  const loop = state.borewiseOutbox;
  if (!loop) return;
  loop.stopping = true;
  clearInterval(loop.timer);
  await loop.tick;
}
