import "server-only";
import { env } from "@/env";

export type CaughtMail = { id: string; receivedAt: string; from: string; to: string[]; subject: string; text: string; html: string; attachments?: { filename: string; contentType: string; bytes: number; base64: string }[] };

/** The local catcher's messages (development and tests only); null when it is not running. */
export async function listCaughtMail(): Promise<CaughtMail[] | null> {
  if (env.NODE_ENV === "production") return null;
  try {
    const res = await fetch(`http://127.0.0.1:${env.MAIL_CATCHER_HTTP_PORT}/messages`, { cache: "no-store", signal: AbortSignal.timeout(2000) });
    return res.ok ? ((await res.json()) as CaughtMail[]) : null;
  } catch {
    return null;
  }
}
