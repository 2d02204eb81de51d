import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { newId } from "@/server/db/ids";
import { memberships, shops, users, type UnitSystem } from "@/server/db/schema";
import { AppError, isDuplicateKey } from "@/server/errors";
import { enqueueMail, sendAfterCommit } from "@/server/mail/outbox";
import { passwordChangedMessage } from "@/server/mail/messages";
import { hashPassword, passwordProblem, burnPasswordTime, verifyPassword } from "./password";
import { SIGN_IN_PER_ACCOUNT, SIGN_IN_PER_IP, SIGN_UP_PER_IP, assertWithinLimits, clearHits, recordHit } from "./rate-limit";
import { endOtherSessions } from "./session";
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
  await assertWithinLimits([[SIGN_UP_PER_IP, ip]], "Too many new shops from this address.");
  assertGoodNewPassword(input.password);
  const passwordHash = await hashPassword(input.password);
  const userId = newId();
  const shopId = newId();
  try {
    await db.transaction(async (tx) => {
      await tx.insert(shops).values({ id: shopId, name: input.shopName });
      await tx.insert(users).values({ id: userId, email: input.email, name: input.name, passwordHash });
      await tx.insert(memberships).values({ id: newId(), shopId, userId, role: "owner" });
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw emailTaken();
    throw error;
  }
  await recordHit(SIGN_UP_PER_IP, ip);
  return { userId, shopId };
}

const BAD_CREDENTIALS = "That e-mail and password do not match an account.";

/**
 * Checks e-mail and password under the abuse limits. Every failure counts against the account and the
 * IP; success clears the account's count. Unknown e-mails cost the same hashing time.
 */
export async function verifySignIn(email: string, password: string, ip: string): Promise<{ userId: string; shopId: string | null }> {
  await assertWithinLimits(
    [
      [SIGN_IN_PER_ACCOUNT, email],
      [SIGN_IN_PER_IP, ip],
    ],
    "Too many failed sign-ins.",
  );
  const [user] = await db.select({ id: users.id, passwordHash: users.passwordHash }).from(users).where(eq(users.email, email)).limit(1);
  const ok = user ? await verifyPassword(user.passwordHash, password) : (await burnPasswordTime(password), false);
  if (!user || !ok) {
    await Promise.all([recordHit(SIGN_IN_PER_ACCOUNT, email), recordHit(SIGN_IN_PER_IP, ip)]);
    throw new AppError("unauthorized", BAD_CREDENTIALS, { fieldErrors: { password: [BAD_CREDENTIALS] } });
  }
  await clearHits(SIGN_IN_PER_ACCOUNT, email);
  const shopsOfUser = await listMembershipsOfUser(user.id);
  return { userId: user.id, shopId: shopsOfUser[0]?.shopId ?? null };
}

/** Changes the password (current one required, ASVS V2.1.6), ends every other session, notifies. */
export async function changePassword(args: { userId: string; sessionId: string; currentPassword: string; newPassword: string }): Promise<void> {
  const [user] = await db.select({ name: users.name, email: users.email, passwordHash: users.passwordHash }).from(users).where(eq(users.id, args.userId)).limit(1);
  if (!user) throw new AppError("unauthorized", "Please sign in.");
  if (!(await verifyPassword(user.passwordHash, args.currentPassword))) {
    throw new AppError("bad_request", "The current password is not right.", { fieldErrors: { currentPassword: ["The current password is not right."] } });
  }
  assertGoodNewPassword(args.newPassword, "newPassword");
  const passwordHash = await hashPassword(args.newPassword);
  const message = await passwordChangedMessage(user.name);
  const outboxId = await db.transaction(async (tx) => {
    await tx.update(users).set({ passwordHash }).where(eq(users.id, args.userId));
    return enqueueMail(tx, { ...message, to: user.email, kind: "password-changed" });
  });
  await endOtherSessions(args.userId, args.sessionId);
  sendAfterCommit([outboxId]);
}

export async function setUnitSystem(userId: string, unitSystem: UnitSystem): Promise<void> {
  await db.update(users).set({ unitSystem }).where(eq(users.id, userId));
}
