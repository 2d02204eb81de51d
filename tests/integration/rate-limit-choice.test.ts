// Why the limiter stays hand-written (DEVELOPERS.md "Rate limits"): the properties a packaged
// MySQL-store limiter was measured without, held by ours.
import { describe, expect, it } from "vitest";
import { createHash, randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { rateLimitBuckets } from "@/server/db/schema";
import { takeAttempt, type Limit } from "@/server/auth/rate-limit";

const HOUR_MS = 60 * 60 * 1000;
const hitsOf = async (limit: Limit, subject: string) => {
  const key = `${limit.name}:${createHash("sha256").update(subject).digest("hex").slice(0, 40)}`;
  const [bucket] = await db.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, key));
  return bucket?.hits ?? 0;
};
const codeOf = (r: PromiseSettledResult<unknown>) => (r.status === "rejected" ? (r.reason as { code?: string }).code : "ok");

describe("the limiter's choice", () => {
  it("counts a parallel burst one by one and does not count the refused attempts", async () => {
    const limit: Limit = { name: `burst-${randomUUID()}`, max: 5, windowMs: HOUR_MS };
    const results = await Promise.allSettled(Array.from({ length: 20 }, () => takeAttempt([[limit, "client"]], "Too many.")));
    expect(results.map(codeOf).filter((c) => c === "ok")).toHaveLength(5);
    expect(results.map(codeOf).filter((c) => c === "rate_limited")).toHaveLength(15);
    expect(await hitsOf(limit, "client")).toBe(5);
  });

  it("an attempt one limit refuses is counted by none of the others (a stranger cannot fill the account's ceiling)", async () => {
    const account: Limit = { name: `account-${randomUUID()}`, max: 1000, windowMs: HOUR_MS };
    const client: Limit = { name: `client-${randomUUID()}`, max: 1, windowMs: HOUR_MS };
    await takeAttempt([[account, "someone@example.test"], [client, "198.51.100.7"]], "Too many.");
    for (let i = 0; i < 5; i++) {
      await expect(takeAttempt([[account, "someone@example.test"], [client, "198.51.100.7"]], "Too many.")).rejects.toMatchObject({ code: "rate_limited" });
    }
    expect(await hitsOf(account, "someone@example.test")).toBe(1);
  });

  it("makes a quick run of hits wait once the delay starts, within the window's maximum", async () => {
    const limit: Limit = { name: `delay-${randomUUID()}`, max: 100, windowMs: HOUR_MS, delayAfter: 5, maxDelayMs: 5 * 60 * 1000 };
    const now = new Date();
    for (let i = 0; i < 5; i++) await takeAttempt([[limit, "account"]], "Too many.", now);
    await expect(takeAttempt([[limit, "account"]], "Too many.", now)).rejects.toMatchObject({ code: "rate_limited", retryAfterSeconds: 1 });
    await expect(takeAttempt([[limit, "account"]], "Too many.", new Date(now.getTime() + 1000))).resolves.toBeUndefined();
  });
});
