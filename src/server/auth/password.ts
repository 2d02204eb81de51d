import "server-only";
import { hash, verify } from "@node-rs/argon2";
import { isCommonPassword } from "./common-passwords";
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from "@/shared/auth/schemas";

// OWASP Password Storage Cheat Sheet minimum for argon2id: m = 19 MiB, t = 2, p = 1 (web-anchors A2).
// Algorithm 2 is argon2id in @node-rs/argon2's (const) enum.
export const ARGON2_OPTIONS = { algorithm: 2, memoryCost: 19_456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

export async function hashPassword(password: string): Promise<string> {
  return hash(password, ARGON2_OPTIONS);
}

/** Constant-shape verification; a malformed stored hash counts as a mismatch, never a crash. */
export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  if (!passwordHash.startsWith("$argon2")) return false;
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
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
