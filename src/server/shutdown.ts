import "server-only";
import { pool } from "@/server/db";
import { log, logError } from "@/server/log";
import { backgroundSendsSettled } from "@/server/mail/outbox";
import { stopOutboxWorker } from "@/server/mail/worker";
import { stopPurgeSchedule } from "@/server/maintenance/purge";

// On SIGTERM or Ctrl-C the server stops its loops, lets a mail being sent finish (anything not yet
// sent stays pending in the outbox for the next start: nothing queued is lost), then closes its
// MariaDB connections with a proper goodbye. `npm start` sets NEXT_MANUAL_SIG_HANDLE so Next.js leaves
// the signal to this handler instead of exiting on its own first.
const SETTLE_MS = 15_000;

const state = globalThis as unknown as { borewiseShutdown?: boolean };

async function within(ms: number, work: Promise<unknown>): Promise<void> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  await Promise.race([work, new Promise((resolve) => (timer = setTimeout(resolve, ms)))]);
  clearTimeout(timer);
}

export async function shutDown(signal: string): Promise<void> {
  log.info({ event: "server.shutdown", signal }, "shutting down");
  try {
    stopPurgeSchedule();
    await within(SETTLE_MS, Promise.all([stopOutboxWorker(), backgroundSendsSettled()]));
    await within(SETTLE_MS, pool.end());
    log.info({ event: "server.stopped" }, "stopped");
  } catch (error) {
    logError("server.shutdown_failed", error);
  }
}

/** Installs the handler once per process. */
export function installShutdown(): void {
  if (state.borewiseShutdown) return;
  state.borewiseShutdown = true;
  let stopping = false;
  for (const signal of ["SIGTERM", "SIGINT"] as const) {
    process.on(signal, () => {
      if (stopping) return; // Ctrl-C reaches both npm start and the server: one shutdown, bounded by SETTLE_MS
      stopping = true;
      void shutDown(signal).finally(() => process.exit(0));
    });
  }
}
