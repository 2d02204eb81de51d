import Link from "next/link";
import { BackLink } from "@/components/ui/back-link";
import { notFound } from "next/navigation";
import { Card, PageTitle } from "@/components/ui/card";
import { BillingForm } from "@/components/billing/billing-form";
import { BillingStatus } from "@/components/billing/status-badge";
import { LinesTable } from "@/components/billing/lines-table";
import { InvoiceDraftEditor } from "@/components/billing/invoice-draft-editor";
import { PRINT_CSS } from "@/components/billing/print";
import { pageActor } from "@/server/http/page";
import { getInvoice } from "@/server/billing/invoices";
import { can } from "@/shared/auth/policy";
import { moneyText } from "@/shared/billing/format";
import { amendInvoiceAction, issueInvoiceAction, payByCardAction, sendInvoiceAction, voidInvoiceAction } from "../actions";
import { dateTimeText } from "@/shared/time";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

export const metadata = { title: "Invoice" };


export default async function InvoicePage({ params }: { params: Promise<{ invoiceId: string }> }) {
  const { invoiceId } = await params;
  const actor = await pageActor("billing.view");
  const invoice = await getInvoice({ actor, invoiceId });
  const zone = await shopTimeZone(actor);
  const when = (d: Date | null) => (d ? dateTimeText(d, zone) : "—");
  if (!invoice) notFound();
  const hidden = { invoiceId: invoice.id };
  const draft = invoice.status === "draft";
  return (
    <>
      <style>{PRINT_CSS}</style>
      <PageTitle actions={<span className="no-print flex flex-wrap gap-4"><a href={`/api/invoices/${invoice.id}/pdf`} className="inline-flex min-h-touch items-center font-semibold text-steel underline" data-testid="invoice-pdf">PDF</a><BackLink href="/invoices">All invoices</BackLink></span>}>
        {invoice.numberText ? `Invoice ${invoice.numberText}` : "Draft invoice"} <BillingStatus status={invoice.status} testId="invoice-status" />
      </PageTitle>
      <div className="grid gap-4 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <Card className="print-sheet">
          <dl className="mb-3 grid gap-x-6 gap-y-1 sm:grid-cols-2">
            <div><dt className="text-caption text-ink-soft">Customer</dt><dd data-testid="invoice-customer">{invoice.customerName}{invoice.customerEmail ? ` · ${invoice.customerEmail}` : ""}</dd></div>
            <div><dt className="text-caption text-ink-soft">Job</dt><dd><Link href={`/jobs/${invoice.jobId}`} className="text-steel underline">#{invoice.jobNumber}</Link> · {invoice.engine}</dd></div>
            <div><dt className="text-caption text-ink-soft">Issued · due</dt><dd className="num">{when(invoice.issuedAt)} · {when(invoice.dueAt)}</dd></div>
            <div><dt className="text-caption text-ink-soft">Paid</dt><dd className="num" data-testid="invoice-paid-at">{when(invoice.paidAt)}</dd></div>
          </dl>
          {invoice.note ? <p className="mb-3">{invoice.note}</p> : null}
          <LinesTable lines={invoice.lines} totals={{ ...invoice, digits: invoice.currencyDigits }} testId="invoice-lines" />
          {invoice.status === "void" ? <p className="mt-3 font-semibold" data-testid="void-reason">Void: {invoice.voidReason}</p> : null}
          <p className="mt-3 text-caption text-ink-soft">Each line is rounded to a minor unit, tax is worked out per rate on the summed lines, and the total adds them with no further rounding.</p>
        </Card>
        <div className="no-print flex flex-col gap-4">
          {draft && can(actor, "invoices.issue") ? (
            <Card title="Issue">
              <p className="mb-2 text-ink-soft">Issuing numbers the invoice from the shop&apos;s sequence and freezes it: {moneyText(invoice.totalMinor, invoice.currency, invoice.currencyDigits)}.</p>
              <BillingForm action={issueInvoiceAction} fields={[]} hidden={hidden} submitLabel="Issue the invoice" testId="issue-invoice" />
            </Card>
          ) : null}
          {invoice.status === "issued" && can(actor, "invoices.edit") ? (
            <Card title="Pay by card">
              <p className="mb-2 text-ink-soft">Opens the payment page for {moneyText(invoice.totalMinor, invoice.currency, invoice.currencyDigits)}; hand the page to the customer or send them its address.</p>
              <BillingForm action={payByCardAction} fields={[]} hidden={hidden} submitLabel="Pay by card" testId="pay-by-card" />
              {invoice.checkoutUrl ? <p className="mt-2 break-all text-caption">Payment link: <a href={invoice.checkoutUrl} className="text-steel underline" data-testid="payment-link">{invoice.checkoutUrl}</a></p> : null}
            </Card>
          ) : null}
          {invoice.status === "issued" && can(actor, "invoices.edit") ? (
            <Card title="Send to the customer">
              <p className="mb-2 text-ink-soft">{invoice.customerEmail ? `E-mails ${invoice.customerEmail} the invoice as a PDF with the card payment link.` : "The invoice has no customer e-mail address."}</p>
              <BillingForm action={sendInvoiceAction} fields={[]} hidden={hidden} submitLabel="Send the invoice" testId="send-invoice" />
            </Card>
          ) : null}
          {invoice.status === "issued" && can(actor, "invoices.issue") ? (
            <Card title="Void">
              <BillingForm action={voidInvoiceAction} hidden={hidden} testId="void-invoice" submitLabel="Void the invoice" fields={[{ name: "reason", label: "Reason (kept with the invoice)", maxLength: 500 }]} />
            </Card>
          ) : null}
        </div>
      </div>
      {draft && can(actor, "invoices.edit") ? (
        <Card title="Edit the draft" className="no-print mt-4">
          <InvoiceDraftEditor key={invoice.version} action={amendInvoiceAction} draft={{
            id: invoice.id, version: invoice.version, customerName: invoice.customerName, customerEmail: invoice.customerEmail, note: invoice.note, currency: invoice.currency, digits: invoice.currencyDigits,
            lines: invoice.lines.map((l) => ({ position: l.position, description: l.description, quantityMilli: l.quantityMilli, unitPriceMinor: l.unitPriceMinor, taxRateBp: l.taxRateBp, source: l.source })),
          }} />
        </Card>
      ) : null}
    </>
  );
}
