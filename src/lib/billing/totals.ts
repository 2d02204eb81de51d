import { requireWhole } from "./errors";
import { divideRounded, MAX_MINOR, MAX_QUANTITY_MILLI, MAX_RATE_BP } from "./money";

export type LineInput = {
  /** Thousandths of a unit: 1500 = 1.5 h, 4000 = 4 cylinders. */
  quantityMilli: number;
  unitPriceMinor: number;
  /** Basis points: 2000 = 20.00 %. */
  taxRateBp: number;
};

export type LineTotal = LineInput & { netMinor: number };
export type TaxGroup = { taxRateBp: number; netMinor: number; taxMinor: number };
export type InvoiceTotals = { lines: LineTotal[]; netMinor: number; taxes: TaxGroup[]; taxMinor: number; totalMinor: number };

/**
 * The rounding rule (written down once, used by quotes and invoices alike):
 * 1. each line's net = quantity × unit price, rounded half away from zero to a minor unit;
 * 2. the lines are grouped by tax rate; each group's tax = the group's net × rate, rounded the same way;
 * 3. total = Σ line nets + Σ group taxes, with no further rounding.
 * Rounding per line then tax per rate on the summed nets is common practice for invoices and is
 * what EU VAT Directive 2006/112/EC art. 226 (8)–(10) invoices show (taxable amount and tax per
 * rate), from memory.
 */
export function lineNetMinor(line: LineInput): number {
  const q = requireWhole("quantityMilli", line.quantityMilli, -MAX_QUANTITY_MILLI, MAX_QUANTITY_MILLI);
  const p = requireWhole("unitPriceMinor", line.unitPriceMinor, -MAX_MINOR, MAX_MINOR);
  return Number(divideRounded(BigInt(q) * BigInt(p), 1000n));
}

export function invoiceTotals(lines: readonly LineInput[]): InvoiceTotals {
  const totals: LineTotal[] = lines.map((line) => {
    requireWhole("taxRateBp", line.taxRateBp, 0, MAX_RATE_BP);
    return { ...line, netMinor: lineNetMinor(line) };
  });
  const byRate = new Map<number, bigint>();
  for (const line of totals) byRate.set(line.taxRateBp, (byRate.get(line.taxRateBp) ?? 0n) + BigInt(line.netMinor));
  const taxes = [...byRate.entries()]
    .sort(([a], [b]) => a - b)
    .map(([taxRateBp, net]) => ({ taxRateBp, netMinor: Number(net), taxMinor: Number(divideRounded(net * BigInt(taxRateBp), 10_000n)) }));
  const netMinor = totals.reduce((sum, l) => sum + l.netMinor, 0);
  const taxMinor = taxes.reduce((sum, t) => sum + t.taxMinor, 0);
  const totalMinor = netMinor + taxMinor;
  requireWhole("totalMinor", totalMinor, -MAX_MINOR * 1000, MAX_MINOR * 1000);
  return { lines: totals, netMinor, taxes, taxMinor, totalMinor };
}
