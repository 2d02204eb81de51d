// Issue 15 §2: redirect after sign-in, tokens before hashing, sign-in limits a stranger cannot use to
// lock someone out, a confirmed owner before invitations, customer contact hidden from apprentices.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";

const ports = vi.hoisted(() => {
  const smtp = 30000 + Math.floor(Math.random() * 2000);
  process.env.SMTP_PORT = String(smtp);
  process.env.MAIL_CATCHER_HTTP_PORT = String(smtp + 2000);
  return { smtp, http: smtp + 2000 };
});

import { db } from "@/server/db";
import { users } from "@/server/db/schema";
import { createInvitation } from "@/server/auth/invitations";
import { hashPassword, passwordWorkStarted } from "@/server/auth/password";
import { verifySignIn } from "@/server/auth/accounts";
import { resetPassword } from "@/server/auth/password-reset";
import { acceptInvitationAsNewUser } from "@/server/auth/invitations";
import { createCustomer } from "@/server/customers/mutations";
import { getCustomer, listCustomers } from "@/server/customers/queries";
import { drainDueMail } from "@/server/mail/outbox";
import { confirmEmailAction, signInAction, signUpAction } from "@/app/(auth)/actions";
import { getCurrentActor } from "@/server/auth/current";
import { startMailCatcher } from "../../scripts/mail-catcher";
import { createShopWithMembers } from "../support/fixtures";
import { callAction, setClientIp, signOutTestUser, uniqueTestIp } from "../support/session";

const catcher = startMailCatcher({ smtpPort: ports.smtp, httpPort: ports.http, quiet: true });
beforeAll(() => catcher.ready);
afterAll(() => catcher.close());

const GOOD_PASSWORD = "stones dressed before every job";
const tag = () => randomUUID().slice(0, 8);

async function waitForMail(to: string) {
  for (let i = 0; i < 50; i++) {
    const found = catcher.messages.find((m) => m.to.includes(to));
    if (found) return found;
    await drainDueMail();
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail for ${to}`);
}

async function redirectOf(run: Promise<unknown>): Promise<string> {
  try {
    await run;
  } catch (error) {
    const digest = (error as { digest?: string }).digest ?? "";
    if (digest.startsWith("NEXT_REDIRECT")) return digest.split(";")[2]!;
    throw error;
  }
  throw new Error("no redirect");
}

describe("sign-in redirect", () => {
  it("sends the tab trick to the app, a real path to itself", async () => {
    signOutTestUser();
    setClientIp(uniqueTestIp());
    const email = `next-${tag()}@example.test`;
    await db.insert(users).values({ id: randomUUID(), email, name: "Next", passwordHash: await hashPassword(GOOD_PASSWORD) });
    expect(await redirectOf(callAction(signInAction, { email, password: GOOD_PASSWORD, next: "/\t/evil.example" }))).toBe("/");
    expect(await redirectOf(callAction(signInAction, { email, password: GOOD_PASSWORD, next: "/jobs?status=open" }))).toBe("/jobs?status=open");
  });
});

describe("sign-in limits", () => {
  it("a stranger's failures do not delay the account's owner on another client", async () => {
    const email = `victim-${tag()}@example.test`;
    await db.insert(users).values({ id: randomUUID(), email, name: "Victim", passwordHash: await hashPassword(GOOD_PASSWORD) });
    const stranger = uniqueTestIp();
    const results = await Promise.allSettled(Array.from({ length: 10 }, (_, i) => verifySignIn(email, `stranger guess ${i}`, stranger)));
    expect(results.some((r) => r.status === "rejected" && (r.reason as { code?: string }).code === "rate_limited")).toBe(true);
    await expect(verifySignIn(email, GOOD_PASSWORD, uniqueTestIp())).resolves.toMatchObject({ shopId: null });
  });
});

describe("tokens before hashing", () => {
  it("a dead reset or invitation link is refused without any password hashing", async () => {
    const ip = uniqueTestIp();
    const before = passwordWorkStarted();
    await expect(resetPassword("0".repeat(40), "a long enough new passphrase", ip)).rejects.toMatchObject({ code: "not_found" });
    await expect(acceptInvitationAsNewUser("1".repeat(40), { name: "X", password: "a long enough new passphrase" }, ip)).rejects.toMatchObject({ code: "not_found" });
    expect(passwordWorkStarted()).toBe(before);
  });

  it("throttles reset-link attempts per client", async () => {
    const ip = uniqueTestIp();
    for (let i = 0; i < 30; i++) await expect(resetPassword("2".repeat(40), "a long enough new passphrase", ip)).rejects.toMatchObject({ code: "not_found" });
    await expect(resetPassword("2".repeat(40), "a long enough new passphrase", ip)).rejects.toMatchObject({ code: "rate_limited" });
  });
});

describe("a new owner confirms their address before the shop mails outsiders", () => {
  it("refuses invitations until the mailed link is used", async () => {
    signOutTestUser();
    setClientIp(uniqueTestIp());
    const email = `owner-${tag()}@example.test`;
    await redirectOf(callAction(signUpAction, { shopName: `Confirm shop ${tag()}`, name: "New owner", email, password: GOOD_PASSWORD }));
    const actor = (await getCurrentActor())!;
    await expect(createInvitation(actor, { email: `friend-${tag()}@example.test`, role: "machinist" })).rejects.toMatchObject({ code: "forbidden" });
    const mail = await waitForMail(email);
    const token = /\/confirm\/([0-9a-f]{40})/.exec(mail.text ?? "")?.[1];
    expect(token).toBeTruthy();
    expect(await callAction(confirmEmailAction, { token: token! })).toMatchObject({ ok: true });
    expect(await callAction(confirmEmailAction, { token: token! })).toMatchObject({ ok: false });
    await expect(createInvitation(actor, { email: `friend-${tag()}@example.test`, role: "machinist" })).resolves.toMatchObject({ invitationId: expect.any(String) });
  });
});

describe("customer contact details", () => {
  it("an apprentice sees the customer's name, not how to reach them", async () => {
    const shop = await createShopWithMembers("contact");
    const { id } = await createCustomer({ actor: shop.actors.machinist, input: { name: "Demo customer (invented)", email: "demo-customer@example.test", phone: "555 0100", notes: "gate code 1234" } });
    const seen = await getCustomer({ actor: shop.actors.apprentice, customerId: id });
    expect(seen).toMatchObject({ name: "Demo customer (invented)", email: null, phone: null, notes: null });
    expect((await listCustomers({ actor: shop.actors.apprentice, query: { q: "555" } })).total).toBe(0);
    expect(await getCustomer({ actor: shop.actors.machinist, customerId: id })).toMatchObject({ email: "demo-customer@example.test", phone: "555 0100" });
    const [row] = await db.select().from(users).where(eq(users.id, shop.actors.apprentice.userId));
    expect(row).toBeTruthy();
  });
});
