import "server-only";
import { inTransaction } from "@/server/db/retry";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/server/db";
import { newId } from "@/server/db/ids";
import { passwordResetTokens, users } from "@/server/db/schema";
import { AppError } from "@/server/errors";
import { enqueueMail, sendAfterCommit } from "@/server/mail/outbox";
import { passwordChangedMessage, passwordResetMessage } from "@/server/mail/messages";
import { RESET_PER_ACCOUNT, RESET_PER_IP, RESET_USE_PER_IP, takeAttempt } from "./rate-limit";
import { hashToken, isWellFormedToken, newToken } from "./tokens";
import { hashPassword } from "./password";
import { assertGoodNewPassword } from "./accounts";
import { endAllSessions } from "./session";

export const RESET_LIFETIME_MINUTES = 60;

/**
 * Sends a reset link if the address has an account. The answer is the same either way, so the form
 * does not reveal who has an account; both the address and the IP are rate-limited.
 */
export async function requestPasswordReset(email: string, ip: string): Promise<void> {
  await takeAttempt(
    [
      [RESET_PER_ACCOUNT, email],
      [RESET_PER_IP, ip],
    ],
    "Too many reset requests.",
  );
  const [user] = await db.select({ id: users.id }).from(users).where(eq(users.email, email)).limit(1);
  if (!user) return;
  const token = newToken();
  const message = await passwordResetMessage(token, RESET_LIFETIME_MINUTES);
  const outboxId = await inTransaction(async (tx) => {
    await tx.insert(passwordResetTokens).values({
      id: newId(),
      userId: user.id,
      tokenHash: hashToken(token),
      expiresAt: new Date(Date.now() + RESET_LIFETIME_MINUTES * 60_000),
    });
    return enqueueMail(tx, { ...message, to: email, kind: "password-reset" });
  });
  sendAfterCommit([outboxId]);
}

const unusable = () => new AppError("not_found", "This reset link has expired or was already used. Ask for a new one.");

export async function isUsableResetToken(token: string): Promise<boolean> {
  if (!isWellFormedToken(token)) return false;
  const rows = await db
    .select({ id: passwordResetTokens.id })
    .from(passwordResetTokens)
    .where(and(eq(passwordResetTokens.tokenHash, hashToken(token)), isNull(passwordResetTokens.usedAt), gt(passwordResetTokens.expiresAt, new Date())))
    .limit(1);
  return rows.length === 1;
}

/** Uses the token once (atomically), sets the password, ends every session and tells the user. */
export async function resetPassword(token: string, password: string, ip: string): Promise<void> {
  await takeAttempt([[RESET_USE_PER_IP, ip]], "Too many attempts with reset links.");
  // The token first: a dead link costs no hashing.
  if (!(await isUsableResetToken(token))) throw unusable();
  assertGoodNewPassword(password);
  const passwordHash = await hashPassword(password);
  const tokenHash = hashToken(token);
  const result = await inTransaction(async (tx) => {
    const [update] = await tx
      .update(passwordResetTokens)
      .set({ usedAt: new Date() })
      .where(and(eq(passwordResetTokens.tokenHash, tokenHash), isNull(passwordResetTokens.usedAt), gt(passwordResetTokens.expiresAt, new Date())));
    if (update.affectedRows !== 1) throw unusable();
    const [row] = await tx
      .select({ userId: passwordResetTokens.userId, name: users.name, email: users.email })
      .from(passwordResetTokens)
      .innerJoin(users, eq(users.id, passwordResetTokens.userId))
      .where(eq(passwordResetTokens.tokenHash, tokenHash));
    if (!row) throw unusable();
    await tx.update(users).set({ passwordHash }).where(eq(users.id, row.userId));
    // Any other outstanding link of this user dies with this one.
    await tx.update(passwordResetTokens).set({ usedAt: new Date() }).where(and(eq(passwordResetTokens.userId, row.userId), isNull(passwordResetTokens.usedAt)));
    const outboxId = await enqueueMail(tx, { ...(await passwordChangedMessage(row.name)), to: row.email, kind: "password-changed" });
    return { userId: row.userId, outboxId };
  });
  await endAllSessions(result.userId);
  sendAfterCommit([result.outboxId]);
}
