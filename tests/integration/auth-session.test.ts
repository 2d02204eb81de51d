import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { sessions } from "@/server/db/schema";
import { getCurrentActor, getViewer } from "@/server/auth/current";
import {
  SESSION_ABSOLUTE_LIFETIME_MS,
  SESSION_IDLE_TIMEOUT_MS,
  createSessionFor,
  endOtherSessions,
  validateSessionToken,
} from "@/server/auth/session";
import { hashToken } from "@/server/auth/tokens";
import { createShopWithMembers } from "../support/fixtures";
import { signInAs, signOutTestUser, putSessionToken } from "../support/session";

const HOUR = 60 * 60 * 1000;

async function sessionRow(id: string) {
  const rows = await db.select().from(sessions).where(eq(sessions.id, id));
  return rows[0] ?? null;
}

describe("sessions", () => {
  it("stores only the SHA-256 of a >=120-bit token", async () => {
    const shop = await createShopWithMembers("session-hash");
    const { token, sessionId } = await createSessionFor(shop.actors.owner.userId, { activeShopId: shop.shopId });
    expect(token).toMatch(/^[0-9a-f]{40}$/); // 160 bits
    expect(sessionId).toBe(hashToken(token));
    expect(sessionId).not.toContain(token);
    const rows = await db.select().from(sessions).where(eq(sessions.userId, shop.actors.owner.userId));
    expect(rows.map((r) => r.id)).toEqual([hashToken(token)]);
    expect(JSON.stringify(rows)).not.toContain(token);
  });

  it("resolves the actor from the cookie, and nothing without one", async () => {
    const shop = await createShopWithMembers("session-actor");
    await signInAs(shop.actors.lead.userId, shop.shopId);
    expect(await getCurrentActor()).toEqual(shop.actors.lead);
    signOutTestUser();
    expect(await getCurrentActor()).toBeNull();
    putSessionToken("0".repeat(40));
    expect(await getCurrentActor()).toBeNull();
    putSessionToken("not-a-token");
    expect(await getViewer()).toBeNull();
  });

  it("slides the expiry when less than half of the idle window is left", async () => {
    const shop = await createShopWithMembers("session-slide");
    const { token, sessionId } = await createSessionFor(shop.actors.machinist.userId, { activeShopId: shop.shopId });
    const soon = new Date(Date.now() + HOUR);
    await db.update(sessions).set({ expiresAt: soon }).where(eq(sessions.id, sessionId));
    const validated = await validateSessionToken(token);
    expect(validated).not.toBeNull();
    const row = await sessionRow(sessionId);
    expect(row!.expiresAt.getTime()).toBeGreaterThan(Date.now() + SESSION_IDLE_TIMEOUT_MS - 60_000);
  });

  it("ends a session that has been idle past its expiry", async () => {
    const shop = await createShopWithMembers("session-idle");
    const { token, sessionId } = await createSessionFor(shop.actors.machinist.userId, { activeShopId: shop.shopId });
    await db.update(sessions).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(sessions.id, sessionId));
    expect(await validateSessionToken(token)).toBeNull();
    expect(await sessionRow(sessionId)).toBeNull();
  });

  it("holds the absolute cap even for an active session", async () => {
    const shop = await createShopWithMembers("session-cap");
    const { token, sessionId } = await createSessionFor(shop.actors.apprentice.userId, { activeShopId: shop.shopId });
    const longAgo = new Date(Date.now() - SESSION_ABSOLUTE_LIFETIME_MS - 1000);
    await db.update(sessions).set({ signedInAt: longAgo }).where(eq(sessions.id, sessionId));
    expect(await validateSessionToken(token)).toBeNull();
    expect(await sessionRow(sessionId)).toBeNull();
  });

  it("ends other sessions but keeps this one", async () => {
    const shop = await createShopWithMembers("session-others");
    const userId = shop.actors.owner.userId;
    const a = await createSessionFor(userId, { activeShopId: shop.shopId });
    const b = await createSessionFor(userId, { activeShopId: shop.shopId });
    await endOtherSessions(userId, a.sessionId);
    expect(await validateSessionToken(a.token)).not.toBeNull();
    expect(await validateSessionToken(b.token)).toBeNull();
  });
});
