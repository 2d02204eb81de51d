import "server-only";
import { cache } from "react";
import { cookies, headers } from "next/headers";
import { Lucia, TimeSpan } from "lucia";
import { DrizzleMySQLAdapter } from "@lucia-auth/adapter-drizzle";
import { and, eq, like, lt, ne, sql } from "drizzle-orm";
import { cookieSecure } from "@/env";
import { db } from "@/server/db";
import { memberships, planningVersions, sessions, shops, users } from "@/server/db/schema";
import type { Role } from "@/shared/auth/roles";
import type { UnitSystem } from "@/shared/units";
import { hashToken, isWellFormedToken, newToken } from "./tokens";
import { SESSION_COOKIE_NAME } from "./cookie";

// Session lifetimes (README "Sessions"; ASVS 5.0 V7.1.1/V7.3.1/V7.3.2, web-anchors A1). A shop tablet
// left overnight asks for the password again next morning; an active session slides, but nobody
// stays signed in for more than a week without typing the password again.
/** Idle timeout: the session ends after this long without a request (sliding expiry). */
export const SESSION_IDLE_TIMEOUT_MS = 12 * 60 * 60 * 1000;
/** Lucia extends the expiry when less than half of the idle window is left (so at most every 6 h). */
export const SESSION_REFRESH_WHEN_REMAINING_MS = SESSION_IDLE_TIMEOUT_MS / 2;
/** Absolute cap from sign-in, however active the session was. */
export const SESSION_ABSOLUTE_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

const adapter = new DrizzleMySQLAdapter(db as never, sessions as never, users as never);

// Lucia is used only in this module (issue 4). Its cookie helpers are not used: the cookie is written
// below with our own name and an expiry at the absolute cap; the database decides idle expiry.
const lucia = new Lucia(adapter, {
  sessionExpiresIn: new TimeSpan(SESSION_IDLE_TIMEOUT_MS / 1000, "s"),
  sessionCookie: { name: SESSION_COOKIE_NAME, attributes: { secure: cookieSecure, sameSite: "lax" } },
  getSessionAttributes: (row) => ({ signedInAt: row.signedInAt, activeShopId: row.activeShopId, userAgent: row.userAgent }),
  getUserAttributes: (row) => ({ email: row.email, name: row.name, unitSystem: row.unitSystem }),
});

declare module "lucia" {
  interface Register {
    Lucia: typeof lucia;
    DatabaseSessionAttributes: { signedInAt: Date; activeShopId: string | null; userAgent: string };
    DatabaseUserAttributes: { email: string; name: string; unitSystem: UnitSystem };
  }
}

export type SessionInfo = { id: string; userId: string; expiresAt: Date; signedInAt: Date; activeShopId: string | null };
export type SessionUser = { id: string; email: string; name: string; unitSystem: UnitSystem };
/**
 * `activeRole`: the user's role in the session's active shop, or null when that membership is gone.
 * `activePlanningVersion`: that shop's planning counter (0 before its first write, null without the
 * membership), read in the same query so the plan preview needs no second round trip for it.
 */
export type CurrentSession = { session: SessionInfo; user: SessionUser; activeRole: Role | null; activePlanningVersion: number | null };

const absoluteEnd = (signedInAt: Date) => new Date(signedInAt.getTime() + SESSION_ABSOLUTE_LIFETIME_MS);

// Session, user, the membership in the active shop and that shop's planning counter in ONE round trip,
// the SQL built once: every signed-in request runs this, so it replaces lucia.validateSession (same
// rules, below), a separate membership query and the preview's counter query (one primary-key join).
const sessionLookup = db
  .select({
    id: sessions.id, userId: sessions.userId, expiresAt: sessions.expiresAt, signedInAt: sessions.signedInAt, activeShopId: sessions.activeShopId,
    email: users.email, name: users.name, unitSystem: users.unitSystem, role: memberships.role, shopId: shops.id,
    planningVersion: planningVersions.version,
  })
  .from(sessions)
  .innerJoin(users, eq(users.id, sessions.userId))
  .leftJoin(memberships, and(eq(memberships.userId, sessions.userId), eq(memberships.shopId, sessions.activeShopId)))
  .leftJoin(shops, eq(shops.id, memberships.shopId))
  .leftJoin(planningVersions, eq(planningVersions.shopId, shops.id))
  .where(eq(sessions.id, sql.placeholder("id")))
  .limit(1)
  .prepare();

/**
 * Validates a cookie token: unknown, idle-expired or past the absolute cap → null (and the row goes).
 * Lucia's rules: expired when now ≥ expiresAt; the expiry slides to now + idle timeout once less than
 * half of the idle window is left.
 */
