"use client";
import { useActionState, useState } from "react";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { buttonClass } from "@/components/ui/button";
import { fieldErrorsOf, type FormAction } from "@/shared/action-result";
import { amountInput, quantityText } from "@/shared/billing/format";
import { lineFieldName } from "@/shared/billing/schema";

// A draft invoice edited in place: the header, every line's description, quantity, unit price and tax
// rate, lines to remove and one line to add, saved together (one version check on the server).
export type DraftLineRow = { position: number; description: string; quantityMilli: number; unitPriceMinor: number; taxRateBp: number; source: string };
type Draft = { id: string; version: number; customerName: string; customerEmail: string; note: string; currency: string; digits: number; lines: DraftLineRow[] };

function initialValues(draft: Draft): Record<string, string> {
  const values: Record<string, string> = { customerName: draft.customerName, customerEmail: draft.customerEmail, note: draft.note, lineDescription: "", lineQuantity: "1", lineUnitPrice: "", lineTaxRate: "0" };
  for (const l of draft.lines) {
    values[lineFieldName(l.position, "description")] = l.description;
    values[lineFieldName(l.position, "quantity")] = quantityText(l.quantityMilli);
    values[lineFieldName(l.position, "unitPrice")] = amountInput(l.unitPriceMinor, draft.digits);
    values[lineFieldName(l.position, "taxRate")] = String(l.taxRateBp / 100);
  }
  return values;
}

const cell = "grid gap-3 sm:grid-cols-[minmax(0,3fr)_repeat(3,minmax(0,1fr))] sm:items-start";

export function InvoiceDraftEditor<T>({ action, draft }: { action: FormAction<T>; draft: Draft }) {
  const [state, formAction, pending] = useActionState(action, null);
  const errors = (name: string) => fieldErrorsOf(state, name);
  // Controlled, so a refused save keeps what was typed (React resets an uncontrolled form after its action).
  const [values, setValues] = useState<Record<string, string>>(() => initialValues(draft));
  const bind = (name: string) => ({ name, value: values[name] ?? "", onChange: (e: { target: { value: string } }) => setValues((v) => ({ ...v, [name]: e.target.value })) });
  return (
    <form action={formAction} className="flex flex-col gap-4" data-testid="amend-invoice" noValidate>
      <input type="hidden" name="invoiceId" value={draft.id} />
      <input type="hidden" name="version" value={draft.version} />
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Customer" {...bind("customerName")} maxLength={120} errors={errors("customerName")} data-testid="amend-invoice-customerName" />
        <Field label="Customer's e-mail" {...bind("customerEmail")} inputMode="email" maxLength={254} errors={errors("customerEmail")} data-testid="amend-invoice-customerEmail" />
      </div>
      <Field label="Note" {...bind("note")} maxLength={2000} errors={errors("note")} data-testid="amend-invoice-note" />
      {draft.lines.map((l) => (
        <fieldset key={l.position} className="rounded-md border border-rule p-3" data-testid={`amend-line-${l.position}`}>
          <legend className="px-1 font-semibold">Line {l.position}{l.source !== "manual" ? <span className="ml-2 text-caption font-normal text-ink-soft">from the {l.source === "work" ? "run log" : "plan"}</span> : null}</legend>
          <div className={cell}>
            <Field label="Description" {...bind(lineFieldName(l.position, "description"))} maxLength={200} errors={errors(lineFieldName(l.position, "description"))} data-testid={`amend-line-${l.position}-description`} />
            <Field label="Quantity" {...bind(lineFieldName(l.position, "quantity"))} inputMode="decimal" maxLength={20} errors={errors(lineFieldName(l.position, "quantity"))} data-testid={`amend-line-${l.position}-quantity`} />
            <Field label="Unit price" unit={draft.currency} {...bind(lineFieldName(l.position, "unitPrice"))} inputMode="decimal" maxLength={20} errors={errors(lineFieldName(l.position, "unitPrice"))} data-testid={`amend-line-${l.position}-unitPrice`} />
            <Field label="Tax rate" unit="%" {...bind(lineFieldName(l.position, "taxRate"))} inputMode="decimal" maxLength={10} errors={errors(lineFieldName(l.position, "taxRate"))} />
          </div>
          <label className="mt-2 inline-flex min-h-touch items-center gap-2">
            <input type="checkbox" name="removePosition" value={l.position} className="size-5" data-testid={`amend-line-${l.position}-remove`} /> Remove this line
          </label>
        </fieldset>
      ))}
      <fieldset className="rounded-md border border-dashed border-rule p-3">
        <legend className="px-1 font-semibold">Add a line</legend>
        <div className={cell}>
          <Field label="Description" {...bind("lineDescription")} hint="e.g. a part or labour" maxLength={200} errors={errors("lineDescription")} data-testid="amend-invoice-lineDescription" />
          <Field label="Quantity" {...bind("lineQuantity")} inputMode="decimal" maxLength={20} errors={errors("lineQuantity")} data-testid="amend-invoice-lineQuantity" />
          <Field label="Unit price" unit={draft.currency} {...bind("lineUnitPrice")} inputMode="decimal" maxLength={20} errors={errors("lineUnitPrice")} data-testid="amend-invoice-lineUnitPrice" />
          <Field label="Tax rate" unit="%" {...bind("lineTaxRate")} inputMode="decimal" maxLength={10} errors={errors("lineTaxRate")} data-testid="amend-invoice-lineTaxRate" />
        </div>
      </fieldset>
      <div className="flex flex-col gap-1">
        <button type="submit" className={buttonClass("primary", "sm:self-start")} disabled={pending} data-testid="amend-invoice-submit">{pending ? "Working…" : "Save the draft"}</button>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
