import "server-only";
import { createHash, randomBytes } from "node:crypto";

// 20 random bytes = 160 bits from the CSPRNG, above the 120-bit floor of DESIGN.md §8 and ASVS 5.0
// V7.2.3's 128 bits (web-anchors A1, A7). Lowercase hex, so no alphabet is case-sensitive.
const TOKEN_BYTES = 20;

/** A fresh secret for a cookie or an e-mailed link. Only its hash is ever stored. */
export function newToken(): string {
  return randomBytes(TOKEN_BYTES).toString("hex");
}

/** SHA-256 of a token as lowercase hex: what the database keeps instead of the token. */
export function hashToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

/** Tokens are exactly 40 lowercase hex characters; anything else is rejected before any lookup. */
export function isWellFormedToken(value: unknown): value is string {
  return typeof value === "string" && /^[0-9a-f]{40}$/.test(value);
}
