import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";

// This file runs its own mail catcher on private ports (real SMTP) and reads it through its HTTP API,
// so it never meets a developer's catcher.
const ports = vi.hoisted(() => {
  const smtp = 29000 + Math.floor(Math.random() * 1000);
  process.env.SMTP_PORT = String(smtp);
  process.env.MAIL_CATCHER_HTTP_PORT = String(smtp + 1000);
  return { smtp, http: smtp + 1000 };
});

import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { emailOutbox, jobs, recordLinks, recordVersions } from "@/server/db/schema";
import { hashToken } from "@/server/auth/tokens";
import { drainDueMail } from "@/server/mail/outbox";
import { pdfText } from "@/server/pdf/pdf-text";
import { getRecordView, getVersionPdf, listRecordVersions } from "@/server/records/queries";
import { recordForToken, recordPdfForToken, revokeRecordLink } from "@/server/records/links";
import { sendRecord } from "@/server/records/send";
import { startMailCatcher, type CaughtMessage } from "../../scripts/mail-catcher";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { createFloorPlan } from "./floor-fixtures";
import { createPassedJob, logAllStages } from "./records-fixtures";

const catcher = startMailCatcher({ smtpPort: ports.smtp, httpPort: ports.http, quiet: true });
let shop: TestShop;
let other: TestShop;
beforeAll(async () => {
  await catcher.ready;
  shop = await createShopWithMembers("records");
  other = await createShopWithMembers("records other");
});
afterAll(() => catcher.close());

const address = () => `customer-${randomUUID().slice(0, 8)}@example.test`;

