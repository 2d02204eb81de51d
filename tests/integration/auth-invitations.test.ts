import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";

// This file runs its own mail catcher on private ports, so it never meets a developer's catcher.
const ports = vi.hoisted(() => {
  const smtp = 26000 + Math.floor(Math.random() * 2000);
  process.env.SMTP_PORT = String(smtp);
  process.env.MAIL_CATCHER_HTTP_PORT = String(smtp + 2000);
  return { smtp, http: smtp + 2000 };
});

import { db } from "@/server/db";
import { emailOutbox, invitations, memberships, passwordResetTokens, sessions, users } from "@/server/db/schema";
import { createInvitation } from "@/server/auth/invitations";
import { changeMemberRole, removeMember } from "@/server/auth/members";
import { hashPassword } from "@/server/auth/password";
import { createSessionFor, validateSessionToken } from "@/server/auth/session";
import { hashToken } from "@/server/auth/tokens";
import { drainDueMail, sendOutboxRow, retryDelayMs } from "@/server/mail/outbox";
import { acceptInvitationAction, requestResetAction, resetPasswordAction } from "@/app/(auth)/actions";
import { startMailCatcher } from "../../scripts/mail-catcher";
import { createShopWithMembers } from "../support/fixtures";
import { callAction, currentSessionToken, setClientIp, uniqueTestIp, signOutTestUser } from "../support/session";
import { getCurrentActor } from "@/server/auth/current";

const catcher = startMailCatcher({ smtpPort: ports.smtp, httpPort: ports.http, quiet: true });
beforeAll(() => catcher.ready);
afterAll(() => catcher.close());

const GOOD_PASSWORD = "stones dressed before every job";

