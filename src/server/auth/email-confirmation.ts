import "server-only";
import { inTransaction } from "@/server/db/retry";
import { and, eq, gt, isNotNull, isNull } from "drizzle-orm";
import { db, type Tx } from "@/server/db";
import { newId } from "@/server/db/ids";
import { emailConfirmations, memberships, users } from "@/server/db/schema";
import { AppError } from "@/server/errors";
import { enqueueMail } from "@/server/mail/outbox";
import { emailConfirmationMessage } from "@/server/mail/messages";
import { hashToken, isWellFormedToken, newToken } from "./tokens";

export const CONFIRMATION_LIFETIME_DAYS = 7;

/** Queues the confirmation link for a new owner inside the sign-up transaction; returns the outbox id. */
export async function queueEmailConfirmation(tx: Tx, user: { id: string; email: string; name: string }): Promise<string> {
  const token = newToken();
  await tx.insert(emailConfirmations).values({
    id: newId(), userId: user.id, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + CONFIRMATION_LIFETIME_DAYS * 24 * 60 * 60 * 1000),
  });
  return enqueueMail(tx, { ...(await emailConfirmationMessage(user.name, token, CONFIRMATION_LIFETIME_DAYS)), to: user.email, kind: "email-confirmation" });
}

/** Uses the link once and marks the address confirmed; false for an unknown, used or expired link. */
export async function confirmEmail(token: string): Promise<boolean> {
  if (!isWellFormedToken(token)) return false;
  const tokenHash = hashToken(token);
  return inTransaction(async (tx) => {
    const [update] = await tx.update(emailConfirmations).set({ usedAt: new Date() })
      .where(and(eq(emailConfirmations.tokenHash, tokenHash), isNull(emailConfirmations.usedAt), gt(emailConfirmations.expiresAt, new Date())));
    if (update.affectedRows !== 1) return false;
    const [row] = await tx.select({ userId: emailConfirmations.userId }).from(emailConfirmations).where(eq(emailConfirmations.tokenHash, tokenHash));
    if (!row) return false;
    await tx.update(users).set({ emailConfirmedAt: new Date() }).where(and(eq(users.id, row.userId), isNull(users.emailConfirmedAt)));
    return true;
  });
}

/**
 * Mail to people outside the shop (invitations, customer mail) carries the shop's name and words, so a
 * throwaway sign-up must not be able to send it: an owner of the shop has to have confirmed their address.
 */
export async function assertMayMailOutside(shopId: string): Promise<void> {
  const [confirmed] = await db.select({ id: users.id }).from(memberships).innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.shopId, shopId), eq(memberships.role, "owner"), isNotNull(users.emailConfirmedAt))).limit(1);
  if (!confirmed) {
    throw new AppError("forbidden", "Confirm your e-mail address first: open the link we mailed you when you signed up. Then you can send invitations.");
  }
}
