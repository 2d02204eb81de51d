// Development and test mail catcher: an SMTP server on 127.0.0.1:SMTP_PORT (default 2525) that keeps
// every message in memory, and a loopback HTTP JSON API on 127.0.0.1:MAIL_CATCHER_HTTP_PORT (default
// 2580): GET /messages (newest first), DELETE /messages. Nothing is relayed anywhere.
//
//   npx tsx scripts/mail-catcher.ts
//   SMTP_PORT=2626 MAIL_CATCHER_HTTP_PORT=2681 npx tsx scripts/mail-catcher.ts   (other ports)
//   MAIL_CATCHER_DELAY_MS=5000 npx tsx scripts/mail-catcher.ts   (a slow server: waits before accepting each message)
//
// Built on the npm package smtp-server (the Nodemailer project's SMTP server).
import { createServer, type Server } from "node:http";
import { randomUUID } from "node:crypto";
import { SMTPServer } from "smtp-server";

export type CaughtAttachment = { filename: string; contentType: string; bytes: number; base64: string };
export type CaughtMessage = { id: string; receivedAt: string; from: string; to: string[]; subject: string; text: string; html: string; attachments: CaughtAttachment[] };

const MAX_MESSAGES = 500;
const MAX_BYTES = 5 * 1024 * 1024;

// ---- a small MIME reader: enough for what nodemailer sends (multipart, base64, quoted-printable) ----
type Part = { headers: Map<string, string>; body: string };

function splitHeaders(raw: string): Part {
  const cut = raw.search(/\r?\n\r?\n/);
  const head = cut < 0 ? raw : raw.slice(0, cut);
  const body = cut < 0 ? "" : raw.slice(cut).replace(/^\r?\n\r?\n/, "");
  const headers = new Map<string, string>();
  for (const line of head.replace(/\r?\n[ \t]+/g, " ").split(/\r?\n/)) {
    const colon = line.indexOf(":");
    if (colon > 0) headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, body };
}

function decodeWords(value: string): string {
  return value.replace(/=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g, (_m, _charset: string, enc: string, data: string) =>
    enc.toUpperCase() === "B"
      ? Buffer.from(data, "base64").toString("utf8")
      : Buffer.from(data.replace(/_/g, " ").replace(/=([0-9A-Fa-f]{2})/g, (_x, h: string) => String.fromCharCode(parseInt(h, 16))), "latin1").toString("utf8"),
  );
}

function decodeBody(part: Part): string {
  const encoding = (part.headers.get("content-transfer-encoding") ?? "7bit").toLowerCase();
  if (encoding === "base64") return Buffer.from(part.body.replace(/\s+/g, ""), "base64").toString("utf8");
  if (encoding === "quoted-printable") {
    const bytes = part.body.replace(/=\r?\n/g, "").replace(/=([0-9A-Fa-f]{2})/g, (_x, h: string) => String.fromCharCode(parseInt(h, 16)));
    return Buffer.from(bytes, "latin1").toString("utf8");
  }
  return part.body;
}

type Collected = { text: string; html: string; attachments: CaughtAttachment[] };

function attachmentOf(part: Part, type: string): CaughtAttachment | null {
  const disposition = part.headers.get("content-disposition") ?? "";
  if (!/^attachment/i.test(disposition)) return null;
  const filename = decodeWords(/filename="?([^";]+)"?/i.exec(disposition)?.[1] ?? "");
  const base64 = (part.headers.get("content-transfer-encoding") ?? "").toLowerCase() === "base64" ? part.body.replace(/\s+/g, "") : Buffer.from(part.body, "latin1").toString("base64");
  return { filename, contentType: type.split(";")[0]!.trim().toLowerCase(), bytes: Buffer.from(base64, "base64").length, base64 };
}

function collect(part: Part, out: Collected): void {
  const type = part.headers.get("content-type") ?? "text/plain";
  const boundary = /boundary="?([^";]+)"?/i.exec(type)?.[1];
  if (type.toLowerCase().startsWith("multipart/") && boundary) {
    const pieces = part.body.split(`--${boundary}`).slice(1);
    for (const piece of pieces) {
      if (piece.startsWith("--")) break;
      collect(splitHeaders(piece.replace(/^\r?\n/, "")), out);
    }
    return;
  }
  const attachment = attachmentOf(part, type);
  if (attachment) out.attachments.push(attachment);
  else if (type.toLowerCase().startsWith("text/html")) out.html ||= decodeBody(part);
  else if (type.toLowerCase().startsWith("text/plain")) out.text ||= decodeBody(part);
}

