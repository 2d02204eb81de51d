import Link from "next/link";
import { Notice } from "@/components/ui/notice";

export const metadata = { title: "Payment", robots: { index: false } };

// Where the payment page returns to. It shows only what the address says: the invoice turns paid
// when the provider's signed webhook arrives, never because someone opened this page.
export default async function PaidPage({ searchParams }: { searchParams: Promise<{ invoice?: string; cancelled?: string }> }) {
  const { invoice, cancelled } = await searchParams;
  const number = invoice && /^[A-Za-z0-9/-]{1,24}$/.test(invoice) ? invoice : null;
  if (cancelled) return <Notice tone="info" title="Payment not made">Nothing was charged{number ? ` for invoice ${number}` : ""}. You can pay later from the same link.</Notice>;
  return (
    <div className="flex flex-col gap-3" data-testid="paid-page">
      <h1 className="text-title">Thank you</h1>
      <p>Your card payment{number ? ` for invoice ${number}` : ""} went through. The shop sees the invoice as paid as soon as the payment service confirms it.</p>
      <p className="text-ink-soft">Staff of the shop: <Link href="/invoices" className="text-steel underline">open the invoices</Link>.</p>
    </div>
  );
}
