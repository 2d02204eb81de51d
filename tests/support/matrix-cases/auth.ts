// Matrix rows for issue 4 (accounts, members, invitations, sessions).
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { memberships, users } from "@/server/db/schema";
import { createSessionFor, sessionRef } from "@/server/auth/session";
import { createInvitation } from "@/server/auth/invitations";
import {
  changeRoleAction,
  endSessionAction,
  inviteAction,
  removeMemberAction,
  revokeInvitationAction,
  setShopTimeZoneAction,
  setUnitSystemAction,
} from "@/app/(shop)/settings/actions";
import { saveFloorSettingsAction, saveTolerancesAction } from "@/app/(shop)/settings/tolerances/actions";
import { DEFAULT_SHOP_SETTINGS } from "@/shared/shop-settings/schema";
import { GET as getMembers } from "@/app/api/settings/members/route";
import type { MatrixCase, MatrixContext, Outcome } from "../matrix";
import { actionOutcome, routeOutcome } from "../matrix";
import { callAction, makeRequest } from "../session";

/** A fresh apprentice in the target shop, so every call has its own row to change or remove. */
async function freshMembership({ shop }: MatrixContext): Promise<string> {
  const userId = randomUUID();
  const membershipId = randomUUID();
  await db.insert(users).values({ id: userId, email: `matrix-${userId.slice(0, 8)}@example.test`, name: "Matrix member", passwordHash: "!" });
  await db.insert(memberships).values({ id: membershipId, shopId: shop.shopId, userId, role: "apprentice" });
  return membershipId;
}

const asOutcome = (value: Outcome | string) => value as Outcome;

export const authMatrixCases: MatrixCase[] = [
  {
    name: "action settings.invite",
    allowed: ["owner"],
    otherShop: "allowed",
    call: async () => asOutcome(actionOutcome(await callAction(inviteAction, { email: `invitee-${randomUUID().slice(0, 8)}@example.test`, role: "machinist" }))),
  },
  {
    name: "action settings.changeRole",
    allowed: ["owner"],
    otherShop: 404,
    call: async (c) => asOutcome(actionOutcome(await callAction(changeRoleAction, { membershipId: await freshMembership(c), role: "machinist" }))),
  },
  {
    name: "action settings.removeMember",
    allowed: ["owner"],
    otherShop: 404,
    call: async (c) => asOutcome(actionOutcome(await callAction(removeMemberAction, { membershipId: await freshMembership(c) }))),
  },
  {
    name: "action settings.revokeInvitation",
    allowed: ["owner"],
    otherShop: 404,
    call: async (c) => {
      const { invitationId } = await createInvitation(c.shop.actors.owner, { email: `revoke-${randomUUID().slice(0, 8)}@example.test`, role: "apprentice" });
      return asOutcome(actionOutcome(await callAction(revokeInvitationAction, { invitationId })));
    },
  },
  {
    name: "action settings.setUnitSystem (own account)",
    allowed: ["owner", "lead", "machinist", "apprentice"],
    otherShop: "allowed",
    call: async () => asOutcome(actionOutcome(await callAction(setUnitSystemAction, { unitSystem: "inch" }))),
  },
  {
    name: "action settings.setShopTimeZone",
    allowed: ["owner"],
    otherShop: "allowed",
    call: async () => asOutcome(actionOutcome(await callAction(setShopTimeZoneAction, { timeZone: "Europe/Berlin" }))),
  },
  {
    name: "action settings.endSession (own other session)",
    allowed: ["owner", "lead", "machinist", "apprentice"],
    otherShop: "allowed",
    call: async (c) => {
      // Signed out, there is nobody whose session to end: any well-formed ref must still get 401.
      const ref = c.callerUserId ? sessionRef((await createSessionFor(c.callerUserId, { activeShopId: null })).sessionId) : "0123456789abcdef";
      return asOutcome(actionOutcome(await callAction(endSessionAction, { sessionRef: ref })));
    },
  },
  {
    name: "action settings.saveTolerances (object payload)",
    allowed: ["owner"],
    otherShop: "allowed",
    call: async () => asOutcome(actionOutcome(await saveTolerancesAction(null, { ...DEFAULT_SHOP_SETTINGS, oversizeStepsUm: [0, 250, 500], readingLevels: ["top", "middle", "bottom"] }))),
  },
  {
    name: "action settings.saveFloorSettings (object payload)",
    allowed: ["owner", "lead"],
    otherShop: "allowed",
    call: async () => asOutcome(actionOutcome(await saveFloorSettingsAction(null, { maxTemperatureDifferenceK: 3, gaugeTemperatureC: 21 }))),
  },
  {
    name: "GET /api/settings/members",
    allowed: ["owner"],
    otherShop: "allowed",
    call: async () => routeOutcome(await getMembers(makeRequest("/api/settings/members"), { params: Promise.resolve({}) })),
  },
];

/** Used by tests that check a row really changed (or did not). */
export async function roleOf(membershipId: string) {
  const [row] = await db.select({ role: memberships.role }).from(memberships).where(and(eq(memberships.id, membershipId)));
  return row?.role ?? null;
}
