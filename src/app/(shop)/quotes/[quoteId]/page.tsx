import Link from "next/link";
import { BackLink } from "@/components/ui/back-link";
import { notFound } from "next/navigation";
import { Card, PageTitle } from "@/components/ui/card";
import { BillingForm } from "@/components/billing/billing-form";
import { BillingStatus } from "@/components/billing/status-badge";
import { LinesTable } from "@/components/billing/lines-table";
import { pageActor } from "@/server/http/page";
import { getQuote } from "@/server/billing/quotes";
import { can } from "@/shared/auth/policy";
import { PRINT_CSS } from "@/components/billing/print";
import { bookQuoteAction, sendQuoteAction } from "../actions";
import { dateTimeText } from "@/shared/time";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

export const metadata = { title: "Quote" };

export default async function QuotePage({ params }: { params: Promise<{ quoteId: string }> }) {
  const { quoteId } = await params;
  const actor = await pageActor("billing.view");
  const quote = await getQuote({ actor, quoteId });
  const zone = await shopTimeZone(actor);
  if (!quote) notFound();
  const sendable = can(actor, "quotes.edit") && (quote.status === "draft" || quote.status === "sent");
  return (
    <>
      <style>{PRINT_CSS}</style>
      <PageTitle actions={<span className="no-print flex flex-wrap gap-4"><a href={`/api/quotes/${quote.id}/pdf`} className="inline-flex min-h-touch items-center font-semibold text-steel underline" data-testid="quote-pdf">PDF</a><BackLink href="/quotes">All quotes</BackLink></span>}>
        Quote for {quote.customerName} <BillingStatus status={quote.status} testId="quote-status" />
      </PageTitle>
      <div className="grid gap-4 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <Card className="print-sheet">
          <dl className="mb-3 grid gap-x-6 gap-y-1 sm:grid-cols-2">
            <div><dt className="text-caption text-ink-soft">Customer</dt><dd>{quote.customerName} · {quote.customerEmail}</dd></div>
            <div><dt className="text-caption text-ink-soft">Work</dt><dd>{quote.job ? <Link href={`/jobs/${quote.job.id}`} className="inline-flex min-h-[24px] min-w-[24px] items-center text-steel underline" data-testid="quote-job">Job #{quote.job.number}</Link> : null}{quote.quick ? ` ${quote.quick.engineDescription}, ${quote.quick.cylinderCount} cylinders (quick plan)` : ""}</dd></div>
            <div><dt className="text-caption text-ink-soft">Estimated machine time</dt><dd className="num">{quote.estimatedMinutes ? `${quote.estimatedMinutes.toFixed(1)} min · ${(quote.estimatedMinutes / 60).toFixed(2)} h` : "—"}</dd></div>
            <div><dt className="text-caption text-ink-soft">Sent · decided</dt><dd className="num">{quote.sentAt ? dateTimeText(quote.sentAt, zone) : "—"} · {quote.decidedAt ? dateTimeText(quote.decidedAt, zone) : "—"}</dd></div>
          </dl>
          {quote.note ? <p className="mb-3">{quote.note}</p> : null}
          <LinesTable lines={quote.lines} totals={quote} testId="quote-lines" />
        </Card>
        <div className="no-print flex flex-col gap-4">
          {sendable ? (
            <Card title={quote.status === "sent" ? "Send again" : "Send to the customer"}>
              <p className="mb-2 text-ink-soft">An e-mail with the lines, the totals and a link to accept or decline (one use, {30} days). Sending again replaces the earlier link.</p>
              <BillingForm action={sendQuoteAction} fields={[]} hidden={{ quoteId: quote.id }} submitLabel={quote.status === "sent" ? "Send a new link" : "Send the quote"} testId="send-quote" />
            </Card>
          ) : null}
          {quote.status === "accepted" && !quote.bookedJobId ? (
            <Card title="Book in by hand">
              <p className="mb-2 text-ink-soft" data-testid="quote-not-booked">Accepted, but the job is not booked in yet: the customer&apos;s link books it when opened again, or book it in here. Either way it is booked once.</p>
              {can(actor, "quotes.edit") ? <BillingForm action={bookQuoteAction} fields={[]} hidden={{ quoteId: quote.id }} submitLabel="Book the job in" testId="book-quote" /> : null}
            </Card>
          ) : null}
        </div>
      </div>
    </>
  );
}
