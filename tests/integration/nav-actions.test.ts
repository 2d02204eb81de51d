// The header's actions go through the action wrappers: switching shop needs a session and a
// membership of the target shop; signing out needs no valid session at all.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/server/db";
import { memberships, sessions } from "@/server/db/schema";
import { signOutAction, switchShopAction } from "@/app/nav-actions";
import { createShopWithMembers } from "../support/fixtures";
import { asUser, callAction, putSessionToken, signOutTestUser } from "../support/session";

const redirected = { digest: expect.stringContaining("NEXT_REDIRECT") };

describe("nav actions", () => {
  it("switches only to a shop the user belongs to, and answers a refusal as a result", async () => {
    const home = await createShopWithMembers("nav-home");
    const second = await createShopWithMembers("nav-second");
    const stranger = await createShopWithMembers("nav-stranger");
    const machinist = home.actors.machinist;
    await db.insert(memberships).values({ id: randomUUID(), shopId: second.shopId, userId: machinist.userId, role: "apprentice" });
    const session = await asUser(machinist);

    expect(await callAction(switchShopAction, { shopId: stranger.shopId })).toEqual({ ok: false, message: "That shop was not found." });
    expect((await callAction(switchShopAction, { shopId: "" })).ok).toBe(false);
    await expect(callAction(switchShopAction, { shopId: second.shopId })).rejects.toMatchObject(redirected);
    const [row] = await db.select({ activeShopId: sessions.activeShopId }).from(sessions).where(eq(sessions.id, session.sessionId));
    expect(row?.activeShopId).toBe(second.shopId);

    signOutTestUser();
    expect((await callAction(switchShopAction, { shopId: second.shopId })).ok).toBe(false);
  });

  it("signs out with a session (which is ended) and without one (still sent to sign-in)", async () => {
    const shop = await createShopWithMembers("nav-signout");
    const session = await asUser(shop.actors.lead);
    await expect(callAction(signOutAction)).rejects.toMatchObject(redirected);
    expect(await db.select().from(sessions).where(and(eq(sessions.id, session.sessionId)))).toEqual([]);
    putSessionToken("not-a-session-token");
    await expect(callAction(signOutAction)).rejects.toMatchObject(redirected);
  });
});
