import "server-only";
import { inTransaction } from "@/server/db/retry";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { newId } from "@/server/db/ids";
import { memberships, shops, users } from "@/server/db/schema";
import type { UnitSystem } from "@/shared/units";
import { AppError, isDuplicateKey } from "@/server/errors";
import { enqueueMail, sendAfterCommit } from "@/server/mail/outbox";
import { passwordChangedMessage } from "@/server/mail/messages";
import { hashPassword, passwordProblem, burnPasswordTime, verifyPassword } from "./password";
import { SIGN_IN_PER_ACCOUNT, SIGN_IN_PER_ACCOUNT_ANY_CLIENT, SIGN_IN_PER_IP, SIGN_UP_PER_IP, clearHits, refundHit, signInSubject, takeAttempt } from "./rate-limit";
import { endOtherSessions } from "./session";
import { queueEmailConfirmation } from "./email-confirmation";
import { createPlanningVersion } from "@/server/plans/planning-version";
import { listMembershipsOfUser } from "./memberships";

export type SignUpInput = { shopName: string; name: string; email: string; password: string };

export function assertGoodNewPassword(password: string, field = "password"): void {
  const problem = passwordProblem(password);
  if (problem) throw new AppError("bad_request", problem, { fieldErrors: { [field]: [problem] } });
}

const emailTaken = () =>
  new AppError("conflict", "An account with this e-mail already exists.", {
    fieldErrors: { email: ["An account with this e-mail already exists. Sign in instead, or reset the password."] },
  });

/** Creates a shop and its owner in one transaction. */
export async function signUp(input: SignUpInput, ip: string): Promise<{ userId: string; shopId: string }> {
  assertGoodNewPassword(input.password);
  // Counted before the insert, so a refused duplicate e-mail counts too (sign-up is no free oracle).
  await takeAttempt([[SIGN_UP_PER_IP, ip]], "Too many new shops from this address.");
  const passwordHash = await hashPassword(input.password);
  const userId = newId();
  const shopId = newId();
  try {
    const outboxId = await inTransaction(async (tx) => {
      await tx.insert(shops).values({ id: shopId, name: input.shopName });
      await tx.insert(users).values({ id: userId, email: input.email, name: input.name, passwordHash });
      await tx.insert(memberships).values({ id: newId(), shopId, userId, role: "owner" });
      await createPlanningVersion(tx, shopId);
      return queueEmailConfirmation(tx, { id: userId, email: input.email, name: input.name });
    });
    sendAfterCommit([outboxId]);
  } catch (error) {
    if (isDuplicateKey(error)) throw emailTaken();
    throw error;
  }
  return { userId, shopId };
}

const BAD_CREDENTIALS = "That e-mail and password do not match an account.";

/**
 * Checks e-mail and password under the abuse limits. Each attempt is counted against the account and
 * the IP before the password is checked (so a parallel burst cannot pass the check all at once); a
 * success clears the account's count and gives the IP its attempt back. Unknown e-mails cost the same
 * hashing time.
 */
export async function verifySignIn(email: string, password: string, ip: string): Promise<{ userId: string; shopId: string | null }> {
  const subject = signInSubject(email, ip);
  await takeAttempt(
    [
      [SIGN_IN_PER_ACCOUNT, subject],
      [SIGN_IN_PER_ACCOUNT_ANY_CLIENT, email],
      [SIGN_IN_PER_IP, ip],
    ],
    "Too many failed sign-ins.",
  );
  const [user] = await db.select({ id: users.id, passwordHash: users.passwordHash }).from(users).where(eq(users.email, email)).limit(1);
  const ok = user ? await verifyPassword(user.passwordHash, password) : (await burnPasswordTime(password), false);
  if (!user || !ok) throw new AppError("unauthorized", BAD_CREDENTIALS, { fieldErrors: { password: [BAD_CREDENTIALS] } });
  await Promise.all([clearHits(SIGN_IN_PER_ACCOUNT, subject), refundHit(SIGN_IN_PER_ACCOUNT_ANY_CLIENT, email), refundHit(SIGN_IN_PER_IP, ip)]);
  const shopsOfUser = await listMembershipsOfUser(user.id);
  return { userId: user.id, shopId: shopsOfUser[0]?.shopId ?? null };
}

/**
 * Changes the password (current one required, ASVS V2.1.6), ends every other session, notifies. Typing
 * the current password is a password check like a sign-in, so it counts against the same per-account
 * limit (a stolen session is no unthrottled way to guess it).
 */
export async function changePassword(args: { userId: string; sessionId: string; currentPassword: string; newPassword: string }): Promise<void> {
  const [user] = await db.select({ name: users.name, email: users.email, passwordHash: users.passwordHash }).from(users).where(eq(users.id, args.userId)).limit(1);
  if (!user) throw new AppError("unauthorized", "Please sign in.");
  // Keyed by the account and this session, so nobody else's guesses can stop the owner changing it.
  const subject = signInSubject(user.email, `session:${args.sessionId}`);
  await takeAttempt([[SIGN_IN_PER_ACCOUNT, subject], [SIGN_IN_PER_ACCOUNT_ANY_CLIENT, user.email]], "Too many wrong passwords.");
  if (!(await verifyPassword(user.passwordHash, args.currentPassword))) {
    throw new AppError("bad_request", "The current password is not right.", { fieldErrors: { currentPassword: ["The current password is not right."] } });
  }
  await Promise.all([clearHits(SIGN_IN_PER_ACCOUNT, subject), refundHit(SIGN_IN_PER_ACCOUNT_ANY_CLIENT, user.email)]);
  assertGoodNewPassword(args.newPassword, "newPassword");
  const passwordHash = await hashPassword(args.newPassword);
  const message = await passwordChangedMessage(user.name);
  const outboxId = await inTransaction(async (tx) => {
    await tx.update(users).set({ passwordHash }).where(eq(users.id, args.userId));
    return enqueueMail(tx, { ...message, to: user.email, kind: "password-changed" });
  });
  await endOtherSessions(args.userId, args.sessionId);
  sendAfterCommit([outboxId]);
}

export async function setUnitSystem(userId: string, unitSystem: UnitSystem): Promise<void> {
  await db.update(users).set({ unitSystem }).where(eq(users.id, userId));
}
