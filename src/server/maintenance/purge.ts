import "server-only";
import { and, isNotNull, lt, or } from "drizzle-orm";
import { db } from "@/server/db";
import { emailConfirmations, passwordResetTokens, rateLimitBuckets } from "@/server/db/schema";
import { deleteExpiredSessions } from "@/server/auth/session";
import { logError } from "@/server/log";

// The longest rate-limit window (rate-limit.ts) is a day: a bucket older than that counts nothing.
const LONGEST_WINDOW_MS = 24 * 60 * 60 * 1000;
export const PURGE_EVERY_MS = 60 * 60 * 1000;

/** Deletes what no longer counts: expired sessions, ended rate-limit windows, dead one-time links. */
export async function purgeExpired(now = new Date()): Promise<void> {
  await deleteExpiredSessions();
  await db.delete(rateLimitBuckets).where(lt(rateLimitBuckets.windowStartedAt, new Date(now.getTime() - LONGEST_WINDOW_MS)));
  for (const table of [passwordResetTokens, emailConfirmations]) {
    await db.delete(table).where(or(lt(table.expiresAt, now), and(isNotNull(table.usedAt), lt(table.usedAt, new Date(now.getTime() - LONGEST_WINDOW_MS)))));
  }
}

const state = globalThis as unknown as { borewisePurgeTimer?: ReturnType<typeof setInterval> };

/** Runs the purge once an hour in this process (started from instrumentation). */
export function startPurgeSchedule(): void {
  if (state.borewisePurgeTimer) return;
  state.borewisePurgeTimer = setInterval(() => void purgeExpired().catch((error) => logError("maintenance.purge_failed", error)), PURGE_EVERY_MS);
  state.borewisePurgeTimer.unref?.();
}

export function stopPurgeSchedule(): void {
  if (state.borewisePurgeTimer) clearInterval(state.borewisePurgeTimer);
  state.borewisePurgeTimer = undefined;
}
