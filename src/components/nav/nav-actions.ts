"use server";
import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { requireViewer } from "@/server/auth/current";
import { endCurrentSession, setActiveShop } from "@/server/auth/session";
import { findMembership } from "@/server/auth/memberships";
import { switchShopSchema } from "@/components/auth/schemas";
import { formDataToObject } from "@/server/http/action";
import { AppError } from "@/server/errors";

// Next.js checks the Origin of every server action against the host (web-anchors A5).

export async function signOutAction(): Promise<void> {
  await endCurrentSession();
  redirect("/sign-in");
}

/** Makes another of the user's shops the active one for this session only. */
export async function switchShopAction(formData: FormData): Promise<void> {
  const viewer = await requireViewer();
  const { shopId } = switchShopSchema.parse(formDataToObject(formData));
  const membership = await findMembership(viewer.user.id, shopId);
  if (!membership) throw new AppError("not_found", "That shop was not found.");
  await setActiveShop(viewer.session.id, shopId);
  revalidatePath("/", "layout");
  redirect("/");
}
