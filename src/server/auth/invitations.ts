import "server-only";
import { inTransaction } from "@/server/db/retry";
import { and, desc, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/server/db";
import { newId } from "@/server/db/ids";
import { invitations, memberships, shops, users } from "@/server/db/schema";
import type { Role } from "@/shared/auth/roles";
import { AppError, isDuplicateKey } from "@/server/errors";
import { enqueueMail, sendAfterCommit } from "@/server/mail/outbox";
import { invitationMessage } from "@/server/mail/messages";
import { assertCan } from "./guard";
import type { Actor } from "@/shared/auth/policy";
import { INVITE_ACCEPT_PER_IP, INVITES_PER_INVITER_DAY, INVITES_PER_SHOP, takeAttempt } from "./rate-limit";
import { assertMayMailOutside } from "./email-confirmation";
import { hashToken, isWellFormedToken, newToken } from "./tokens";
import { hashPassword } from "./password";
import { assertGoodNewPassword, verifySignIn } from "./accounts";

export const INVITATION_LIFETIME_DAYS = 7;
const DAY_MS = 24 * 60 * 60 * 1000;

export type PendingInvitation = { id: string; email: string; role: Role; expiresAt: Date; createdAt: Date };

/** Invites an e-mail address into the actor's shop; the link goes out through the outbox. */
export async function createInvitation(actor: Actor, input: { email: string; role: Role }): Promise<{ invitationId: string }> {
  assertCan(actor, "members.manage");
  const existing = await db
    .select({ id: memberships.id })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.shopId, actor.shopId), eq(users.email, input.email)))
    .limit(1);
  if (existing.length) throw new AppError("conflict", "That person is already a member.", { fieldErrors: { email: ["Already a member of this shop."] } });
  await assertMayMailOutside(actor.shopId);
  await takeAttempt([[INVITES_PER_SHOP, actor.shopId], [INVITES_PER_INVITER_DAY, actor.userId]], "Too many invitations from this shop.");
  const [context] = await db
    .select({ shopName: shops.name, inviterName: users.name })
    .from(shops)
    .innerJoin(users, eq(users.id, actor.userId))
    .where(eq(shops.id, actor.shopId));
  const token = newToken();
  const message = await invitationMessage({ shopName: context?.shopName ?? "", inviterName: context?.inviterName ?? "", role: input.role, expiresInDays: INVITATION_LIFETIME_DAYS, token });
  const invitationId = newId();
  const outboxId = await inTransaction(async (tx) => {
    await tx.insert(invitations).values({
      id: invitationId,
      shopId: actor.shopId,
      email: input.email,
      role: input.role,
      tokenHash: hashToken(token),
      invitedByUserId: actor.userId,
      expiresAt: new Date(Date.now() + INVITATION_LIFETIME_DAYS * DAY_MS),
    });
    return enqueueMail(tx, { ...message, to: input.email, kind: "invitation", shopId: actor.shopId });
  });
  sendAfterCommit([outboxId]);
  return { invitationId };
}

export async function listPendingInvitations(actor: Actor): Promise<PendingInvitation[]> {
  assertCan(actor, "members.view");
  return db
    .select({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt, createdAt: invitations.createdAt })
    .from(invitations)
    .where(and(eq(invitations.shopId, actor.shopId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())))
    .orderBy(desc(invitations.createdAt));
}

