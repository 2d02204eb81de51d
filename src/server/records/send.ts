import "server-only";
import { and, eq, max, sql } from "drizzle-orm";
import { db } from "@/server/db";
import { jobs, recordLinks, recordVersions } from "@/server/db/schema";
import { assertRoomFor, MAX_CHILDREN } from "@/server/db/bounds";
import { newId } from "@/server/db/ids";
import { inTransaction } from "@/server/db/retry";
import { assertCan } from "@/server/auth/guard";
import { assertMayMailOutside } from "@/server/auth/email-confirmation";
import { hashToken, newToken } from "@/server/auth/tokens";
import { AppError, isDuplicateKey } from "@/server/errors";
import { clientIdOrNew } from "@/server/http/client-id";
import { recordMessage } from "@/server/mail/messages";
import { enqueueMail } from "@/server/mail/outbox";
import { mailWithPdf } from "@/server/mail/pdf-mail";
import type { Actor } from "@/shared/auth/policy";
import { RECORD_LINK_DAYS, RECORD_LINK_MS } from "@/shared/records/constants";
import { sendRecordSchema } from "@/shared/records/schema";
import { buildRecordView } from "@/shared/records/view";
import { invoiceForRecordMail } from "@/server/billing/customer-payment";
import { readLogo } from "./logo";
import { renderRecordPdf } from "./pdf";
import { loadRecordSource } from "./source";

// Sending the machining record (issue 14): the record is built, rendered and kept as sent (data and
// PDF) as the job's next version, with a fresh customer link, one outbox mail carrying the PDF, and the
// job delivered, all in one transaction. The version's id comes from the device, so a retried or
// doubled send hits the primary key and is answered with the stored version: nothing goes twice.

export type SentRecord = { versionId: string; version: number; sentTo: string; sentAt: string };

const answerOf = (row: { id: string; version: number; sentTo: string; sentAt: Date }): SentRecord => ({ versionId: row.id, version: row.version, sentTo: row.sentTo, sentAt: row.sentAt.toISOString() });

async function storedAnswer(actor: Actor, id: string): Promise<SentRecord | null> {
  const [row] = await db.select({ id: recordVersions.id, shopId: recordVersions.shopId, version: recordVersions.version, sentTo: recordVersions.sentTo, sentAt: recordVersions.sentAt })
    .from(recordVersions).where(eq(recordVersions.id, id)).limit(1);
  if (!row) return null;
  if (row.shopId !== actor.shopId) throw new AppError("conflict", "This send's device id is already taken; send again.");
  return answerOf(row);
}

async function lastVersion(jobId: string, shopId: string, runner: Pick<typeof db, "select"> = db): Promise<number> {
  const [row] = await runner.select({ n: max(recordVersions.version) }).from(recordVersions).where(and(eq(recordVersions.jobId, jobId), eq(recordVersions.shopId, shopId)));
  return Number(row?.n ?? 0);
}

export async function sendRecord({ actor, input }: { actor: Actor; input: unknown }): Promise<SentRecord> {
  assertCan(actor, "records.send");
  const parsed = sendRecordSchema.parse(input);
  const id = clientIdOrNew(parsed.clientId);
  const stored = await storedAnswer(actor, id);
  if (stored) return stored;
  await assertMayMailOutside(actor.shopId).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "forbidden") throw new AppError("forbidden", "Confirm your shop owner's e-mail address first (the link mailed at sign-up); then records can be sent to customers.");
    throw error;
  });
  const source = await loadRecordSource({ actor, jobId: parsed.jobId });
  const record = buildRecordView(source, parsed.unitSystem);
  const version = (await lastVersion(source.job.id, actor.shopId)) + 1;
  const logo = await readLogo(actor.shopId);
  const token = newToken();
  const invoice = await invoiceForRecordMail(actor.shopId, source.job.id);
  const mail = await recordMessage({ shopName: record.shop.name, jobNumber: record.job.number, engine: record.job.engineDescription, version, token, expiresInDays: RECORD_LINK_DAYS, invoice });
  const filename = `machining-record-job-${record.job.number}-v${version}.pdf`;
  try {
    await mailWithPdf({ shopId: actor.shopId, filename, render: () => renderRecordPdf(record, { number: version, replaces: version > 1 ? version - 1 : null }, logo) }, async ({ attachment, byteLength }) => ({
      value: null,
      outboxId: await inTransaction(async (tx) => {
        await tx.select({ id: jobs.id }).from(jobs).where(and(eq(jobs.id, source.job.id), eq(jobs.shopId, actor.shopId))).for("update");
        if ((await lastVersion(source.job.id, actor.shopId, tx)) + 1 !== version) {
          throw new AppError("conflict", `Another record of job #${record.job.number} was sent a moment ago. Reload the page and check before sending again.`);
        }
        await assertRoomFor({ table: recordVersions, where: and(eq(recordVersions.jobId, source.job.id), eq(recordVersions.shopId, actor.shopId)), max: MAX_CHILDREN.recordVersionsPerJob, what: "record versions per job", tx });
        await tx.insert(recordVersions).values({
          id, shopId: actor.shopId, jobId: source.job.id, version, unitSystem: parsed.unitSystem, data: record, pdfStoredName: attachment.storedName, pdfBytes: byteLength, sentTo: parsed.to, sentBy: actor.userId,
        });
        await tx.insert(recordLinks).values({ id: newId(), shopId: actor.shopId, jobId: source.job.id, versionId: id, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + RECORD_LINK_MS) });
        await tx.update(jobs).set({ status: "delivered", updatedAt: sql`CURRENT_TIMESTAMP(3)` }).where(and(eq(jobs.id, source.job.id), eq(jobs.shopId, actor.shopId)));
        return enqueueMail(tx, { ...mail, to: parsed.to, kind: "record.sent", shopId: actor.shopId, attachments: [attachment] });
      }),
    }));
  } catch (error) {
    // A twin of this send (same device id) got there first: answer with what it stored (its own PDF file).
    const twin = await storedAnswer(actor, id);
    if (twin) return twin;
    if (isDuplicateKey(error)) throw new AppError("conflict", `Another record of job #${record.job.number} was sent a moment ago. Reload the page and check before sending again.`);
    throw error;
  }
  return (await storedAnswer(actor, id))!;
}