export async function validateSessionToken(token: string, now = new Date()): Promise<CurrentSession | null> {
  if (!isWellFormedToken(token)) return null;
  const [row] = await sessionLookup.execute({ id: hashToken(token) });
  if (!row) return null;
  if (row.expiresAt.getTime() <= now.getTime() || absoluteEnd(row.signedInAt) <= now) {
    await lucia.invalidateSession(row.id);
    return null;
  }
  let expiresAt = row.expiresAt;
  if (expiresAt.getTime() - SESSION_REFRESH_WHEN_REMAINING_MS <= now.getTime()) {
    expiresAt = new Date(now.getTime() + SESSION_IDLE_TIMEOUT_MS);
    await db.update(sessions).set({ expiresAt }).where(eq(sessions.id, row.id));
  }
  return {
    session: { id: row.id, userId: row.userId, expiresAt, signedInAt: row.signedInAt, activeShopId: row.activeShopId },
    user: { id: row.userId, email: row.email, name: row.name, unitSystem: row.unitSystem },
    activeRole: row.shopId !== null ? row.role : null,
    activePlanningVersion: row.shopId !== null ? Number(row.planningVersion ?? 0) : null,
  };
}

/** Creates a session row for the user; returns the token (for the cookie) and never stores it. */
export async function createSessionFor(userId: string, options: { activeShopId: string | null; userAgent?: string }) {
  const token = newToken();
  const signedInAt = new Date();
  const session = await lucia.createSession(
    userId,
    { signedInAt, activeShopId: options.activeShopId, userAgent: (options.userAgent ?? "").slice(0, 200) },
    { sessionId: hashToken(token) },
  );
  return { token, sessionId: session.id, cookieExpiresAt: absoluteEnd(signedInAt) };
}

/** The session of this request, read once per request. */
export const getCurrentSession = cache(async (): Promise<CurrentSession | null> => {
  const token = (await cookies()).get(SESSION_COOKIE_NAME)?.value;
  return token ? validateSessionToken(token) : null;
});

/** Signs the user in from a server action or route handler: a new token every time (no fixation). */
export async function startSession(userId: string, activeShopId: string | null): Promise<void> {
  const previous = await getCurrentSession();
  if (previous) await lucia.invalidateSession(previous.session.id);
  const userAgent = (await headers()).get("user-agent") ?? "";
  const { token, cookieExpiresAt } = await createSessionFor(userId, { activeShopId, userAgent });
  (await cookies()).set(SESSION_COOKIE_NAME, token, { ...SESSION_COOKIE_FLAGS, expires: cookieExpiresAt });
}

// One set of flags for writing and for clearing: a browser drops a `__Host-` cookie only when the
// clearing Set-Cookie is Secure with Path=/ too (RFC 6265bis cookie prefixes).
export const SESSION_COOKIE_FLAGS = { httpOnly: true, sameSite: "lax" as const, secure: cookieSecure, path: "/" };

/** Ends this browser's session on the server and clears the cookie. */
export async function endCurrentSession(): Promise<void> {
  const current = await getCurrentSession();
  if (current) await lucia.invalidateSession(current.session.id);
  (await cookies()).set(SESSION_COOKIE_NAME, "", { ...SESSION_COOKIE_FLAGS, expires: new Date(0), maxAge: 0 });
}

export async function endOtherSessions(userId: string, keepSessionId: string | null): Promise<void> {
  if (!keepSessionId) return lucia.invalidateUserSessions(userId);
  await db.delete(sessions).where(and(eq(sessions.userId, userId), ne(sessions.id, keepSessionId)));
}

export async function endAllSessions(userId: string): Promise<void> {
  await lucia.invalidateUserSessions(userId);
}

/** A session is named to its owner by the first 16 hex digits of its id (never the token). */
export const sessionRef = (sessionId: string) => sessionId.slice(0, 16);

export type SessionListItem = { ref: string; signedInAt: Date; expiresAt: Date; userAgent: string; current: boolean };

export async function listSessions(userId: string, currentSessionId: string | null): Promise<SessionListItem[]> {
  const rows = await lucia.getUserSessions(userId);
  const now = new Date();
  return rows
    .filter((s) => absoluteEnd(s.signedInAt) > now)
    .map((s) => ({ ref: sessionRef(s.id), signedInAt: s.signedInAt, expiresAt: s.expiresAt, userAgent: s.userAgent, current: s.id === currentSessionId }))
    .sort((a, b) => b.signedInAt.getTime() - a.signedInAt.getTime());
}

/** Ends one of the user's own sessions by its ref; another user's session is simply not matched. */
export async function endSessionByRef(userId: string, ref: string): Promise<boolean> {
  if (!/^[0-9a-f]{16}$/.test(ref)) return false;
  const [result] = await db.delete(sessions).where(and(eq(sessions.userId, userId), like(sessions.id, `${ref}%`)));
  return result.affectedRows > 0;
}

export async function setActiveShop(sessionId: string, shopId: string): Promise<void> {
  await db.update(sessions).set({ activeShopId: shopId }).where(eq(sessions.id, sessionId));
}

export async function deleteExpiredSessions(): Promise<void> {
  await lucia.deleteExpiredSessions();
  // Past the absolute cap even when the sliding expiry is still ahead.
  await db.delete(sessions).where(lt(sessions.signedInAt, new Date(Date.now() - SESSION_ABSOLUTE_LIFETIME_MS)));
}
