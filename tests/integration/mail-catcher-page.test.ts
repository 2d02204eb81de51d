// The catcher's HTTP root lists the caught messages for a person; its JSON API is unchanged.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import nodemailer from "nodemailer";
import { startMailCatcher } from "../../scripts/mail-catcher";

const SMTP = 26_000 + Math.floor(Math.random() * 500);
const HTTP = SMTP + 600;
const catcher = startMailCatcher({ smtpPort: SMTP, httpPort: HTTP, quiet: true });

beforeAll(async () => { await catcher.ready; });
afterAll(async () => { await catcher.close(); });

describe("mail catcher root", () => {
  it("shows from, to, subject, time, body and attachments, escaped", async () => {
    const empty = await fetch(`http://127.0.0.1:${HTTP}/`);
    expect(empty.status).toBe(200);
    expect(await empty.text()).toContain("No messages yet.");
    await nodemailer.createTransport({ host: "127.0.0.1", port: SMTP, secure: false, ignoreTLS: true }).sendMail({
      from: "office@catcher-page.test", to: "owner@catcher-page.test", subject: "Quote <7> & more", text: "Body line one",
      attachments: [{ filename: "quote.pdf", content: Buffer.from("%PDF-1.4 demo"), contentType: "application/pdf" }],
    });
    const page = await fetch(`http://127.0.0.1:${HTTP}/`);
    expect(page.headers.get("content-type")).toContain("text/html");
    const html = await page.text();
    for (const part of ["office@catcher-page.test", "owner@catcher-page.test", "Quote &#60;7&#62; &#38; more", "Body line one", "quote.pdf (application/pdf", " UTC"]) expect(html).toContain(part);
    const json = (await (await fetch(`http://127.0.0.1:${HTTP}/messages`)).json()) as Array<{ subject: string }>;
    expect(json[0]?.subject).toBe("Quote <7> & more");
    expect((await fetch(`http://127.0.0.1:${HTTP}/nothing`)).status).toBe(404);
  });
});
