// Call server actions and route handlers as a given user in vitest: a REAL session row and token are
// made (the same code path as sign-in), and the token goes into the mocked next/headers cookie jar.
import { createSessionFor } from "@/server/auth/session";
import { SESSION_COOKIE_NAME } from "@/server/auth/cookie";
import type { Actor } from "@/shared/auth/policy";
import { cookieJar, requestHeaders } from "./next-request-mock";
import { CLIENT_ADDRESS_HEADER } from "@/server/http/client-address";

export const TEST_ORIGIN = "http://127.0.0.1:3000";
export type TestSession = { token: string; sessionId: string; cookieHeader: string };

/** Signs `userId` in (active shop `shopId`) for every following call in this test file. */
export async function signInAs(userId: string, shopId: string | null = null): Promise<TestSession> {
  const { token, sessionId } = await createSessionFor(userId, { activeShopId: shopId, userAgent: "vitest" });
  putSessionToken(token);
  return { token, sessionId, cookieHeader: `${SESSION_COOKIE_NAME}=${token}` };
}

/** Acts as this actor (user + shop) from now on. */
export function asUser(actor: Actor): Promise<TestSession> {
  return signInAs(actor.userId, actor.shopId);
}

/** Puts a raw token into the cookie jar (e.g. a stale or forged one). */
export function putSessionToken(token: string): void {
  cookieJar.set(SESSION_COOKIE_NAME, { name: SESSION_COOKIE_NAME, value: token, options: {} });
}

/** A signed-out visitor: no session cookie. */
export function signOutTestUser(): void {
  cookieJar.clear();
}

/** The cookie the code under test set last (e.g. after a sign-in action), if any. */
export function currentSessionToken(): string | undefined {
  return cookieJar.get(SESSION_COOKIE_NAME)?.value;
}

/** Sets the client IP the server sees (rate limits are keyed by it). */
/** A documentation-range IPv6 address no earlier run has used, so per-IP limits start at zero. */
export function uniqueTestIp(): string {
  const hex = () => Math.floor(Math.random() * 0x10000).toString(16);
  return `2001:db8:${hex()}:${hex()}::${hex()}`;
}

export function setClientIp(ip: string): void {
  requestHeaders.set(CLIENT_ADDRESS_HEADER, ip);
}

/** A request to a route handler from our own origin (or `origin`), carrying the jar's cookie. */
export function makeRequest(path: string, init: { method?: string; body?: unknown; origin?: string | null } = {}): Request {
  const headers = new Headers({ host: new URL(TEST_ORIGIN).host, "content-type": "application/json" });
  const origin = init.origin === undefined ? TEST_ORIGIN : init.origin;
  if (origin) headers.set("origin", origin);
  const cookie = [...cookieJar.values()].map((c) => `${c.name}=${c.value}`).join("; ");
  if (cookie) headers.set("cookie", cookie);
  const body = init.body === undefined ? undefined : typeof init.body === "string" ? init.body : JSON.stringify(init.body);
  return new Request(new URL(path, TEST_ORIGIN), { method: init.method ?? "GET", headers, body });
}

/** Runs a `defineAction` action with a plain object as its form data. */
export async function callAction<R>(
  action: (prev: null, formData: FormData) => Promise<R>,
  fields: Record<string, string | number | boolean | Array<string | number>> = {},
): Promise<R> {
  const formData = new FormData();
  for (const [key, value] of Object.entries(fields)) {
    for (const v of Array.isArray(value) ? value : [value]) formData.append(key, String(v));
  }
  return action(null, formData);
}
