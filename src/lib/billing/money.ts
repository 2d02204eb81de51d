import { BillingInputError, requireWhole } from "./errors";

// Money is integer minor units (cents, pence) everywhere; quantities are integer thousandths and tax
// rates integer basis points (2000 = 20.00 %), so every product is exact in BigInt and only the one
// rounding step below ever loses a fraction.
export const MAX_MINOR = 10_000_000_000; // 100 million in major units: far above any shop invoice
export const MAX_QUANTITY_MILLI = 100_000_000; // 100 000 units
export const MAX_RATE_BP = 10_000; // 100 %

/**
 * n / d rounded half away from zero ("commercial rounding": common practice for invoices; a half
 * minor unit goes up for a charge and down for a credit, so a credit note mirrors its invoice).
 */
export function divideRounded(n: bigint, d: bigint): bigint {
  if (d <= 0n) throw new BillingInputError("divisor", "must be positive");
  const negative = n < 0n;
  const magnitude = negative ? -n : n;
  const q = (magnitude * 2n + d) / (d * 2n);
  return negative ? -q : q;
}

export function toMinor(field: string, value: number): number {
  return requireWhole(field, value, -MAX_MINOR, MAX_MINOR);
}

/** "12.34" or "12" or "-0.5" in a currency with `digits` minor digits → minor units; null when unreadable. */
export function parseMajor(text: string, digits = 2): number | null {
  const m = /^\s*(-?)(\d{1,9})(?:[.,](\d+))?\s*$/.exec(text);
  if (!m) return null;
  const frac = m[3] ?? "";
  if (frac.length > digits) return null;
  const minor = Number(m[2]) * 10 ** digits + Number(frac.padEnd(digits, "0") || "0");
  return m[1] === "-" ? -minor : minor;
}

/** Minor units as a plain decimal string ("1234.50"), no grouping: the screens add the currency code. */
export function formatMinor(minor: number, digits = 2): string {
  const sign = minor < 0 ? "-" : "";
  const abs = Math.abs(minor);
  if (digits === 0) return `${sign}${abs}`;
  const scale = 10 ** digits;
  return `${sign}${Math.floor(abs / scale)}.${String(abs % scale).padStart(digits, "0")}`;
}