async function caughtFor(to: string, count = 1): Promise<CaughtMessage[]> {
  for (let i = 0; i < 60; i++) {
    await drainDueMail();
    const res = await fetch(`http://127.0.0.1:${ports.http}/messages`);
    const found = ((await res.json()) as CaughtMessage[]).filter((m) => m.to.includes(to));
    if (found.length >= count) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail for ${to}`);
}

const tokenOf = (mail: CaughtMessage) => /\/records\/([0-9a-f]{40})/.exec(mail.text)![1]!;

describe("the machining record", () => {
  it("equals the final readings and the matched pistons, in mm and in inches", async () => {
    const job = await createPassedJob(shop);
    const metric = await getRecordView({ actor: shop.actors.apprentice, jobId: job.job.jobId, unitSystem: "metric" });
    expect(metric.cylinders).toHaveLength(2);
    for (const c of metric.cylinders) {
      const sizing = job.plan.cylinders[c.number - 1]!.plan.sizing!;
      const final = job.finals.find((f) => f.cylinder === c.number)!;
      // No temperatures were given, so the stored readings are the readings as typed.
      expect(c.levels.map((l) => [l.name, l.a.um, l.b.um])).toEqual(final.levels.map((l) => [l.name, l.aUm, l.bUm]));
      expect(c.piston.diameter.um).toBe(sizing.pistonDiameterUm);
      expect(c.clearance.min.um).toBeCloseTo(Math.min(...final.levels.flatMap((l) => [l.aUm, l.bUm])) - sizing.pistonDiameterUm, 6);
      expect(c.clearance.max.um).toBeCloseTo(Math.max(...final.levels.flatMap((l) => [l.aUm, l.bUm])) - sizing.pistonDiameterUm, 6);
      expect(c.levels[0]!.a.text).toMatch(/^\d+\.\d{3} mm$/);
      expect(c.clearance.min.text).toMatch(/ µm$/);
      expect(c.finish).toEqual([{ name: "Ra", text: "0.30 µm" }]);
      expect(c.stones.map((s) => s.stage)).toEqual(job.plan.cylinders[0]!.plan.stages.filter((s) => s.kind !== "bore").map((s) => s.kind[0]!.toUpperCase() + s.kind.slice(1)));
      expect(c.inspectedBy).toBe("Test machinist");
    }
    expect(metric.job).toMatchObject({ number: job.job.number, torquePlate: false });
    expect(metric.remarks).toMatch(/piston and ring makers' instructions/);
    const inch = await getRecordView({ actor: shop.actors.apprentice, jobId: job.job.jobId, unitSystem: "inch" });
    expect(inch.cylinders[0]!.levels[0]!.a.text).toMatch(/^\d\.\d{4} in$/);
    expect(inch.cylinders[0]!.clearance.min.text).toMatch(/ thou$/);
  });

  it("is refused before the job passed final inspection, and another shop's job is not found", async () => {
    const floor = await createFloorPlan(shop, 1);
    await expect(getRecordView({ actor: shop.actors.owner, jobId: floor.job.jobId, unitSystem: "metric" })).rejects.toMatchObject({ code: "conflict", message: expect.stringMatching(/has not passed its final inspection/) });
    await logAllStages(shop, floor);
    await expect(sendRecord({ actor: shop.actors.machinist, input: { jobId: floor.job.jobId, to: address(), unitSystem: "metric" } })).rejects.toMatchObject({ code: "conflict" });
    const passed = await createPassedJob(shop, 1);
    await expect(getRecordView({ actor: other.actors.owner, jobId: passed.job.jobId, unitSystem: "metric" })).rejects.toMatchObject({ code: "not_found" });
    await expect(sendRecord({ actor: other.actors.owner, input: { jobId: passed.job.jobId, to: address(), unitSystem: "metric" } })).rejects.toMatchObject({ code: "not_found" });
    await expect(listRecordVersions({ actor: other.actors.owner, jobId: passed.job.jobId })).rejects.toMatchObject({ code: "not_found" });
  });

  it("is sent once with its PDF attached, the job delivered, the link's token stored hashed", async () => {
    const job = await createPassedJob(shop);
    const to = address();
    const clientId = randomUUID();
    const input = { jobId: job.job.jobId, to, unitSystem: "metric" as const, clientId };
    const answers = await Promise.all([1, 2, 3].map(() => sendRecord({ actor: shop.actors.machinist, input })));
    for (const a of answers) expect(a).toEqual(answers[0]);
    expect(await sendRecord({ actor: shop.actors.machinist, input })).toEqual(answers[0]);
    expect(answers[0]).toMatchObject({ versionId: clientId, version: 1, sentTo: to });
    expect(await db.select({ id: recordVersions.id }).from(recordVersions).where(eq(recordVersions.jobId, job.job.jobId))).toHaveLength(1);
    expect(await db.select({ id: emailOutbox.id }).from(emailOutbox).where(and(eq(emailOutbox.toAddress, to), eq(emailOutbox.kind, "record.sent")))).toHaveLength(1);
    const [row] = await db.select({ status: jobs.status }).from(jobs).where(eq(jobs.id, job.job.jobId));
    expect(row!.status).toBe("delivered");

    const [mail] = await caughtFor(to);
    expect(mail!.subject).toContain(`job #${job.job.number}`);
    expect(mail!.attachments).toHaveLength(1);
    const attachment = mail!.attachments[0]!;
    expect(attachment).toMatchObject({ filename: `machining-record-job-${job.job.number}-v1.pdf`, contentType: "application/pdf" });
    const text = await pdfText(Buffer.from(attachment.base64, "base64"));
    const record = await getRecordView({ actor: shop.actors.machinist, jobId: job.job.jobId, unitSystem: "metric" });
    for (const c of record.cylinders) {
      for (const l of c.levels) expect(text).toContain(l.a.text);
      expect(text).toContain(`${c.clearance.min.text} – ${c.clearance.max.text}`);
    }
    expect(text).toMatch(/Ø \d+\.\d{3} mm/);

    const token = tokenOf(mail!);
    const links = await db.select({ tokenHash: recordLinks.tokenHash }).from(recordLinks).where(eq(recordLinks.jobId, job.job.jobId));
    expect(links).toEqual([{ tokenHash: hashToken(token) }]);
    expect(JSON.stringify(await db.select().from(recordLinks).where(eq(recordLinks.jobId, job.job.jobId)))).not.toContain(token);
    const opened = await recordForToken(token);
    expect(opened).toMatchObject({ version: 1, replaces: null });
    expect(opened!.record.cylinders[0]!.levels[0]!.a.text).toBe(record.cylinders[0]!.levels[0]!.a.text);
    expect((await recordPdfForToken(token))!.bytes.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    expect(await recordForToken(token.toUpperCase())).toBeNull();
    expect(await recordForToken(token.slice(0, 39) + (token.endsWith("0") ? "1" : "0"))).toBeNull();
    expect(await recordForToken("../../etc/passwd")).toBeNull();
  });

  it("keeps every version; the customer's old link shows the newest with a note; links expire and can be revoked", async () => {
    const job = await createPassedJob(shop, 1);
    const to = address();
    await sendRecord({ actor: shop.actors.machinist, input: { jobId: job.job.jobId, to, unitSystem: "metric", clientId: randomUUID() } });
    const second = await sendRecord({ actor: shop.actors.lead, input: { jobId: job.job.jobId, to, unitSystem: "inch", clientId: randomUUID() } });
    expect(second.version).toBe(2);
    const mails = await caughtFor(to, 2);
    const [newest, oldest] = mails; // the catcher lists newest first
    expect(newest!.subject).toContain("version 2");
    const oldToken = tokenOf(oldest!);
    const opened = await recordForToken(oldToken);
    expect(opened).toMatchObject({ version: 2, replaces: 1 });
    expect(opened!.record.cylinders[0]!.levels[0]!.a.text).toMatch(/ in$/);
    expect(await pdfText(Buffer.from(newest!.attachments[0]!.base64, "base64"))).toContain("Replaces version 1");

    const versions = await listRecordVersions({ actor: shop.actors.apprentice, jobId: job.job.jobId });
    expect(versions.map((v) => [v.version, v.unitSystem, v.sentTo, v.links.map((l) => l.state)])).toEqual([[2, "inch", to, ["active"]], [1, "metric", to, ["active"]]]);
    const v1 = await getVersionPdf({ actor: shop.actors.apprentice, jobId: job.job.jobId, versionId: versions[1]!.id });
    expect(await pdfText(v1.bytes)).not.toContain("Replaces version");
    await expect(getVersionPdf({ actor: other.actors.owner, jobId: job.job.jobId, versionId: versions[1]!.id })).rejects.toMatchObject({ code: "not_found" });

    // Revoked: the old link shows nothing; the newer one still works. Another shop cannot revoke.
    const oldLink = versions[1]!.links[0]!;
    await expect(revokeRecordLink({ actor: other.actors.owner, input: { jobId: job.job.jobId, linkId: oldLink.id } })).rejects.toMatchObject({ code: "not_found" });
    await expect(revokeRecordLink({ actor: shop.actors.apprentice, input: { jobId: job.job.jobId, linkId: oldLink.id } })).rejects.toMatchObject({ code: "forbidden" });
    await revokeRecordLink({ actor: shop.actors.machinist, input: { jobId: job.job.jobId, linkId: oldLink.id } });
    expect(await recordForToken(oldToken)).toBeNull();
    expect(await recordPdfForToken(oldToken)).toBeNull();
    const newToken = tokenOf(newest!);
    expect(await recordForToken(newToken)).not.toBeNull();

    // Expired: the same as unknown.
    await db.update(recordLinks).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(recordLinks.tokenHash, hashToken(newToken)));
    expect(await recordForToken(newToken)).toBeNull();
    const states = (await listRecordVersions({ actor: shop.actors.owner, jobId: job.job.jobId })).map((v) => v.links[0]!.state);
    expect(states).toEqual(["expired", "revoked"]);
  });

  it("refuses a bad address and an apprentice, and changes nothing", async () => {
    const job = await createPassedJob(shop, 1);
    await expect(sendRecord({ actor: shop.actors.machinist, input: { jobId: job.job.jobId, to: "not an address", unitSystem: "metric" } })).rejects.toThrow();
    await expect(sendRecord({ actor: shop.actors.apprentice, input: { jobId: job.job.jobId, to: address(), unitSystem: "metric" } })).rejects.toMatchObject({ code: "forbidden" });
    expect(await listRecordVersions({ actor: shop.actors.owner, jobId: job.job.jobId })).toEqual([]);
    const [row] = await db.select({ status: jobs.status }).from(jobs).where(eq(jobs.id, job.job.jobId));
    expect(row!.status).toBe("inspected");
  });
});

