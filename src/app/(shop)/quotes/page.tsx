import Link from "next/link";
import { PageTitle } from "@/components/ui/card";
import { BillingStatus } from "@/components/billing/status-badge";
import { pageActor } from "@/server/http/page";
import { listQuotes } from "@/server/billing/quotes";
import { moneyText } from "@/shared/billing/format";
import { dateText } from "@/shared/time";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

export const metadata = { title: "Quotes" };

export default async function QuotesPage() {
  const actor = await pageActor("billing.view");
  const quotes = await listQuotes({ actor });
  const zone = await shopTimeZone(actor);
  return (
    <>
      <PageTitle actions={<><Link href="/invoices" className="inline-flex min-h-[24px] min-w-[24px] items-center text-steel underline">Invoices</Link><Link href="/plan" className="inline-flex min-h-[24px] min-w-[24px] items-center text-steel underline">Quote a quick plan</Link></>}>Quotes</PageTitle>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[560px] border-collapse text-body" data-testid="quote-list">
          <thead><tr><th className="px-2 py-1 text-left text-ink-soft">Customer</th><th className="px-2 py-1 text-left text-ink-soft">Status</th><th className="px-2 py-1 text-left text-ink-soft">Sent</th><th className="px-2 py-1 text-right text-ink-soft">Total</th></tr></thead>
          <tbody>
            {quotes.map((q) => (
              <tr key={q.id} className="border-t border-rule">
                <td className="px-2 py-1"><Link href={`/quotes/${q.id}`} className="inline-flex min-h-touch items-center text-steel underline">{q.customerName}</Link></td>
                <td className="px-2 py-1"><BillingStatus status={q.status} /></td>
                <td className="num px-2 py-1">{q.sentAt ? dateText(q.sentAt, zone) : "—"}</td>
                <td className="num px-2 py-1 text-right">{moneyText(q.totalMinor, q.currency)}</td>
              </tr>
            ))}
            {quotes.length === 0 ? <tr><td colSpan={4} className="px-2 py-3 text-ink-soft">No quotes yet: quote a job from its plan page, or a quick plan from its review.</td></tr> : null}
          </tbody>
        </table>
      </div>
    </>
  );
}
