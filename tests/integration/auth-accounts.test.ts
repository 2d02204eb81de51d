import { describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { eq, like } from "drizzle-orm";
import { db } from "@/server/db";
import { memberships, sessions, shops, users } from "@/server/db/schema";
import { signInAction, signUpAction } from "@/app/(auth)/actions";
import { changePasswordAction } from "@/app/(shop)/settings/actions";
import { getCurrentActor } from "@/server/auth/current";
import { hashPassword, ARGON2_OPTIONS } from "@/server/auth/password";
import { validateSessionToken } from "@/server/auth/session";
import { callAction, currentSessionToken, setClientIp, uniqueTestIp, signInAs, signOutTestUser } from "../support/session";

const GOOD_PASSWORD = "gauge ring settles slowly";

async function expectRedirect(promise: Promise<unknown>, to: string) {
  await expect(promise).rejects.toMatchObject({ digest: expect.stringContaining(to) });
}

function tag() {
  return randomUUID().slice(0, 8);
}

describe("sign-up and sign-in", () => {
  it("creates a shop with its owner, hashes with argon2id and signs in", async () => {
    signOutTestUser();
    const email = `Owner-${tag()}@Example.test`;
    await expectRedirect(callAction(signUpAction, { shopName: "Test bench shop", name: "Test Owner", email, password: GOOD_PASSWORD }), "/");
    const [user] = await db.select().from(users).where(eq(users.email, email.toLowerCase()));
    expect(user!.passwordHash).toMatch(new RegExp(`^\\$argon2id\\$v=19\\$m=${ARGON2_OPTIONS.memoryCost},t=2,p=1\\$`));
    const actor = await getCurrentActor();
    expect(actor).toMatchObject({ userId: user!.id, role: "owner" });
    const token = currentSessionToken()!;
    signOutTestUser();
    await expectRedirect(callAction(signInAction, { email, password: GOOD_PASSWORD }), "/");
    expect(currentSessionToken()).not.toBe(token); // a new token at every sign-in
  });

  it("refuses a wrong password with a field error and no session", async () => {
    signOutTestUser();
    const email = `wrong-${tag()}@example.test`;
    await db.insert(users).values({ id: randomUUID(), email, name: "Wrong", passwordHash: await hashPassword(GOOD_PASSWORD) });
    const result = await callAction(signInAction, { email, password: "not the right one at all" });
    expect(result).toMatchObject({ ok: false, fieldErrors: { password: [expect.stringContaining("do not match")] } });
    expect(currentSessionToken()).toBeUndefined();
  });

  const BAD_SIGN_UPS: Array<[string, Record<string, string>, string]> = [
    ["empty fields", { shopName: "", name: "", email: "", password: "" }, "shopName"],
    ["short password", { shopName: "Shop", name: "N", email: "a@b.test", password: "short" }, "password"],
    ["too long password", { shopName: "Shop", name: "N", email: "a@b.test", password: "x".repeat(129) }, "password"],
    ["common password", { shopName: "Shop", name: "N", email: `c-${randomUUID()}@b.test`, password: "password1234" }, "password"],
    ["bad e-mail", { shopName: "Shop", name: "N", email: "not-an-email", password: GOOD_PASSWORD }, "email"],
    ["SQL-looking e-mail", { shopName: "Shop", name: "N", email: "x' OR 1=1; DROP TABLE users; --", password: GOOD_PASSWORD }, "email"],
    ["script in shop name", { shopName: "<script>alert(1)</script>", name: "N", email: "s@b.test", password: GOOD_PASSWORD }, "shopName"],
    ["too long name", { shopName: "Shop", name: "n".repeat(121), email: "l@b.test", password: GOOD_PASSWORD }, "name"],
  ];

  it.each(BAD_SIGN_UPS)("bad input (%s): a clear field error, nothing written", async (_label, fields, field) => {
    signOutTestUser();
    const marker = `bad-${tag()}`;
    const result = await callAction(signUpAction, { ...fields, shopName: fields.shopName === "Shop" ? marker : (fields.shopName ?? "") });
    expect(result).toMatchObject({ ok: false });
    expect((result as { fieldErrors?: Record<string, string[]> }).fieldErrors?.[field]?.[0]).toBeTruthy();
    expect(await db.select().from(shops).where(like(shops.name, `${marker}%`))).toHaveLength(0);
    expect(currentSessionToken()).toBeUndefined();
  });

  it("wrong types in the form (missing fields) are field errors too", async () => {
    signOutTestUser();
    const result = await callAction(signUpAction, {});
    expect(result).toMatchObject({ ok: false, fieldErrors: { email: expect.any(Array), password: expect.any(Array) } });
  });

  it("refuses an e-mail that already has an account, writing no second shop", async () => {
    signOutTestUser();
    const email = `dupe-${tag()}@example.test`;
    await expectRedirect(callAction(signUpAction, { shopName: `Dupe A ${email}`, name: "A", email, password: GOOD_PASSWORD }), "/");
    signOutTestUser();
    const result = await callAction(signUpAction, { shopName: `Dupe B ${email}`, name: "B", email, password: GOOD_PASSWORD });
    expect(result).toMatchObject({ ok: false, fieldErrors: { email: expect.any(Array) } });
    expect(await db.select().from(shops).where(eq(shops.name, `Dupe B ${email}`))).toHaveLength(0);
  });
});

describe("password change", () => {
  it("needs the current password and ends the other sessions", async () => {
    const email = `change-${tag()}@example.test`;
    const userId = randomUUID();
    const shopId = randomUUID();
    await db.insert(shops).values({ id: shopId, name: `Change ${email}` });
    await db.insert(users).values({ id: userId, email, name: "Changer", passwordHash: await hashPassword(GOOD_PASSWORD) });
    await db.insert(memberships).values({ id: randomUUID(), shopId, userId, role: "machinist" });
    const other = await signInAs(userId, shopId);
    const mine = await signInAs(userId, shopId);
    const wrong = await callAction(changePasswordAction, { currentPassword: "nope nope nope nope", newPassword: "a brand new long phrase" });
    expect(wrong).toMatchObject({ ok: false, fieldErrors: { currentPassword: expect.any(Array) } });
    const ok = await callAction(changePasswordAction, { currentPassword: GOOD_PASSWORD, newPassword: "a brand new long phrase" });
    expect(ok).toMatchObject({ ok: true });
    expect(await validateSessionToken(other.token)).toBeNull();
    expect(await validateSessionToken(mine.token)).not.toBeNull();
    expect(await db.select().from(sessions).where(eq(sessions.userId, userId))).toHaveLength(1);
  });
});

describe("sign-in rate limit", () => {
  it("refuses the 101st failed sign-in for one account from one client within the hour", async () => {
    signOutTestUser();
    const ip = uniqueTestIp();
    setClientIp(ip);
    const email = `limit-${tag()}@example.test`;
    await db.insert(users).values({ id: randomUUID(), email, name: "Limited", passwordHash: await hashPassword(GOOD_PASSWORD) });
    const { recordHit, SIGN_IN_PER_ACCOUNT, secondsUntilAllowed, signInSubject } = await import("@/server/auth/rate-limit");
    // 99 failures recorded over the past hour, the last one long enough ago that no delay is owed.
    const start = new Date(Date.now() - 50 * 60 * 1000);
    for (let i = 0; i < 99; i++) await recordHit(SIGN_IN_PER_ACCOUNT, signInSubject(email, ip), start);
    expect(await secondsUntilAllowed(SIGN_IN_PER_ACCOUNT, signInSubject(email, ip))).toBe(0);
    const hundredth = await callAction(signInAction, { email, password: "wrong but allowed to try" });
    expect(hundredth).toMatchObject({ ok: false, fieldErrors: { password: expect.any(Array) } });
    const refused = await callAction(signInAction, { email, password: GOOD_PASSWORD });
    expect(refused).toMatchObject({ ok: false, message: expect.stringContaining("Too many failed sign-ins") });
    expect(currentSessionToken()).toBeUndefined();
  });

  it("grows the delay after a few failures, and the right password is refused during it", async () => {
    signOutTestUser();
    setClientIp(uniqueTestIp());
    const email = `delay-${tag()}@example.test`;
    await db.insert(users).values({ id: randomUUID(), email, name: "Delayed", passwordHash: await hashPassword(GOOD_PASSWORD) });
    for (let i = 0; i < 5; i++) await callAction(signInAction, { email, password: `wrong guess number ${i}` });
    const refused = await callAction(signInAction, { email, password: GOOD_PASSWORD });
    expect(refused).toMatchObject({ ok: false, message: expect.stringContaining("Try again in") });
    const { delayAfterHitsMs, SIGN_IN_PER_ACCOUNT } = await import("@/server/auth/rate-limit");
    expect([5, 6, 7, 20].map((n) => delayAfterHitsMs(SIGN_IN_PER_ACCOUNT, n))).toEqual([1000, 2000, 4000, 300000]);
  });
});

describe("cross-site requests", () => {
  it("a mutating route handler refuses a foreign or missing Origin", async () => {
    const { route } = await import("@/server/http/route");
    const handler = route(async () => Response.json({ ok: true }));
    const { makeRequest } = await import("../support/session");
    const ctx = { params: Promise.resolve({}) };
    expect((await handler(makeRequest("/api/x", { method: "POST", body: {}, origin: "https://evil.example" }), ctx)).status).toBe(403);
    expect((await handler(makeRequest("/api/x", { method: "POST", body: {}, origin: null }), ctx)).status).toBe(403);
    expect((await handler(makeRequest("/api/x", { method: "POST", body: {} }), ctx)).status).toBe(200);
  });
});
