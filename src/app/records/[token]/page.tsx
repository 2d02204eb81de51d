import type { Metadata } from "next";
import { RecordSheet } from "@/components/records/record-sheet";
import { PrintButton } from "@/components/records/print-button";
import { buttonClass } from "@/components/ui/button";
import { BillingForm } from "@/components/billing/billing-form";
import { invoiceForRecordToken } from "@/server/billing/customer-payment";
import { recordForToken } from "@/server/records/links";
import { payRecordInvoiceAction } from "./actions";

export const metadata: Metadata = { title: "Machining record", robots: { index: false, follow: false }, referrer: "no-referrer" };

// The customer's read-only record (no account): the latest version behind a live link.
export default async function CustomerRecordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const found = await recordForToken(token);
  const invoice = found ? await invoiceForRecordToken(token) : null;
  return (
    <main className="mx-auto flex max-w-6xl flex-col gap-4 px-4 py-6">
      {found ? (
        <>
          <div className="no-print flex flex-wrap items-center gap-2">
            <a href={`/records/${token}/pdf`} className={buttonClass("secondary")} data-testid="record-download">
              Download the PDF
            </a>
            <PrintButton />
            {found.replaces ? (
              <p className="rounded-md bg-caution-light px-3 py-2 text-caution" data-testid="record-replaces-note">
                This is version {found.version} of the record; it replaces version {found.replaces}.
              </p>
            ) : null}
          </div>
          {invoice ? (
            <section className="no-print flex flex-wrap items-center gap-x-4 gap-y-2 rounded-lg border border-rule bg-paper-raised px-4 py-3" data-testid="record-invoice">
              <p>
                Invoice {invoice.numberText}: <span className="num font-semibold" data-testid="record-invoice-amount">{invoice.amount}</span>
              </p>
              {invoice.status === "paid" ? (
                <p className="rounded-md bg-pass-light px-3 py-2 font-semibold text-pass" data-testid="record-invoice-paid">Paid{invoice.paidOn ? ` on ${invoice.paidOn}` : ""}</p>
              ) : (
                <BillingForm action={payRecordInvoiceAction} fields={[]} hidden={{ token }} submitLabel="Pay invoice" testId="record-pay" />
              )}
            </section>
          ) : null}
          <div className="record-print-root">
            <RecordSheet record={found.record} version={{ number: found.version, replaces: found.replaces }} logoSrc={found.hasLogo ? `/records/${token}/logo` : null} />
          </div>
        </>
      ) : (
        <section className="rounded-lg border border-rule bg-paper-raised p-6" data-testid="record-link-dead">
          <h1 className="text-title">This link does not open a record</h1>
          <p className="mt-2 text-ink-soft">It may have expired or been withdrawn by the shop. Ask the shop that did the work for a new link; the PDF sent with the e-mail stays valid.</p>
        </section>
      )}
    </main>
  );
}