async function waitForMail(to: string) {
  for (let i = 0; i < 50; i++) {
    const found = catcher.messages.find((m) => m.to.includes(to));
    if (found) return found;
    await drainDueMail();
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail for ${to}`);
}

const tokenFrom = (text: string, path: string) => new RegExp(`${path}/([0-9a-f]{40})`).exec(text)?.[1] ?? "";

describe("invitations", () => {
  it("mails a single-use link (stored hashed) that creates the account and joins with the role", async () => {
    const shop = await createShopWithMembers("invite");
    const email = `new-${randomUUID().slice(0, 8)}@example.test`;
    const { invitationId } = await createInvitation(shop.actors.owner, { email, role: "machinist" });
    const mail = await waitForMail(email);
    expect(mail.subject).toContain("Join");
    expect(mail.html).toContain("/invite/");
    const token = tokenFrom(mail.text, "/invite");
    const [row] = await db.select().from(invitations).where(eq(invitations.id, invitationId));
    expect(row!.tokenHash).toBe(hashToken(token));
    expect(JSON.stringify(row)).not.toContain(token);
    const [outbox] = await db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, email));
    expect(outbox).toMatchObject({ status: "sent", html: "", text: "" }); // bodies with the link are not kept

    signOutTestUser();
    await expect(callAction(acceptInvitationAction, { mode: "new", token, name: "New Machinist", password: GOOD_PASSWORD })).rejects.toMatchObject({ digest: expect.stringContaining("NEXT_REDIRECT") });
    expect(await getCurrentActor()).toMatchObject({ shopId: shop.shopId, role: "machinist" });

    signOutTestUser();
    const again = await callAction(acceptInvitationAction, { mode: "new", token, name: "Second Try", password: GOOD_PASSWORD });
    expect(again).toMatchObject({ ok: false, message: expect.stringContaining("expired, was already used") });
  });

  it("an existing account joins a second shop with its password; an expired link is refused", async () => {
    const first = await createShopWithMembers("invite-first");
    const second = await createShopWithMembers("invite-second");
    const email = first.emails.lead;
    await db.update(users).set({ passwordHash: await hashPassword(GOOD_PASSWORD) }).where(eq(users.email, email));
    await createInvitation(second.actors.owner, { email, role: "apprentice" });
    const token = tokenFrom((await waitForMail(email)).text, "/invite");
    signOutTestUser();
    setClientIp(uniqueTestIp());
    await expect(callAction(acceptInvitationAction, { mode: "existing", token, password: GOOD_PASSWORD })).rejects.toMatchObject({ digest: expect.stringContaining("NEXT_REDIRECT") });
    const rows = await db.select().from(memberships).where(eq(memberships.userId, first.actors.lead.userId));
    expect(rows.map((r) => r.role).sort()).toEqual(["apprentice", "lead"]);

    const late = `late-${randomUUID().slice(0, 8)}@example.test`;
    const { invitationId } = await createInvitation(second.actors.owner, { email: late, role: "machinist" });
    const lateToken = tokenFrom((await waitForMail(late)).text, "/invite");
    await db.update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.id, invitationId));
    signOutTestUser();
    const refused = await callAction(acceptInvitationAction, { mode: "new", token: lateToken, name: "Late", password: GOOD_PASSWORD });
    expect(refused).toMatchObject({ ok: false });
    expect(await db.select().from(users).where(eq(users.email, late))).toHaveLength(0);
  });
});

describe("members", () => {
  it("never removes or demotes the last owner", async () => {
    const shop = await createShopWithMembers("last-owner");
    const [own] = await db.select().from(memberships).where(eq(memberships.userId, shop.actors.owner.userId));
    await expect(changeMemberRole(shop.actors.owner, { membershipId: own!.id, role: "lead" })).rejects.toMatchObject({ code: "conflict" });
    await expect(removeMember(shop.actors.owner, { membershipId: own!.id })).rejects.toMatchObject({ code: "conflict" });
    const [lead] = await db.select().from(memberships).where(eq(memberships.userId, shop.actors.lead.userId));
    await changeMemberRole(shop.actors.owner, { membershipId: lead!.id, role: "owner" });
    await removeMember(shop.actors.owner, { membershipId: own!.id });
    expect(await db.select().from(memberships).where(eq(memberships.id, own!.id))).toHaveLength(0);
  });
});

describe("password reset", () => {
  it("mails a one-time link; using it sets the password and ends every session", async () => {
    const shop = await createShopWithMembers("reset");
    const email = shop.emails.machinist;
    const userId = shop.actors.machinist.userId;
    const session = await createSessionFor(userId, { activeShopId: shop.shopId });
    signOutTestUser();
    setClientIp(uniqueTestIp());
    expect(await callAction(requestResetAction, { email })).toMatchObject({ ok: true });
    const unknown = await callAction(requestResetAction, { email: `nobody-${randomUUID()}@example.test` });
    expect(unknown).toMatchObject({ ok: true }); // same answer: no account discovery
    const token = tokenFrom((await waitForMail(email)).text, "/reset");
    const [stored] = await db.select().from(passwordResetTokens).where(eq(passwordResetTokens.userId, userId));
    expect(stored!.tokenHash).toBe(hashToken(token));

    const weak = await callAction(resetPasswordAction, { token, password: "short" });
    expect(weak).toMatchObject({ ok: false, fieldErrors: { password: expect.any(Array) } });
    await expect(callAction(resetPasswordAction, { token, password: GOOD_PASSWORD })).rejects.toMatchObject({ digest: expect.stringContaining("/sign-in") });
    expect(await validateSessionToken(session.token)).toBeNull();
    expect(await db.select().from(sessions).where(eq(sessions.userId, userId))).toHaveLength(0);
    const reused = await callAction(resetPasswordAction, { token, password: "another good long phrase" });
    expect(reused).toMatchObject({ ok: false, message: expect.stringContaining("expired or was already used") });
    expect(currentSessionToken()).toBeUndefined();
  });

  it("limits reset requests per account", async () => {
    signOutTestUser();
    setClientIp(uniqueTestIp());
    const email = `flood-${randomUUID().slice(0, 8)}@example.test`;
    for (let i = 0; i < 5; i++) expect(await callAction(requestResetAction, { email })).toMatchObject({ ok: true });
    expect(await callAction(requestResetAction, { email })).toMatchObject({ ok: false, message: expect.stringContaining("Too many reset requests") });
  });
});

describe("outbox", () => {
  it("keeps a mail that fails and retries it later with backoff", async () => {
    const { enqueueMail } = await import("@/server/mail/outbox");
    const to = `retry-${randomUUID().slice(0, 8)}@example.test`;
    const id = await enqueueMail(db, { to, subject: "Retry test", html: "<p>x</p>", text: "x", kind: "test" });
    await catcher.close();
    expect(await sendOutboxRow(id)).toBe("retry");
    const [failed] = await db.select().from(emailOutbox).where(eq(emailOutbox.id, id));
    expect(failed).toMatchObject({ status: "pending", attempts: 1 });
    expect(failed!.nextAttemptAt.getTime()).toBeGreaterThan(Date.now() + retryDelayMs(1) - 5000);
    const restarted = startMailCatcher({ smtpPort: ports.smtp, httpPort: ports.http, quiet: true });
    await restarted.ready;
    await drainDueMail(50, new Date(Date.now() + retryDelayMs(1) + 1000));
    expect(restarted.messages.some((m) => m.to.includes(to))).toBe(true);
    const [sent] = await db.select().from(emailOutbox).where(eq(emailOutbox.id, id));
    expect(sent!.status).toBe("sent");
    await restarted.close();
    catcher.ready = restarted.ready; // afterAll closes the first one again, harmlessly
  });
});
