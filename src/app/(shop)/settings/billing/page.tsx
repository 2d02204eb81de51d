import Link from "next/link";
import { BackLink } from "@/components/ui/back-link";
import { Card, PageTitle } from "@/components/ui/card";
import { BillingForm } from "@/components/billing/billing-form";
import { pageActor } from "@/server/http/page";
import { getBillingSetup } from "@/server/billing/settings";
import { PRICE_ITEM_KINDS, PRICE_ITEM_KIND_LABELS } from "@/shared/billing/constants";
import { amountText, rateText } from "@/shared/billing/format";
import { addPriceItemAction, addTaxRateAction, archivePriceItemAction, updateBillingSettingsAction } from "./actions";

export const metadata = { title: "Billing settings" };

export default async function BillingSettingsPage() {
  const actor = await pageActor("billing.settings", "/settings");
  const { settings, rates, items } = await getBillingSetup({ actor });
  const c = settings.currency;
  return (
    <>
      <BackLink href="/settings">Settings</BackLink>
      <PageTitle actions={<Link href="/invoices" className="inline-flex min-h-[24px] min-w-[24px] items-center text-steel underline">Invoices</Link>}>Billing settings</PageTitle>
      <div className="grid gap-4 lg:grid-cols-2">
        <Card title="Price list">
          <div className="overflow-x-auto">
            <table className="w-full border-collapse text-body" data-testid="price-list">
              <thead><tr><th className="px-2 py-1 text-left text-ink-soft">Item</th><th className="px-2 py-1 text-right text-ink-soft">Unit price ({c})</th><th className="px-2 py-1 text-right text-ink-soft">Tax</th><th /></tr></thead>
              <tbody>
                {items.map((i) => (
                  <tr key={i.id} className="border-t border-rule">
                    <td className="px-2 py-1">{i.name}<br /><span className="text-caption text-ink-soft">{PRICE_ITEM_KIND_LABELS[i.kind]}</span></td>
                    <td className="num px-2 py-1 text-right">{amountText(i.unitPriceMinor)}</td><td className="num px-2 py-1 text-right">{rateText(i.taxRateBp)}</td>
                    <td className="px-2 py-1 text-right">
                      <BillingForm action={archivePriceItemAction} fields={[]} hidden={{ itemId: i.id }} submitLabel="Remove" testId={`remove-${i.id}`} />
                    </td>
                  </tr>
                ))}
                {items.length === 0 ? <tr><td colSpan={4} className="px-2 py-2 text-ink-soft">No prices yet: quotes and invoices then draft only their manual lines.</td></tr> : null}
              </tbody>
            </table>
          </div>
          <h3 className="mb-2 mt-4 font-semibold">Add an item</h3>
          <BillingForm action={addPriceItemAction} withId testId="price-item" submitLabel="Add to the price list" fields={[
            { name: "kind", label: "Prices", options: PRICE_ITEM_KINDS.map((k) => ({ value: k, label: PRICE_ITEM_KIND_LABELS[k] })), defaultValue: "honing" },
            { name: "name", label: "Name on the quote and invoice", maxLength: 120 },
            { name: "unitPrice", label: "Unit price", unit: c, inputMode: "decimal", hint: "e.g. 45.50" },
            { name: "taxRateId", label: "Tax rate", options: [{ value: "", label: "No tax" }, ...rates.map((r) => ({ value: r.id, label: `${r.name} (${rateText(r.rateBp)})` }))], defaultValue: rates[0]?.id ?? "" },
          ]} />
        </Card>
        <div className="flex flex-col gap-4">
          <Card title="Tax rates">
            <ul className="mb-3" data-testid="tax-rates">{rates.map((r) => <li key={r.id} className="num">{r.name}: {rateText(r.rateBp)}</li>)}</ul>
            <BillingForm action={addTaxRateAction} withId testId="tax-rate" submitLabel="Add the rate" inline fields={[
              { name: "name", label: "Name", maxLength: 60 }, { name: "rate", label: "Rate", unit: "%", inputMode: "decimal" },
            ]} />
          </Card>
          <Card title="Currency, numbering, terms and time allowances">
            <BillingForm action={updateBillingSettingsAction} testId="billing-settings" submitLabel="Save" fields={[
              { name: "currency", label: "Currency (ISO 4217)", defaultValue: c, maxLength: 3 },
              { name: "invoicePrefix", label: "Invoice number prefix", defaultValue: settings.invoicePrefix, hint: `Next number: ${settings.invoicePrefix}${String(settings.lastInvoiceNumber + 1).padStart(5, "0")}`, maxLength: 12 },
              { name: "paymentTermsDays", label: "Payment terms", unit: "days", inputMode: "numeric", defaultValue: String(settings.paymentTermsDays) },
              { name: "paymentTermsNote", label: "Terms note on invoices", defaultValue: settings.paymentTermsNote },
              { name: "cylinderSetUpMin", label: "Set-up per cylinder", unit: "min", inputMode: "decimal", defaultValue: String(settings.cylinderSetUpMin) },
              { name: "stoneChangeMin", label: "Per stone change", unit: "min", inputMode: "decimal", defaultValue: String(settings.stoneChangeMin) },
              { name: "jobSetUpMin", label: "Job set-up (torque plate)", unit: "min", inputMode: "decimal", defaultValue: String(settings.jobSetUpMin) },
            ]} />
          </Card>
        </div>
      </div>
    </>
  );
}
