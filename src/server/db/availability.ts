import "server-only";
import { dbErrorCode } from "./error-code";

// No connection was ever made, or the server refused the statement unrun, so nothing was written.
// ER_UNKNOWN_COM_ERROR (1047) is what a Galera node answers while it is not part of the primary
// component (joining, or cut off): "WSREP has not yet prepared node for application use".
const NEVER_CONNECTED = new Set(["ECONNREFUSED", "ENOTFOUND", "EHOSTUNREACH", "ER_CON_COUNT_ERROR", "ER_ACCESS_DENIED_ERROR", "ER_UNKNOWN_COM_ERROR"]);
// The connection went away mid-way: a COMMIT may have landed before the answer was lost.
const LOST_MIDWAY = new Set(["PROTOCOL_CONNECTION_LOST", "ECONNRESET", "EPIPE", "ETIMEDOUT", "PROTOCOL_SEQUENCE_TIMEOUT", "ER_SERVER_SHUTDOWN", "ER_CONNECTION_KILLED"]);
export const DATABASE_RETRY_AFTER_SECONDS = 5;
/** A page request finds out whether a database seen down is back at most this often. */
export const PROBE_INTERVAL_MS = 1000;

export type ConnectionFailure = "never-connected" | "lost-midway";

/** Whether an error means the database could not be reached (and whether a write may have landed). */
export function connectionFailure(error: unknown): ConnectionFailure | null {
  if ((error as Error | null)?.message === "Queue limit reached.") return "never-connected";
  const code = dbErrorCode(error);
  if (code && NEVER_CONNECTED.has(code)) return "never-connected";
  if (code && LOST_MIDWAY.has(code)) return "lost-midway";
  return null;
}

type Availability = { downSince: number | null; lastAnsweredAt: number; lastProbeAt: number; probe: Promise<void> | null };

// On globalThis for the same reason as the pool: the proxy's bundle and the routes' bundles share one process.
const globalForAvailability = globalThis as unknown as { borewiseDbAvailability?: Availability };
const state = (globalForAvailability.borewiseDbAvailability ??= { downSince: null, lastAnsweredAt: 0, lastProbeAt: 0, probe: null });

export function noteDatabaseAnswered(now = Date.now()): void {
  state.downSince = null;
  state.lastAnsweredAt = now;
}

export function noteDatabaseError(error: unknown, now = Date.now()): void {
  if (connectionFailure(error)) state.downSince ??= now;
}

/** When the database was first seen unreachable in this process, or null while it answers. */
export function databaseDownSince(): number | null {
  return state.downSince;
}

/**
 * Whether page requests should be answered "unavailable" now. Trusts what the pool saw within the last
 * second; otherwise runs one probe (shared by concurrent callers), so a down database is asked at most
 * once a second and the app recovers by itself when it answers again.
 */
export async function databaseSeemsDown(probe: () => Promise<unknown>, now = Date.now()): Promise<boolean> {
  if (now - Math.max(state.lastAnsweredAt, state.lastProbeAt) < PROBE_INTERVAL_MS) return state.downSince !== null;
  state.probe ??= (async () => {
    state.lastProbeAt = now;
    try {
      await probe();
      noteDatabaseAnswered();
    } catch (error) {
      // A probe that hangs past its bound or finds the queue full counts as down too.
      state.downSince ??= Date.now();
      noteDatabaseError(error);
    } finally {
      state.probe = null;
    }
  })();
  await state.probe;
  return state.downSince !== null;
}

/** Test hook: forget what was seen. */
export function resetDatabaseAvailability(): void {
  Object.assign(state, { downSince: null, lastAnsweredAt: 0, lastProbeAt: 0, probe: null });
}
