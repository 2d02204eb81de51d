import { amountText, moneyText, quantityText, rateText } from "@/shared/billing/format";

// The lines and totals of a quote or an invoice, as the shop, the customer and the print see them.
export type LineRow = { description: string; quantityMilli: number; unitPriceMinor: number; taxRateBp: number; netMinor: number; source?: string };
export type Totals = { currency: string; digits?: number; netMinor: number; taxMinor: number; totalMinor: number };

const th = "px-2 py-1 text-left font-semibold text-ink-soft";
const num = "num whitespace-nowrap px-2 py-1 text-right";

export function LinesTable({ lines, totals, testId = "lines" }: { lines: LineRow[]; totals: Totals; testId?: string }) {
  const d = totals.digits ?? 2;
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[520px] border-collapse text-body" data-testid={testId}>
        <caption className="sr-only">Lines and totals</caption>
        <thead>
          <tr>
            <th className={th}>Item</th><th className={`${th} text-right`}>Qty</th><th className={`${th} text-right`}>Unit price ({totals.currency})</th>
            <th className={`${th} text-right`}>Tax</th><th className={`${th} text-right`}>Net ({totals.currency})</th>
          </tr>
        </thead>
        <tbody>
          {lines.map((l, i) => (
            <tr key={i} className="border-t border-rule">
              <td className="px-2 py-1">{l.description}{l.source && l.source !== "manual" ? <span className="no-print ml-2 text-caption text-ink-faint">from the {l.source === "work" ? "run log" : "plan"}</span> : null}</td>
              <td className={num}>{quantityText(l.quantityMilli)}</td><td className={num}>{amountText(l.unitPriceMinor, d)}</td>
              <td className={num}>{rateText(l.taxRateBp)}</td><td className={num}>{amountText(l.netMinor, d)}</td>
            </tr>
          ))}
          {lines.length === 0 ? <tr><td className="px-2 py-2 text-ink-soft" colSpan={5}>No lines yet.</td></tr> : null}
        </tbody>
        <tfoot>
          <tr className="border-t-2 border-ink"><td className="px-2 py-1" colSpan={4}>Net</td><td className={num} data-testid={`${testId}-net`}>{amountText(totals.netMinor, d)}</td></tr>
          <tr><td className="px-2 py-1" colSpan={4}>Tax</td><td className={num} data-testid={`${testId}-tax`}>{amountText(totals.taxMinor, d)}</td></tr>
          <tr className="font-semibold"><td className="px-2 py-1" colSpan={4}>Total</td><td className={num} data-testid={`${testId}-total`}>{moneyText(totals.totalMinor, totals.currency, d)}</td></tr>
        </tfoot>
      </table>
    </div>
  );
}