export function parseMessage(raw: string, envelope: { from: string; to: string[] }): CaughtMessage {
  const root = splitHeaders(raw);
  const out: Collected = { text: "", html: "", attachments: [] };
  collect(root, out);
  return { id: randomUUID(), receivedAt: new Date().toISOString(), from: envelope.from, to: envelope.to, subject: decodeWords(root.headers.get("subject") ?? ""), ...out };
}

// ---- a readable list at the HTTP root, for a person with a browser; the JSON API stays as it is ----
const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function messagesPage(messages: readonly CaughtMessage[]): string {
  const items = messages.map((m) => {
    const files = m.attachments.map((a) => `${escapeHtml(a.filename)} (${escapeHtml(a.contentType)}, ${a.bytes} bytes)`).join(", ");
    return `<li><h2>${escapeHtml(m.subject || "(no subject)")}</h2><p>From ${escapeHtml(m.from)} · to ${escapeHtml(m.to.join(", "))} · ${escapeHtml(m.receivedAt)} UTC</p>`
      + (files ? `<p>Attachments: ${files}</p>` : "") + `<pre>${escapeHtml(m.text)}</pre></li>`;
  });
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Mail catcher</title>`
    + `<style>body{font:16px/1.5 system-ui,sans-serif;max-width:60rem;margin:2rem auto;padding:0 1rem}li{border:1px solid #bbb;border-radius:8px;padding:0 1rem;margin:0 0 1rem;list-style:none}pre{white-space:pre-wrap;word-break:break-word}ul{padding:0}</style></head>`
    + `<body><h1>Caught mail (development)</h1><p>${messages.length} message${messages.length === 1 ? "" : "s"}, newest first. JSON: <a href="/messages">/messages</a>.</p>`
    + (items.length ? `<ul>${items.join("")}</ul>` : "<p>No messages yet.</p>") + `</body></html>`;
}

// ---- the servers ----
export function startMailCatcher(options: { smtpPort: number; httpPort: number; quiet?: boolean; delayMs?: number }) {
  const messages: CaughtMessage[] = [];
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    size: MAX_BYTES,
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
        const to = session.envelope.rcptTo.map((r) => r.address);
        messages.unshift(parseMessage(Buffer.concat(chunks).toString("utf8"), { from, to }));
        messages.splice(MAX_MESSAGES);
        if (!options.quiet) console.log(`mail-catcher: caught "${messages[0]?.subject}" for ${to.join(", ")}`);
        if (options.delayMs) setTimeout(() => callback(), options.delayMs);
        else callback();
      });
    },
  });
  const http: Server = createServer((req, res) => {
    if (req.url === "/" && req.method === "GET") {
      res.setHeader("content-type", "text/html; charset=utf-8");
      return void res.end(messagesPage(messages));
    }
    res.setHeader("content-type", "application/json");
    if (req.url === "/messages" && req.method === "GET") return void res.end(JSON.stringify(messages));
    if (req.url === "/messages" && req.method === "DELETE") {
      messages.length = 0;
      return void res.end(JSON.stringify({ ok: true }));
    }
    res.statusCode = 404;
    res.end(JSON.stringify({ error: "not_found" }));
  });
  const ready = Promise.all([
    new Promise<void>((resolve, reject) => smtp.listen(options.smtpPort, "127.0.0.1", () => resolve()).once("error", reject)),
    new Promise<void>((resolve, reject) => http.listen(options.httpPort, "127.0.0.1", () => resolve()).once("error", reject)),
  ]);
  const close = () => Promise.all([new Promise<void>((r) => smtp.close(() => r())), new Promise<void>((r) => http.close(() => r()))]).then(() => undefined);
  return { messages, ready, close };
}

const isMain = process.argv[1] && /mail-catcher\.ts$/.test(process.argv[1]);
if (isMain) {
  const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
  const httpPort = Number(process.env.MAIL_CATCHER_HTTP_PORT ?? 2580);
  const catcher = startMailCatcher({ smtpPort, httpPort, delayMs: Number(process.env.MAIL_CATCHER_DELAY_MS ?? 0) });
  catcher.ready
    .then(() => console.log(`mail-catcher: SMTP on 127.0.0.1:${smtpPort}, messages at http://127.0.0.1:${httpPort}/messages`))
    .catch((error) => {
      console.error("mail-catcher: could not start:", error.message);
      process.exit(1);
    });
  const stop = () => void catcher.close().then(() => process.exit(0));
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
}
