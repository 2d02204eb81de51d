import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/env";

// SMTP from env (README "Mail"): the local catcher in development and tests, any SMTP host in
// production. One transport per process.
let transporter: Transporter | null = null;

export function mailTransport(): Transporter {
  transporter ??= nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? "" } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return transporter;
}

export type OutgoingMail = { to: string; subject: string; html: string; text: string };

export async function deliver(mail: OutgoingMail): Promise<void> {
  await mailTransport().sendMail({ from: env.MAIL_FROM, to: mail.to, subject: mail.subject, html: mail.html, text: mail.text, textEncoding: "base64" });
}
