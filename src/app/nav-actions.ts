"use server";
import { z } from "zod";
import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { endCurrentSession, setActiveShop } from "@/server/auth/session";
import { findMembership } from "@/server/auth/memberships";
import { definePublicAction, defineViewerAction } from "@/server/auth/public-action";
import { switchShopSchema } from "@/shared/auth/schemas";
import { AppError } from "@/server/errors";

// Next.js checks the Origin of every server action against the host (web-anchors A5).

/** Signing out needs no valid session: an expired one is ended all the same. */
export const signOutAction = definePublicAction(z.object({}), async () => {
  await endCurrentSession();
  redirect("/sign-in");
});

/** Makes another of the user's shops the active one for this session only. */
export const switchShopAction = defineViewerAction(switchShopSchema, async (viewer, { shopId }) => {
  const membership = await findMembership(viewer.user.id, shopId);
  if (!membership) throw new AppError("not_found", "That shop was not found.");
  await setActiveShop(viewer.session.id, shopId);
  revalidatePath("/", "layout");
  redirect("/");
});
