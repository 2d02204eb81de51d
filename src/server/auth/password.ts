import "server-only";
import { hash, verify } from "@node-rs/argon2";
import { isCommonPassword } from "./common-passwords";
import { AppError } from "@/server/errors";
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from "@/shared/auth/schemas";

// OWASP Password Storage Cheat Sheet minimum for argon2id: m = 19 MiB, t = 2, p = 1 (web-anchors A2).
// Algorithm 2 is argon2id in @node-rs/argon2's (const) enum.
export const ARGON2_OPTIONS = { algorithm: 2, memoryCost: 19_456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

// Each hash holds 19 MiB and a core for tens of ms; on a 2-core server more than two at once only
// queue inside libuv. Beyond the waiting room the answer is "busy, try again" instead of unbounded memory.
export const MAX_CONCURRENT_HASHES = 2;
export const MAX_WAITING_HASHES = 32;
let running = 0;
const waiting: Array<() => void> = [];
let started = 0;

/** How many password hashes or verifications have started in this process (tests: a refused token costs none). */
export const passwordWorkStarted = () => started;

async function withHashSlot<T>(work: () => Promise<T>): Promise<T> {
  if (running >= MAX_CONCURRENT_HASHES) {
    if (waiting.length >= MAX_WAITING_HASHES) throw new AppError("unavailable", "The server is busy checking passwords. Try again in a few seconds.", { retryAfterSeconds: 5 });
    await new Promise<void>((resolve) => waiting.push(resolve));
  } else {
    running++;
  }
  started++;
  try {
    return await work();
  } finally {
    const next = waiting.shift();
    if (next) next();
    else running--;
  }
}

export async function hashPassword(password: string): Promise<string> {
  return withHashSlot(() => hash(password, ARGON2_OPTIONS));
}

/** Constant-shape verification; a malformed stored hash counts as a mismatch, never a crash. */
export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  if (!passwordHash.startsWith("$argon2")) return false;
  return withHashSlot(async () => {
    try {
      return await verify(passwordHash, password);
    } catch {
      return false;
    }
  });
}

// A hash of a random password, verified against when the e-mail is unknown, so a missing account
// costs as much time as a wrong password and response time says nothing about who has an account.
let dummyHash: Promise<string> | null = null;
export async function burnPasswordTime(password: string): Promise<void> {
  dummyHash ??= hashPassword(`unused-${Math.random()}-${Date.now()}`);
  await verifyPassword(await dummyHash, password);
}

/** The reason a new password is refused, or null. Length rules also live in the shared form schema. */
export function passwordProblem(password: string): string | null {
  const length = [...password].length;
  if (length < PASSWORD_MIN_LENGTH) return `Use at least ${PASSWORD_MIN_LENGTH} characters.`;
  if (length > PASSWORD_MAX_LENGTH) return `Use at most ${PASSWORD_MAX_LENGTH} characters.`;
  if (isCommonPassword(password)) return "That password is on the list of commonly used passwords. Choose another.";
  return null;
}
