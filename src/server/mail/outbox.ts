import "server-only";
import { logError } from "@/server/log";
import { and, asc, eq, isNull, lte, or, sql } from "drizzle-orm";
import { db, type Db, type Tx } from "@/server/db";
import { newId } from "@/server/db/ids";
import { emailOutbox, type OutboxAttachment } from "@/server/db/schema";
import { deliver, SMTP_WORST_CASE_MS } from "./transport";
import { safeErrorFields } from "@/server/log";
import type { RenderedMail } from "./messages";

// Mail never blocks the action that caused it (issue 4): the action writes an outbox row inside its
// own transaction, then asks for a send after commit in the background; a worker retries what failed
// (src/instrumentation.ts). A row is claimed with a short lock so two senders never send it twice.
export const OUTBOX_MAX_ATTEMPTS = 8;
export const OUTBOX_RETRY_BASE_MS = 30_000;
export const OUTBOX_RETRY_MAX_MS = 60 * 60 * 1000;
// A claim outlives the longest a send can take (connection + greeting + socket timeouts in
// transport.ts, 40 s) with room to spare, so no second sender takes a row still being sent.
export const CLAIM_MS = 2 * SMTP_WORST_CASE_MS;

export type MailToQueue = RenderedMail & { to: string; kind: string; shopId?: string | null; attachments?: OutboxAttachment[] };

/** Queues a message in the caller's transaction; returns the outbox id for sendAfterCommit. */
export async function enqueueMail(runner: Db | Tx, mail: MailToQueue): Promise<string> {
  const id = newId();
  await runner.insert(emailOutbox).values({
    id,
    shopId: mail.shopId ?? null,
    kind: mail.kind,
    toAddress: mail.to,
    subject: mail.subject.slice(0, 200),
    html: mail.html,
    text: mail.text,
    attachments: mail.attachments && mail.attachments.length > 0 ? mail.attachments : null,
    nextAttemptAt: new Date(),
  });
  return id;
}

/** The JSON column as stored (mysql2 may hand JSON back as text). */
function attachmentsOf(value: unknown): OutboxAttachment[] {
  const parsed: unknown = typeof value === "string" ? JSON.parse(value) : value;
  return Array.isArray(parsed) ? (parsed as OutboxAttachment[]) : [];
}

/** Wait before attempt n+1 after n failures: 30 s, 1 min, 2 min ... capped at 1 h. */
export function retryDelayMs(failedAttempts: number): number {
  return Math.min(OUTBOX_RETRY_BASE_MS * 2 ** Math.max(0, failedAttempts - 1), OUTBOX_RETRY_MAX_MS);
}

/** Claims a row from this moment on: a drain that started long ago must not stamp an expired lease. */
async function claim(id: string): Promise<boolean> {
  const now = new Date();
  const [result] = await db
    .update(emailOutbox)
    .set({ lockedUntil: new Date(now.getTime() + CLAIM_MS) })
    .where(and(eq(emailOutbox.id, id), eq(emailOutbox.status, "pending"), or(isNull(emailOutbox.lockedUntil), lte(emailOutbox.lockedUntil, now))));
  return result.affectedRows === 1;
}

/** Tries to send one row now. Returns "sent", "retry", "failed" or "skipped" (not due / claimed elsewhere). */
export async function sendOutboxRow(id: string): Promise<"sent" | "retry" | "failed" | "skipped"> {
  if (!(await claim(id))) return "skipped";
  const [row] = await db.select().from(emailOutbox).where(eq(emailOutbox.id, id)).limit(1);
  if (!row) return "skipped";
  try {
    await deliver({ to: row.toAddress, subject: row.subject, html: row.html, text: row.text, attachments: attachmentsOf(row.attachments) });
    // The bodies may hold a one-time link: once handed to SMTP they are no longer kept.
    await db.update(emailOutbox).set({ status: "sent", sentAt: new Date(), html: "", text: "", lockedUntil: null, attempts: row.attempts + 1 }).where(eq(emailOutbox.id, id));
    return "sent";
  } catch (error) {
    const attempts = row.attempts + 1;
    const failed = attempts >= OUTBOX_MAX_ATTEMPTS;
    await db
      .update(emailOutbox)
      .set({
        attempts,
        status: failed ? "failed" : "pending",
        // A mail given up on keeps no link: the bodies go, like a sent one's.
        ...(failed && { html: "", text: "" }),
        lastError: JSON.stringify(safeErrorFields(error)).slice(0, 500),
        nextAttemptAt: new Date(Date.now() + retryDelayMs(attempts)),
        lockedUntil: null,
      })
      .where(eq(emailOutbox.id, id));
    return failed ? "failed" : "retry";
  }
}

/** Fire-and-forget send right after commit; errors are recorded on the row, never thrown. */
export function sendAfterCommit(ids: string[]): void {
  for (const id of ids) {
    const sending = sendOutboxRow(id).catch((error) => logError("mail.background_send_failed", error));
    inFlight.add(sending);
    void sending.finally(() => inFlight.delete(sending));
  }
}

// Background sends still running, so a shutdown can let them finish (src/server/shutdown.ts).
const inFlight = new Set<Promise<unknown>>();

/** Resolves when every background send started so far has ended (sent, or left pending for a retry). */
export async function backgroundSendsSettled(): Promise<void> {
  await Promise.allSettled([...inFlight]);
}

/** Sends every due row (the retry loop). */
export async function drainDueMail(limit = 20, now = new Date(), stopping: () => boolean = () => false): Promise<number> {
  const due = await db
    .select({ id: emailOutbox.id })
    .from(emailOutbox)
    .where(and(eq(emailOutbox.status, "pending"), lte(emailOutbox.nextAttemptAt, now), or(isNull(emailOutbox.lockedUntil), lte(emailOutbox.lockedUntil, now))))
    .orderBy(asc(emailOutbox.nextAttemptAt))
    .limit(limit);
  let sent = 0;
  for (const { id } of due) {
    if (stopping()) break; // the rest stay pending for the next start
    if ((await sendOutboxRow(id)) === "sent") sent++;
  }
  return sent;
}

export async function countPendingMail(): Promise<number> {
  const [row] = await db.select({ n: sql<number>`count(*)` }).from(emailOutbox).where(eq(emailOutbox.status, "pending"));
  return Number(row?.n ?? 0);
}