export async function revokeInvitation(actor: Actor, input: { invitationId: string }): Promise<void> {
  assertCan(actor, "members.manage");
  const [result] = await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(and(eq(invitations.id, input.invitationId), eq(invitations.shopId, actor.shopId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
  if (result.affectedRows !== 1) throw new AppError("not_found", "That invitation was not found.");
}

export type InvitationView = { shopName: string; email: string; role: Role; accountExists: boolean };

/** What the invitation page shows for a usable token; null for unknown, used, revoked or expired. */
export async function findUsableInvitation(token: string): Promise<InvitationView | null> {
  if (!isWellFormedToken(token)) return null;
  const [row] = await db
    .select({ shopName: shops.name, email: invitations.email, role: invitations.role })
    .from(invitations)
    .innerJoin(shops, eq(shops.id, invitations.shopId))
    .where(and(eq(invitations.tokenHash, hashToken(token)), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())))
    .limit(1);
  if (!row) return null;
  const [user] = await db.select({ id: users.id }).from(users).where(eq(users.email, row.email)).limit(1);
  return { ...row, accountExists: Boolean(user) };
}

const unusable = () => new AppError("not_found", "This invitation link has expired, was already used, or was withdrawn.");

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

/** Marks the invitation used (single use: only one caller's UPDATE matches) and returns it. */
async function consume(tx: Tx, token: string) {
  const tokenHash = hashToken(token);
  const [result] = await tx
    .update(invitations)
    .set({ acceptedAt: new Date() })
    .where(and(eq(invitations.tokenHash, tokenHash), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())));
  if (result.affectedRows !== 1) throw unusable();
  const [row] = await tx.select({ shopId: invitations.shopId, email: invitations.email, role: invitations.role }).from(invitations).where(eq(invitations.tokenHash, tokenHash));
  if (!row) throw unusable();
  return row;
}

async function join(tx: Tx, shopId: string, userId: string, role: Role): Promise<void> {
  try {
    await tx.insert(memberships).values({ id: newId(), shopId, userId, role });
  } catch (error) {
    if (!isDuplicateKey(error)) throw error; // already a member: the invitation is simply used up
  }
}

/** An existing user (signed in, or whose password was just checked) joins with the invited role. */
export async function acceptInvitationAsUser(token: string, user: { id: string; email: string }): Promise<{ shopId: string }> {
  if (!isWellFormedToken(token)) throw unusable();
  return inTransaction(async (tx) => {
    const invitation = await consume(tx, token);
    if (invitation.email !== user.email) {
      throw new AppError("forbidden", `This invitation was sent to ${invitation.email}. Sign in with that address to accept it.`);
    }
    await join(tx, invitation.shopId, user.id, invitation.role);
    return { shopId: invitation.shopId };
  });
}

/** A new person creates their account with the invited e-mail and joins, in one transaction. */
export async function acceptInvitationAsNewUser(token: string, input: { name: string; password: string }, ip: string): Promise<{ userId: string; shopId: string }> {
  await takeAttempt([[INVITE_ACCEPT_PER_IP, ip]], "Too many attempts with invitation links.");
  // The token first: a dead link costs no hashing.
  if (!(await findUsableInvitation(token))) throw unusable();
  assertGoodNewPassword(input.password);
  const passwordHash = await hashPassword(input.password);
  const userId = newId();
  try {
    return await inTransaction(async (tx) => {
      const invitation = await consume(tx, token);
      // The invitation link reached this address, which confirms it.
      await tx.insert(users).values({ id: userId, email: invitation.email, name: input.name, passwordHash, emailConfirmedAt: new Date() });
      await join(tx, invitation.shopId, userId, invitation.role);
      return { userId, shopId: invitation.shopId };
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw new AppError("conflict", "An account with this e-mail already exists. Sign in to accept the invitation.");
    throw error;
  }
}

/** An existing account accepts by typing its password (same abuse limits as sign-in). */
export async function acceptInvitationWithPassword(token: string, password: string, ip: string): Promise<{ userId: string; shopId: string }> {
  await takeAttempt([[INVITE_ACCEPT_PER_IP, ip]], "Too many attempts with invitation links.");
  const usable = await findUsableInvitation(token);
  if (!usable) throw unusable();
  const row = { email: usable.email };
  const { userId } = await verifySignIn(row.email, password, ip);
  const { shopId } = await acceptInvitationAsUser(token, { id: userId, email: row.email });
  return { userId, shopId };
}