describe("record settings", () => {
  it("are the shop's own, carried by the next record, and refused to anyone but the owner", async () => {
    const { updateRecordSettings, getRecordSettings } = await import("@/server/records/settings");
    const s = await createShopWithMembers("record settings");
    expect((await getRecordSettings({ actor: s.actors.owner })).remarks).toMatch(/piston and ring makers' instructions/);
    await updateRecordSettings({ actor: s.actors.owner, input: { address: "1 Test Lane\nTest Town", contact: "+00 000 0000", remarks: "Run in as the ring maker says." } });
    await expect(updateRecordSettings({ actor: s.actors.lead, input: { address: "", contact: "", remarks: "x" } })).rejects.toMatchObject({ code: "forbidden" });
    await expect(updateRecordSettings({ actor: s.actors.owner, input: { address: "", contact: "", remarks: "" } })).rejects.toThrow();
    const job = await createPassedJob(s, 1);
    const record = await getRecordView({ actor: s.actors.machinist, jobId: job.job.jobId, unitSystem: "metric" });
    expect(record.shop).toMatchObject({ address: "1 Test Lane\nTest Town", contact: "+00 000 0000", hasLogo: false });
    expect(record.remarks).toBe("Run in as the ring maker says.");
    expect((await getRecordView({ actor: shop.actors.machinist, jobId: (await createPassedJob(shop, 1)).job.jobId, unitSystem: "metric" })).remarks).not.toBe("Run in as the ring maker says.");
  });
});
