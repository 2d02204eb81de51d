"use server";
import { redirect } from "next/navigation";
import { definePublicAction } from "@/server/auth/public-action";
import { signUp, verifySignIn } from "@/server/auth/accounts";
import { startSession, getCurrentSession } from "@/server/auth/session";
import { clientIp } from "@/server/auth/rate-limit";
import { requestPasswordReset, resetPassword } from "@/server/auth/password-reset";
import { acceptInvitationAsNewUser, acceptInvitationAsUser, acceptInvitationWithPassword } from "@/server/auth/invitations";
import { AppError } from "@/server/errors";
import { safeNext } from "@/server/auth/safe-next";
import { confirmEmail } from "@/server/auth/email-confirmation";
import { z } from "zod";
import { acceptInvitationSchema, resetPasswordSchema, resetRequestSchema, signInSchema, signUpSchema } from "@/shared/auth/schemas";

const confirmEmailSchema = z.object({ token: z.string().max(64) });


export const signUpAction = definePublicAction(signUpSchema, async (input) => {
  const { userId, shopId } = await signUp(input, await clientIp());
  await startSession(userId, shopId);
  redirect("/");
});

export const signInAction = definePublicAction(signInSchema, async (input) => {
  const { userId, shopId } = await verifySignIn(input.email, input.password, await clientIp());
  await startSession(userId, shopId);
  redirect(safeNext(input.next));
});

export const requestResetAction = definePublicAction(resetRequestSchema, async (input) => {
  await requestPasswordReset(input.email, await clientIp());
  return { ok: true, message: "If an account uses that address, a reset link is on its way. It works once, within 60 minutes." };
});

export const resetPasswordAction = definePublicAction(resetPasswordSchema, async (input) => {
  await resetPassword(input.token, input.password, await clientIp());
  redirect("/sign-in?reset=done");
});

/** Accepts an invitation as the signed-in user, as an existing account (password), or as a new one. */
export const acceptInvitationAction = definePublicAction(acceptInvitationSchema, async (input) => {
  if (input.mode === "signed-in") {
    const current = await getCurrentSession();
    if (!current) throw new AppError("unauthorized", "Please sign in first.");
    const { shopId } = await acceptInvitationAsUser(input.token, current.user);
    await startSession(current.user.id, shopId);
  } else if (input.mode === "existing") {
    const { userId, shopId } = await acceptInvitationWithPassword(input.token, input.password, await clientIp());
    await startSession(userId, shopId);
  } else {
    const { userId, shopId } = await acceptInvitationAsNewUser(input.token, { name: input.name, password: input.password }, await clientIp());
    await startSession(userId, shopId);
  }
  redirect("/");
});

/** Confirms a new owner's e-mail address from the mailed link (a POST: opening a link changes nothing). */
export const confirmEmailAction = definePublicAction(confirmEmailSchema, async (input) => {
  if (!(await confirmEmail(input.token))) {
    return { ok: false, message: "This link has expired or was already used." };
  }
  return { ok: true, message: "Your address is confirmed. Your shop can now send invitations." };
});
