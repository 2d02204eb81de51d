import "server-only";
import { createHash } from "node:crypto";

// The preview's serialized answer, remembered by a digest of EVERYTHING it is computed from: the
// request and the records loaded fresh for this very request (plans are pure functions of them).
// So an answer can never be stale: after any edit the records differ, the digest differs, and the
// plan is computed anew. What it saves is planHoneJob and serializing ~80 KB (measured: about a
// third of the route's CPU), when the wizard asks again with the same choices and the same records.

const MAX_ENTRIES = 64; // ~80 KB each for an eight-cylinder job: a few MB per server process.
const answers = new Map<string, string>();

/** The remembered answer for this key material, or `compute()`'s (then remembered, oldest dropped). */
export function rememberedAnswer(keyMaterial: string, compute: () => string): string {
  const key = createHash("sha256").update(keyMaterial).digest("base64");
  const hit = answers.get(key);
  if (hit !== undefined) {
    answers.delete(key); // most recently used last
    answers.set(key, hit);
    return hit;
  }
  const answer = compute();
  answers.set(key, answer);
  if (answers.size > MAX_ENTRIES) answers.delete(answers.keys().next().value!);
  return answer;
}
