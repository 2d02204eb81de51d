import "server-only";
import { createHash } from "node:crypto";

// The preview's serialized answer, remembered by a digest of EVERYTHING it is computed from (plans
// are pure functions of it): for a job, the shop, its planning counter (raised by a trigger on every
// write the records come from) and the request; for a quick plan, the request and the records loaded
// fresh for it. So after any edit the key differs and the plan is computed anew. What it saves is
// planHoneJob and serializing the answer (about 35 KB for an eight-cylinder job, preview-view.ts).

const MAX_ENTRIES = 64; // ~35 KB each for an eight-cylinder job: a few MB per server process.
// Kept as UTF-8 bytes: a string body is checked and encoded anew for every response (measured: about
// 7% of the route's CPU); a byte body is only copied.
const answers = new Map<string, Uint8Array<ArrayBuffer>>();
const utf8 = new TextEncoder();

const digest = (keyMaterial: string) => createHash("sha256").update(keyMaterial).digest("base64");

/** The answer remembered for this key material, if any (then counted as most recently used). */
function recalledAnswer(keyMaterial: string): Uint8Array<ArrayBuffer> | undefined {
  const key = digest(keyMaterial);
  const hit = answers.get(key);
  if (hit !== undefined) {
    answers.delete(key); // most recently used last
    answers.set(key, hit);
  }
  return hit;
}

/** Remembers an answer (JSON text) for this key material as bytes (the oldest dropped past MAX_ENTRIES). */
function rememberAnswer(keyMaterial: string, answerJson: string): Uint8Array<ArrayBuffer> {
  const answer = utf8.encode(answerJson);
  answers.set(digest(keyMaterial), answer);
  if (answers.size > MAX_ENTRIES) answers.delete(answers.keys().next().value!);
  return answer;
}

/** The remembered answer for this key material, or `compute()`'s JSON text (then remembered); compute runs only on a miss. */
export async function rememberedAnswer(keyMaterial: string, compute: () => string | Promise<string>): Promise<Uint8Array<ArrayBuffer>> {
  return recalledAnswer(keyMaterial) ?? rememberAnswer(keyMaterial, await compute());
}
