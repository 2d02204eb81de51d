import "server-only";
import { inTransaction } from "@/server/db/retry";
import { createHash } from "node:crypto";
import { eq, sql } from "drizzle-orm";
import { headers } from "next/headers";
import { db, type Db, type Tx } from "@/server/db";
import { rateLimitBuckets } from "@/server/db/schema";
import { AppError } from "@/server/errors";
import { CLIENT_ADDRESS_HEADER } from "@/server/http/client-address";

const HOUR_MS = 60 * 60 * 1000;

/** A fixed-window counter; `delayAfter` adds a growing wait between hits once that many are counted. */
export type Limit = { name: string; max: number; windowMs: number; delayAfter?: number; maxDelayMs?: number };

// ASVS 4.0.3 V2.2.1 / NIST 800-63B §5.2.2: at most 100 failed attempts per account per hour, with
// growing delays and no permanent lockout (the window ends), plus a separate per-IP key (web-anchors A3).
// The delaying key is the account AND the client (signInSubject), so a stranger's failures slow the
// stranger, not the account's owner (CWE-645); a looser per-account ceiling bounds guessing spread
// over many addresses.
export const SIGN_IN_PER_ACCOUNT: Limit = { name: "sign-in:account-client", max: 100, windowMs: HOUR_MS, delayAfter: 5, maxDelayMs: 5 * 60 * 1000 };
export const SIGN_IN_PER_ACCOUNT_ANY_CLIENT: Limit = { name: "sign-in:account", max: 1000, windowMs: HOUR_MS };
export const signInSubject = (email: string, client: string) => `${email}\n${client}`;
// Reset links and invitation links carry 160-bit tokens, so these only stop a client hammering the
// hashing behind them (common practice).
export const RESET_USE_PER_IP: Limit = { name: "reset-use:ip", max: 30, windowMs: HOUR_MS };
export const INVITE_ACCEPT_PER_IP: Limit = { name: "invite-accept:ip", max: 30, windowMs: HOUR_MS };
export const INVITES_PER_INVITER_DAY: Limit = { name: "invite:inviter-day", max: 100, windowMs: 24 * HOUR_MS };
export const SIGN_IN_PER_IP: Limit = { name: "sign-in:ip", max: 300, windowMs: HOUR_MS };
export const RESET_PER_ACCOUNT: Limit = { name: "reset:account", max: 5, windowMs: HOUR_MS };
export const RESET_PER_IP: Limit = { name: "reset:ip", max: 30, windowMs: HOUR_MS };
export const SIGN_UP_PER_IP: Limit = { name: "sign-up:ip", max: 20, windowMs: HOUR_MS };
export const INVITES_PER_SHOP: Limit = { name: "invite:shop", max: 50, windowMs: HOUR_MS };

const bucketKey = (limit: Limit, subject: string) =>
  `${limit.name}:${createHash("sha256").update(subject.toLowerCase()).digest("hex").slice(0, 40)}`;

/** Delay owed after `hits` counted failures: 1 s, 2 s, 4 s ... doubling, capped. */
export function delayAfterHitsMs(limit: Limit, hits: number): number {
  if (limit.delayAfter === undefined || hits < limit.delayAfter) return 0;
  return Math.min(1000 * 2 ** (hits - limit.delayAfter), limit.maxDelayMs ?? HOUR_MS);
}

type Bucket = { windowStartedAt: Date; hits: number; lastHitAt: Date };

/** Seconds a bucket makes the next attempt wait (0: allowed now). */
function waitSeconds(limit: Limit, bucket: Bucket | undefined, now: Date): number {
  if (!bucket) return 0;
  const windowEnd = bucket.windowStartedAt.getTime() + limit.windowMs;
  if (windowEnd <= now.getTime()) return 0;
  if (bucket.hits >= limit.max) return Math.ceil((windowEnd - now.getTime()) / 1000);
  // A concurrent request may have committed a hit stamped after this request's `now` (taken before the
  // row lock): no delay due means no wait, however the two clocks fall.
  const delay = delayAfterHitsMs(limit, bucket.hits);
  if (delay === 0) return 0;
  const delayEnd = bucket.lastHitAt.getTime() + delay;
  return delayEnd > now.getTime() ? Math.ceil((delayEnd - now.getTime()) / 1000) : 0;
}

