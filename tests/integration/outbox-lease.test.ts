// Issue 15 §4/§6: under a slow SMTP server the outbox sends each mail once (claims stamped at claim
// time, with a lease longer than the SMTP timeouts), and a sent or failed row keeps no body.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { randomUUID } from "node:crypto";
import { eq, inArray } from "drizzle-orm";

const ports = vi.hoisted(() => {
  const smtp = 34000 + Math.floor(Math.random() * 2000);
  process.env.SMTP_PORT = String(smtp);
  process.env.MAIL_CATCHER_HTTP_PORT = String(smtp + 2000);
  return { smtp, http: smtp + 2000 };
});

import { db } from "@/server/db";
import { emailOutbox } from "@/server/db/schema";
import { CLAIM_MS, OUTBOX_MAX_ATTEMPTS, drainDueMail, enqueueMail, sendOutboxRow } from "@/server/mail/outbox";
import { SMTP_WORST_CASE_MS } from "@/server/mail/transport";
import { startMailCatcher } from "../../scripts/mail-catcher";

const catcher = startMailCatcher({ smtpPort: ports.smtp, httpPort: ports.http, quiet: true, delayMs: 400 });
beforeAll(() => catcher.ready);
afterAll(() => catcher.close());

describe("outbox under a slow SMTP server", () => {
  it("holds a claim longer than a send can take", () => {
    expect(CLAIM_MS).toBeGreaterThan(SMTP_WORST_CASE_MS);
  });

  it("sends each mail once when a drain that started long ago overlaps a fresh one", async () => {
    // Due far in the past, so only these rows are due for the old drain and come first for the new one.
    const dueAt = new Date(Date.UTC(2001, 0, 1) + Math.floor(Math.random() * 1e9));
    const tag = randomUUID().slice(0, 8);
    const addresses = [1, 2, 3].map((n) => `slow-${n}-${tag}@example.test`);
    const ids: string[] = [];
    for (const to of addresses) ids.push(await enqueueMail(db, { to, kind: "test", subject: "Slow server", html: "<p>link</p>", text: "link" }));
    await db.update(emailOutbox).set({ nextAttemptAt: dueAt }).where(inArray(emailOutbox.id, ids));
    // The old drain's clock reads the moment it started; the new one reads now.
    const staleNow = new Date(dueAt.getTime() + 1000);
    await Promise.all([drainDueMail(3, staleNow), new Promise((r) => setTimeout(r, 50)).then(() => drainDueMail(3))]);
    for (const to of addresses) expect(catcher.messages.filter((m) => m.to.includes(to)), to).toHaveLength(1);
    const rows = await db.select().from(emailOutbox).where(inArray(emailOutbox.id, ids));
    expect(rows.every((r) => r.status === "sent" && r.html === "" && r.text === "")).toBe(true);
  });

  it("keeps no body once a mail is given up on", async () => {
    const id = await enqueueMail(db, { to: `never-${randomUUID().slice(0, 8)}@example.test`, kind: "test", subject: "Gives up", html: "<p>secret link</p>", text: "secret link" });
    await db.update(emailOutbox).set({ attempts: OUTBOX_MAX_ATTEMPTS - 1, toAddress: "not an address" }).where(eq(emailOutbox.id, id));
    expect(await sendOutboxRow(id)).toBe("failed");
    const [row] = await db.select().from(emailOutbox).where(eq(emailOutbox.id, id));
    expect(row).toMatchObject({ status: "failed", html: "", text: "" });
    expect(row!.lastError).not.toContain("not an address");
  });
});
