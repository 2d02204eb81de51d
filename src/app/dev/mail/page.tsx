import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { env } from "@/env";
import { listCaughtMail } from "@/server/mail/catcher-client";
import { PageTitle } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { DEFAULT_TIME_ZONE, dateTimeText } from "@/shared/time";

export const metadata: Metadata = { title: "Caught mail (development)" };
export const dynamic = "force-dynamic";

// Development only: the messages the local SMTP catcher received. Production answers 404.
export default async function DevMailPage() {
  if (env.NODE_ENV === "production") notFound();
  const messages = await listCaughtMail();
  return (
    <main id="main" tabIndex={-1} className="mx-auto max-w-4xl px-4 py-8">
      <PageTitle>Caught mail</PageTitle>
      <p className="mb-4 text-ink-soft">
        Development only. Every message the app sends goes to the local catcher (<span className="num">127.0.0.1:{env.SMTP_PORT}</span>); nothing leaves this machine.
      </p>
      {messages === null ? (
        <Notice tone="caution">The mail catcher is not running. Start it with: npx tsx scripts/mail-catcher.ts</Notice>
      ) : messages.length === 0 ? (
        <p>No messages yet.</p>
      ) : (
        <ul className="flex flex-col gap-4" data-testid="caught-mail">
          {messages.map((m) => (
            <li key={m.id} className="rounded-lg border border-rule bg-paper-raised p-4">
              <p className="font-semibold">{m.subject}</p>
              <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-caption">
                <dt className="text-ink-soft">From</dt><dd className="break-words">{m.from}</dd>
                <dt className="text-ink-soft">To</dt><dd className="break-words">{m.to.join(", ")}</dd>
                <dt className="text-ink-soft">Received</dt><dd className="num">{dateTimeText(m.receivedAt, DEFAULT_TIME_ZONE)}</dd>
                {m.attachments?.length ? <><dt className="text-ink-soft">Attachments</dt><dd>{m.attachments.map((f) => `${f.filename} (${f.contentType}, ${f.bytes} bytes)`).join(", ")}</dd></> : null}
              </dl>
              <pre className="mt-3 whitespace-pre-wrap break-words font-mono text-caption">{m.text}</pre>
            </li>
          ))}
        </ul>
      )}
    </main>
  );
}
