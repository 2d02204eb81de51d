// Review fixes (issue 4): what must hold when requests arrive at the same moment.
import { describe, expect, it } from "vitest";
import { createHash, randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { memberships, rateLimitBuckets, users } from "@/server/db/schema";
import { changePassword, verifySignIn } from "@/server/auth/accounts";
import { changeMemberRole, removeMember } from "@/server/auth/members";
import { hashPassword } from "@/server/auth/password";
import { SIGN_IN_PER_ACCOUNT, SIGN_IN_PER_IP, secondsUntilAllowed, signInSubject } from "@/server/auth/rate-limit";
import { createShopWithMembers } from "../support/fixtures";

const GOOD_PASSWORD = "crosshatch angle checked twice";
const testIp = () => `203.0.113.${Math.floor(Math.random() * 250) + 1}-${randomUUID().slice(0, 6)}`;

async function userWithPassword(label: string) {
  const email = `${label}-${randomUUID().slice(0, 8)}@example.test`;
  const id = randomUUID();
  await db.insert(users).values({ id, email, name: label, passwordHash: await hashPassword(GOOD_PASSWORD) });
  return { id, email };
}

const settle = (promises: Promise<unknown>[]) => Promise.allSettled(promises);
const codeOf = (r: PromiseSettledResult<unknown>) => (r.status === "rejected" ? (r.reason as { code?: string }).code : "ok");

describe("sign-in limit under a burst", () => {
  it("counts each attempt before the password is checked, so a parallel burst cannot skip the growing delay", async () => {
    const { email } = await userWithPassword("burst");
    const ip = testIp();
    const results = await settle(Array.from({ length: 12 }, (_, i) => verifySignIn(email, `wrong guess ${i} in a burst`, ip)));
    const codes = results.map(codeOf);
    // delayAfter = 5: at most five guesses reach the password check, the rest wait (429).
    expect(codes.filter((c) => c === "unauthorized").length).toBeLessThanOrEqual(SIGN_IN_PER_ACCOUNT.delayAfter!);
    expect(codes.filter((c) => c === "rate_limited").length).toBeGreaterThanOrEqual(12 - SIGN_IN_PER_ACCOUNT.delayAfter!);
    expect(codes.every((c) => c === "unauthorized" || c === "rate_limited")).toBe(true);
  });

  it("a successful sign-in clears the account's count and does not count against the IP", async () => {
    const { email } = await userWithPassword("clean");
    const ip = testIp();
    await expect(verifySignIn(email, "not the password at all", ip)).rejects.toMatchObject({ code: "unauthorized" });
    await verifySignIn(email, GOOD_PASSWORD, ip);
    expect(await secondsUntilAllowed(SIGN_IN_PER_ACCOUNT, signInSubject(email, ip))).toBe(0);
    const ipKey = `${SIGN_IN_PER_IP.name}:${createHash("sha256").update(ip.toLowerCase()).digest("hex").slice(0, 40)}`;
    const [ipBucket] = await db.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, ipKey));
    expect(ipBucket?.hits).toBe(1); // the one failure only
  });

  it("changing the password is throttled like a sign-in: guesses of the current password count against the account", async () => {
    const { id, email } = await userWithPassword("change");
    const results = await settle(
      Array.from({ length: 8 }, (_, i) => changePassword({ userId: id, sessionId: "none", currentPassword: `guess ${i} of current`, newPassword: "a brand new long passphrase" })),
    );
    const codes = results.map(codeOf);
    expect(codes.filter((c) => c === "bad_request").length).toBeLessThanOrEqual(SIGN_IN_PER_ACCOUNT.delayAfter!);
    expect(codes).toContain("rate_limited");
    // Each wrong guess was counted against the account (refused ones are not).
    const accountKey = `${SIGN_IN_PER_ACCOUNT.name}:${createHash("sha256").update(signInSubject(email, "session:none")).digest("hex").slice(0, 40)}`;
    const [bucket] = await db.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, accountKey));
    expect(bucket?.hits).toBe(codes.filter((c) => c === "bad_request").length);
  });
});

describe("last owner under a race", () => {
  it("two owners demoting each other at once: one wins, the other is told why, the shop keeps an owner", async () => {
    const shop = await createShopWithMembers("owner-race");
    const ownerRow = async (userId: string) =>
      (await db.select().from(memberships).where(and(eq(memberships.shopId, shop.shopId), eq(memberships.userId, userId))))[0]!;
    const lead = await ownerRow(shop.actors.lead.userId);
    await changeMemberRole(shop.actors.owner, { membershipId: lead.id, role: "owner" });
    const secondOwner = { ...shop.actors.lead, role: "owner" as const };
    const first = await ownerRow(shop.actors.owner.userId);

    for (let round = 0; round < 3; round++) {
      const results = await settle([
        changeMemberRole(shop.actors.owner, { membershipId: lead.id, role: "machinist" }),
        changeMemberRole(secondOwner, { membershipId: first.id, role: "machinist" }),
      ]);
      const codes = results.map(codeOf).sort();
      expect(codes).toEqual(["conflict", "ok"]);
      const owners = await db.select().from(memberships).where(and(eq(memberships.shopId, shop.shopId), eq(memberships.role, "owner")));
      expect(owners).toHaveLength(1);
      // Put both back as owners for the next round (whoever is still owner promotes the other).
      const stillOwner = owners[0]!.userId === shop.actors.owner.userId ? shop.actors.owner : secondOwner;
      const other = stillOwner === shop.actors.owner ? lead : first;
      await changeMemberRole(stillOwner, { membershipId: other.id, role: "owner" });
    }
  });

  it("an owner removing the other while being demoted: never zero owners, never a server error", async () => {
    const shop = await createShopWithMembers("owner-race-remove");
    const [lead] = await db.select().from(memberships).where(and(eq(memberships.shopId, shop.shopId), eq(memberships.userId, shop.actors.lead.userId)));
    const [own] = await db.select().from(memberships).where(and(eq(memberships.shopId, shop.shopId), eq(memberships.userId, shop.actors.owner.userId)));
    await changeMemberRole(shop.actors.owner, { membershipId: lead!.id, role: "owner" });
    const results = await settle([
      removeMember(shop.actors.owner, { membershipId: lead!.id }),
      removeMember({ ...shop.actors.lead, role: "owner" }, { membershipId: own!.id }),
    ]);
    expect(results.map(codeOf).sort()).toEqual(["conflict", "ok"]);
    const owners = await db.select().from(memberships).where(and(eq(memberships.shopId, shop.shopId), eq(memberships.role, "owner")));
    expect(owners).toHaveLength(1);
  });
});
