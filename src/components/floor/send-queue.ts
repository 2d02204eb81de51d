// Sends the signed-in person's entries in order, one at a time. One send runs at a time on this page (a
// second call while one runs returns at once) and one per device across tabs (a Web Lock, where the
// browser has one: secure pages only); the sender reads the queue again from IndexedDB once it holds
// the lock, so what another tab already sent is not sent again. The id each entry carries makes any
// repeat that still slips through (a reload during a send, a lost answer) land once on the server.
import { markRefused, openDeviceStore, readQueueOf, refreshFromDevice, removeEntry, saveAnswer, whenWritten, type EntryOwner, type QueuedEntry } from "./device-store";

export const SEND_LOCK = "borewise-floor-send";

type Locks = { request: (name: string, options: { ifAvailable: true }, run: (lock: unknown) => Promise<void>) => Promise<void> };

/** Runs `send` holding the device's send lock; returns at once when another tab holds it (that tab is sending). */
async function withSendLock(send: () => Promise<void>): Promise<void> {
  const locks = (typeof navigator !== "undefined" ? (navigator as { locks?: Locks }).locks : undefined) ?? null;
  if (!locks) return send();
  await locks.request(SEND_LOCK, { ifAvailable: true }, async (lock) => {
    if (lock) await send();
  });
}

function requestOf(entry: QueuedEntry): RequestInit {
  if (entry.kind === "upload") {
    const form = new FormData();
    form.set("file", new Blob([entry.body.bytes], { type: entry.body.type }), entry.body.name);
    form.set("clientId", entry.id);
    return { method: "POST", body: form };
  }
  return { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(entry.body) };
}

let sending = false;

/** Stops on a network error, a 5xx, 408 or 429 (tried again later); a refusal stays at the head with its reason. */
export async function sendQueued(owner: EntryOwner, send: typeof fetch = fetch): Promise<void> {
  if (sending) return;
  sending = true;
  try {
    await openDeviceStore();
    await withSendLock(async () => {
      await refreshFromDevice();
      for (;;) {
        const [next] = readQueueOf(owner);
        if (!next || next.error) break;
        let response: Response;
        try {
          response = await send(next.url, requestOf(next));
        } catch {
          break; // offline: tried again on reconnect or at the next tick
        }
        if (response.status >= 500 || response.status === 429 || response.status === 408) break;
        const answer: unknown = await response.json().catch(() => ({}));
        if (response.ok) {
          saveAnswer(next.id, answer);
          removeEntry(next.id);
        } else {
          const refusal = answer as { message?: string; fieldErrors?: Record<string, string[] | undefined> };
          markRefused(next.id, Object.values(refusal.fieldErrors ?? {})[0]?.[0] ?? refusal.message ?? `Refused (${response.status}).`);
          break;
        }
      }
      // The lock is let go only once the other tabs can read what was sent.
      await whenWritten();
    });
  } finally {
    sending = false;
  }
}
