import Link from "next/link";
import { Card, PageTitle } from "@/components/ui/card";
import { BillingForm } from "@/components/billing/billing-form";
import { BillingStatus } from "@/components/billing/status-badge";
import { pageActor } from "@/server/http/page";
import { listInvoices } from "@/server/billing/invoices";
import { listJobs } from "@/server/jobs/queries";
import { can } from "@/shared/auth/policy";
import { moneyText } from "@/shared/billing/format";
import { INVOICE_STATUSES } from "@/shared/billing/constants";
import { draftInvoiceAction } from "./actions";
import { dateText } from "@/shared/time";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

export const metadata = { title: "Invoices" };

const th = "px-2 py-1 text-left text-ink-soft";

export default async function InvoicesPage() {
  const actor = await pageActor("billing.view");
  const invoices = await listInvoices({ actor });
  const zone = await shopTimeZone(actor);
  const jobs = can(actor, "invoices.edit") ? (await listJobs({ actor, query: { status: "all", pageSize: 100 } })).rows : [];
  const sums = INVOICE_STATUSES.map((s) => ({ status: s, n: invoices.filter((i) => i.status === s).length }));
  return (
    <>
      <PageTitle actions={<><Link href="/quotes" className="inline-flex min-h-[24px] min-w-[24px] items-center text-steel underline">Quotes</Link>{can(actor, "billing.settings") ? <Link href="/settings/billing" className="inline-flex min-h-[24px] min-w-[24px] items-center text-steel underline">Price list</Link> : null}</>}>Invoices</PageTitle>
      <p className="mb-3 text-ink-soft" data-testid="invoice-counts">{sums.map((s) => `${s.n} ${s.status}`).join(" · ")}</p>
      <div className="mb-6 overflow-x-auto">
        <table className="w-full min-w-[640px] border-collapse text-body" data-testid="invoice-list">
          <thead><tr><th className={th}>Number</th><th className={th}>Job</th><th className={th}>Customer</th><th className={th}>Status</th><th className={th}>Issued</th><th className={`${th} text-right`}>Total</th></tr></thead>
          <tbody>
            {invoices.map((i) => (
              <tr key={i.id} className="border-t border-rule">
                <td className="px-2 py-1"><Link href={`/invoices/${i.id}`} className="inline-flex min-h-touch items-center text-steel underline">{i.numberText ?? "Draft"}</Link></td>
                <td className="num px-2 py-1">#{i.jobNumber}</td><td className="px-2 py-1">{i.customerName}</td>
                <td className="px-2 py-1"><BillingStatus status={i.status} /></td>
                <td className="num px-2 py-1">{i.issuedAt ? dateText(i.issuedAt, zone) : "—"}</td>
                <td className="num px-2 py-1 text-right">{moneyText(i.totalMinor, i.currency, i.currencyDigits)}</td>
              </tr>
            ))}
            {invoices.length === 0 ? <tr><td colSpan={6} className="px-2 py-3 text-ink-soft">No invoices yet.</td></tr> : null}
          </tbody>
        </table>
      </div>
      {jobs.length > 0 ? (
        <Card title="Draft an invoice from a job's run log">
          <BillingForm action={draftInvoiceAction} withId testId="draft-invoice" submitLabel="Draft the invoice" inline fields={[
            { name: "jobId", label: "Job", options: jobs.map((j) => ({ value: j.id, label: `#${j.number} · ${j.engineDescription}` })), defaultValue: jobs[0]!.id },
          ]} />
        </Card>
      ) : null}
    </>
  );
}
