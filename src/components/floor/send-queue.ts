// Sends the device's queue in order, one entry at a time. One send runs at a time on this page (a
// second call while one runs returns at once), so no entry leaves twice from here; the id it carries
// makes a send from another tab, or a retry after a lost answer, land once on the server too.
import { markRefused, openDeviceStore, readQueue, removeEntry, saveAnswer } from "./device-store";

let sending = false;

/** Stops on a network error, a 5xx, 408 or 429 (tried again later); a refusal stays at the head with its reason. */
export async function sendQueued(send: typeof fetch = fetch): Promise<void> {
  if (sending) return;
  sending = true;
  try {
    await openDeviceStore();
    for (;;) {
      const [next] = readQueue();
      if (!next || next.error) break;
      let response: Response;
      try {
        response = await send(next.url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(next.body) });
      } catch {
        break; // offline: tried again on reconnect or at the next tick
      }
      if (response.status >= 500 || response.status === 429 || response.status === 408) break;
      const answer: unknown = await response.json().catch(() => ({}));
      if (response.ok) {
        saveAnswer(next.id, answer);
        removeEntry(next.id);
      } else {
        markRefused(next.id, (answer as { message?: string }).message ?? `Refused (${response.status}).`);
        break;
      }
    }
  } finally {
    sending = false;
  }
}
