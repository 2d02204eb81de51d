import { Card } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { LinesTable } from "@/components/billing/lines-table";
import { QuoteDecision } from "@/components/billing/quote-decision";
import { quoteForLink } from "@/server/billing/quotes";
import { decideQuoteAction } from "./actions";
import { dateTimeText } from "@/shared/time";

export const metadata = { title: "Your quote", robots: { index: false } };
export const dynamic = "force-dynamic";

export default async function PublicQuotePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const quote = await quoteForLink(token);
  if (!quote) return <Notice tone="info" title="This link is not valid any more">It may have been used already, or the shop has sent a newer one. Ask the shop if you need the quote again.</Notice>;
  if (quote.expired) return <Notice tone="caution" title="This quote's link has expired">Ask the shop for a new quote.</Notice>;
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-title">Quote from {quote.shopName}</h1>
      <p>For {quote.customerName}. {quote.note}</p>
      <Card>
        <LinesTable lines={quote.lines} totals={quote} testId="public-quote-lines" />
        {quote.estimatedMinutes ? <p className="num mt-2 text-ink-soft">Estimated machine time: {(quote.estimatedMinutes / 60).toFixed(2)} h.</p> : null}
      </Card>
      {quote.status === "sent" || quote.status === "accepted" ? <QuoteDecision action={decideQuoteAction} token={token} /> : null}
      <p className="text-caption text-ink-soft">The link works once{quote.expiresAt ? ` and until ${dateTimeText(quote.expiresAt, quote.timeZone)}` : ""}.</p>
    </div>
  );
}
