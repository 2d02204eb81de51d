"use client";
import { useActionState, useRef, useState } from "react";
import { Field, SelectField } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { buttonClass } from "@/components/ui/button";
import { fieldErrorsOf, type FormAction } from "@/shared/action-result";
import { newClientId } from "@/shared/client-id";

// A billing settings form: labelled fields with their units, field errors under them, and (for a
// create) the device's id for the new row, renewed after each success so a retry is written once.
export type BillingField = { name: string; label: string; unit?: string; hint?: string; defaultValue?: string; inputMode?: "decimal" | "numeric" | "text" | "email"; options?: { value: string; label: string }[]; maxLength?: number };

export function BillingForm<T>({ action, fields, submitLabel, withId = false, hidden = {}, testId, inline = false }: {
  action: FormAction<T>; fields: BillingField[]; submitLabel: string; withId?: boolean; hidden?: Record<string, string>; testId?: string; inline?: boolean;
}) {
  const id = useRef(newClientId());
  const [state, formAction, pending] = useActionState(async (previous: Awaited<ReturnType<FormAction<T>>> | null, formData: FormData) => {
    if (withId) formData.set("id", id.current);
    const result = await action(previous, formData);
    if (result.ok && withId) id.current = newClientId();
    return result;
  }, null);
  const [values, setValues] = useState<Record<string, string>>(() => Object.fromEntries(fields.map((f) => [f.name, f.defaultValue ?? ""])));
  return (
    <form action={formAction} className={inline ? "grid items-end gap-3 sm:grid-cols-2 lg:grid-cols-4" : "flex flex-col gap-3"} data-testid={testId} noValidate>
      {Object.entries(hidden).map(([name, value]) => <input key={name} type="hidden" name={name} value={value} />)}
      {fields.map((f) =>
        f.options ? (
          <SelectField key={f.name} label={f.label} name={f.name} errors={fieldErrorsOf(state, f.name)} value={values[f.name]} onChange={(e) => setValues({ ...values, [f.name]: e.target.value })} data-testid={`${testId}-${f.name}`}>
            {f.options.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
          </SelectField>
        ) : (
          <Field key={f.name} label={f.label} name={f.name} unit={f.unit} hint={f.hint} inputMode={f.inputMode} maxLength={f.maxLength ?? 300} errors={fieldErrorsOf(state, f.name)}
            value={values[f.name] ?? ""} onChange={(e) => setValues({ ...values, [f.name]: e.target.value })} data-testid={`${testId}-${f.name}`} />
        ),
      )}
      <div className="flex flex-col gap-1">
        <button type="submit" className={buttonClass("primary", "sm:self-start")} disabled={pending} data-testid={`${testId}-submit`}>{pending ? "Working…" : submitLabel}</button>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
