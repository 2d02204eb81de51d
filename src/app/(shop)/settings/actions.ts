"use server";
import { revalidatePath } from "next/cache";
import { defineAction } from "@/server/http/action";
import { defineViewerAction } from "@/server/auth/public-action";
import { changePassword, setUnitSystem } from "@/server/auth/accounts";
import { endSessionByRef } from "@/server/auth/session";
import { changeMemberRole, removeMember } from "@/server/auth/members";
import { createInvitation, revokeInvitation } from "@/server/auth/invitations";
import { AppError } from "@/server/errors";
import { updateShopTimeZone } from "@/server/shop-settings/time-zone";
import { shopTimeZoneSchema } from "@/shared/time";
import {
  changePasswordSchema,
  changeRoleSchema,
  endSessionSchema,
  inviteSchema,
  removeMemberSchema,
  revokeInvitationSchema,
  unitPreferenceSchema,
} from "@/shared/auth/schemas";

const done = (message: string) => {
  revalidatePath("/settings");
  return { ok: true as const, message };
};

export const setUnitSystemAction = defineViewerAction(unitPreferenceSchema, async (viewer, input) => {
  await setUnitSystem(viewer.user.id, input.unitSystem);
  revalidatePath("/", "layout");
  return { ok: true, message: input.unitSystem === "inch" ? "Lengths are now shown in inches." : "Lengths are now shown in millimetres." };
});

export const changePasswordAction = defineViewerAction(changePasswordSchema, async (viewer, input) => {
  await changePassword({ userId: viewer.user.id, sessionId: viewer.session.id, currentPassword: input.currentPassword, newPassword: input.newPassword });
  return done("Password changed. Your other sessions were signed out.");
});

export const endSessionAction = defineViewerAction(endSessionSchema, async (viewer, input) => {
  if (viewer.session.id.startsWith(input.sessionRef)) throw new AppError("bad_request", "Use Sign out to end this session.");
  if (!(await endSessionByRef(viewer.user.id, input.sessionRef))) throw new AppError("not_found", "That session was not found.");
  return done("Session ended.");
});

export const inviteAction = defineAction(inviteSchema, "members.manage", async (actor, input) => {
  await createInvitation(actor, input);
  return done(`Invitation sent to ${input.email}.`);
});

export const revokeInvitationAction = defineAction(revokeInvitationSchema, "members.manage", async (actor, input) => {
  await revokeInvitation(actor, input);
  return done("Invitation withdrawn.");
});

export const changeRoleAction = defineAction(changeRoleSchema, "members.manage", async (actor, input) => {
  await changeMemberRole(actor, input);
  return done("Role changed.");
});

export const removeMemberAction = defineAction(removeMemberSchema, "members.manage", async (actor, input) => {
  await removeMember(actor, input);
  return done("Member removed.");
});

export const setShopTimeZoneAction = defineAction(shopTimeZoneSchema, "shop.edit", async (actor, input) => {
  const timeZone = await updateShopTimeZone({ actor, input });
  revalidatePath("/", "layout");
  return { ok: true, message: `Dates and times are now shown in ${timeZone}.` };
});
