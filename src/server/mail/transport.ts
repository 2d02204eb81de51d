import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/env";
import type { OutboxAttachment } from "@/server/db/schema";
import { readStored } from "@/server/uploads/storage";

// SMTP from env (README "Mail"): the local catcher in development and tests, any SMTP host in
// production. One transport per process.
let transporter: Transporter | null = null;

const CONNECTION_TIMEOUT_MS = 10_000;
const GREETING_TIMEOUT_MS = 10_000;
const SOCKET_TIMEOUT_MS = 20_000;
/** The longest one send may take before nodemailer gives up (the outbox lease is longer). */
export const SMTP_WORST_CASE_MS = CONNECTION_TIMEOUT_MS + GREETING_TIMEOUT_MS + SOCKET_TIMEOUT_MS;

export function mailTransport(): Transporter {
  transporter ??= nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? "" } : undefined,
    connectionTimeout: CONNECTION_TIMEOUT_MS,
    greetingTimeout: GREETING_TIMEOUT_MS,
    socketTimeout: SOCKET_TIMEOUT_MS,
  });
  return transporter;
}

export type OutgoingMail = { to: string; subject: string; html: string; text: string; attachments?: OutboxAttachment[] };

export async function deliver(mail: OutgoingMail): Promise<void> {
  const attachments = await Promise.all(
    (mail.attachments ?? []).map(async (a) => ({ filename: a.filename, contentType: a.contentType, content: await readStored(a.shopId, a.storedName) })),
  );
  await mailTransport().sendMail({ from: env.MAIL_FROM, to: mail.to, subject: mail.subject, html: mail.html, text: mail.text, textEncoding: "base64", attachments });
}
