// Issue 15 §5: a real deadlock is retried (bounded, with jitter) and both writers succeed; the lock-wait
// timeout is retried too; anything else is not.
import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import { eq, inArray } from "drizzle-orm";
import { db } from "@/server/db";
import { rateLimitBuckets } from "@/server/db/schema";
import { inTransaction, isRetryableTransactionError, retryDelayMs, TRANSACTION_ATTEMPTS } from "@/server/db/retry";

const now = new Date();

function barrier() {
  let open!: () => void;
  const opened = new Promise<void>((r) => (open = r));
  return { open, opened };
}

describe("transactions under lock conflicts", () => {
  it("retries the deadlock victim and both transactions commit", async () => {
    const [a, b] = [`deadlock-test:${randomUUID()}:a`, `deadlock-test:${randomUUID()}:b`];
    await db.insert(rateLimitBuckets).values([a, b].map((key) => ({ key, windowStartedAt: now, hits: 0, lastHitAt: now })));
    const firstHeldA = barrier();
    const secondHeldB = barrier();
    const retries: string[] = [];
    const lockBoth = (first: string, second: string, iHold: ReturnType<typeof barrier>, otherHolds: ReturnType<typeof barrier>) => {
      let attempt = 0;
      return inTransaction(async (tx) => {
        attempt++;
        await tx.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, first)).for("update");
        if (attempt === 1) {
          iHold.open();
          await otherHolds.opened;
        }
        await tx.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, second)).for("update");
        await tx.update(rateLimitBuckets).set({ hits: 1 }).where(eq(rateLimitBuckets.key, first));
      }, { onRetry: (_n, code) => retries.push(code) });
    };
    await Promise.all([lockBoth(a, b, firstHeldA, secondHeldB), lockBoth(b, a, secondHeldB, firstHeldA)]);
    expect(retries).toEqual(["ER_LOCK_DEADLOCK"]);
    const rows = await db.select().from(rateLimitBuckets).where(inArray(rateLimitBuckets.key, [a, b]));
    expect(rows.map((r) => r.hits)).toEqual([1, 1]);
  });

  it("retries a lock-wait timeout, and gives up after the bound", async () => {
    const key = `lockwait-test:${randomUUID()}`;
    await db.insert(rateLimitBuckets).values({ key, windowStartedAt: now, hits: 0, lastHitAt: now });
    const held = barrier();
    const release = barrier();
    const holder = db.transaction(async (tx) => {
      await tx.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, key)).for("update");
      held.open();
      await release.opened;
    });
    await held.opened;
    let attempts = 0;
    const waiter = inTransaction(async (tx) => {
      attempts++;
      await tx.execute("SET SESSION innodb_lock_wait_timeout = 1");
      await tx.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, key)).for("update");
    }, { attempts: 2 });
    await expect(waiter).rejects.toSatisfy(isRetryableTransactionError);
    expect(attempts).toBe(2);
    release.open();
    await holder;
  });

  it("does not retry other errors, and keeps its waits short and jittered", async () => {
    let attempts = 0;
    await expect(inTransaction(async () => {
      attempts++;
      throw Object.assign(new Error("duplicate"), { code: "ER_DUP_ENTRY" });
    })).rejects.toThrow("duplicate");
    expect(attempts).toBe(1);
    expect(retryDelayMs(1, () => 0)).toBe(0);
    expect(retryDelayMs(TRANSACTION_ATTEMPTS, () => 0.999)).toBeLessThan(25 * 2 ** TRANSACTION_ATTEMPTS);
  });
});