/** Seconds until another attempt is allowed, or 0 when it is allowed now. */
export async function secondsUntilAllowed(limit: Limit, subject: string, now = new Date()): Promise<number> {
  const [bucket] = await db.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, bucketKey(limit, subject))).limit(1);
  return waitSeconds(limit, bucket, now);
}

/** Counts one hit; a window that has ended starts again at 1 (column order matters in MariaDB). */
export async function recordHit(limit: Limit, subject: string, now = new Date(), runner: Db | Tx = db): Promise<void> {
  const windowStart = new Date(now.getTime() - limit.windowMs);
  await runner
    .insert(rateLimitBuckets)
    .values({ key: bucketKey(limit, subject), windowStartedAt: now, hits: 1, lastHitAt: now })
    .onDuplicateKeyUpdate({
      set: {
        hits: sql`IF(${rateLimitBuckets.windowStartedAt} <= ${windowStart}, 1, ${rateLimitBuckets.hits} + 1)`,
        windowStartedAt: sql`IF(${rateLimitBuckets.windowStartedAt} <= ${windowStart}, ${now}, ${rateLimitBuckets.windowStartedAt})`,
        lastHitAt: now,
      },
    });
}

/**
 * Checks the limits and counts this attempt in one transaction, BEFORE the work it guards (a password
 * check, a mail). Each bucket row is locked (keys in a fixed order, so two callers never deadlock),
 * so a burst of parallel requests is counted one by one instead of all passing the check before any
 * of them is recorded. A refused attempt is not counted. Throws 429 with Retry-After.
 */
export async function takeAttempt(checks: Array<[Limit, string]>, message: string, now = new Date()): Promise<void> {
  const keyed = checks.map(([limit, subject]) => ({ limit, subject, key: bucketKey(limit, subject) })).sort((a, b) => (a.key < b.key ? -1 : 1));
  await inTransaction(async (tx) => {
    let wait = 0;
    for (const { limit, key } of keyed) {
      // Makes sure the row exists (hits 0), then reads it under a row lock.
      await tx.insert(rateLimitBuckets).values({ key, windowStartedAt: now, hits: 0, lastHitAt: now }).onDuplicateKeyUpdate({ set: { key } });
      const [bucket] = await tx.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, key)).for("update");
      wait = Math.max(wait, waitSeconds(limit, bucket, now));
    }
    if (wait > 0) throw new AppError("rate_limited", `${message} Try again in ${describeWait(wait)}.`, { retryAfterSeconds: wait });
    for (const { limit, subject } of keyed) await recordHit(limit, subject, now, tx);
  });
}

/** Gives back one counted attempt that turned out not to be a failure (e.g. a right password). */
export async function refundHit(limit: Limit, subject: string): Promise<void> {
  await db
    .update(rateLimitBuckets)
    .set({ hits: sql`GREATEST(${rateLimitBuckets.hits} - 1, 0)` })
    .where(eq(rateLimitBuckets.key, bucketKey(limit, subject)));
}

export async function clearHits(limit: Limit, subject: string): Promise<void> {
  await db.delete(rateLimitBuckets).where(eq(rateLimitBuckets.key, bucketKey(limit, subject)));
}

function describeWait(seconds: number): string {
  if (seconds < 60) return `${seconds} second${seconds === 1 ? "" : "s"}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} minute${minutes === 1 ? "" : "s"}`;
}

/** The caller's address, stamped on the request by installClientAddress (TRUSTED_PROXY_HOPS decides what counts). */
export async function clientIp(): Promise<string> {
  const h = await headers();
  return (h.get(CLIENT_ADDRESS_HEADER) || "unknown").slice(0, 64);
}
