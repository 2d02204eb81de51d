import { describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { takeAttempt, type Limit } from "@/server/auth/rate-limit";

// Two requests at once: each takes its clock before waiting for the bucket's row lock, so the second
// can find a hit stamped after its own clock. Seen as a spurious 429 on a retried CSV commit.
describe("rate limits under concurrent requests", () => {
  it("lets an attempt through whose clock is earlier than a hit already counted, when no delay is due", async () => {
    const limit: Limit = { name: `clock-${randomUUID()}`, max: 10, windowMs: 60 * 60 * 1000 };
    const t = new Date();
    await takeAttempt([[limit, "shop"]], "Too many.", t);
    await expect(takeAttempt([[limit, "shop"]], "Too many.", new Date(t.getTime() - 1500))).resolves.toBeUndefined();
  });

  it("still refuses past the window's maximum, and still delays where the limit asks for a delay", async () => {
    const capped: Limit = { name: `cap-${randomUUID()}`, max: 2, windowMs: 60 * 60 * 1000 };
    for (let i = 0; i < 2; i++) await takeAttempt([[capped, "shop"]], "Too many.");
    await expect(takeAttempt([[capped, "shop"]], "Too many.")).rejects.toMatchObject({ code: "rate_limited" });
    const delayed: Limit = { name: `delay-${randomUUID()}`, max: 10, windowMs: 60 * 60 * 1000, delayAfter: 1 };
    await takeAttempt([[delayed, "shop"]], "Too many.");
    await expect(takeAttempt([[delayed, "shop"]], "Too many.")).rejects.toMatchObject({ code: "rate_limited" });
  });
});
