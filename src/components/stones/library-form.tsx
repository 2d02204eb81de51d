"use client";
import { useState, type ReactNode } from "react";
import { Field, SelectField, inputClass } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { buttonClass } from "@/components/ui/button";
import { LengthInput } from "@/components/length-input";
import type { LengthUnit } from "@/lib/honing";
import type { FormAction } from "@/shared/action-result";
import { useActionForm } from "@/components/ui/use-action-form";


export type LibraryField = {
  name: string;
  label: string;
  unit?: string;
  hint?: string;
  kind?: "text" | "number" | "select" | "textarea" | "length";
  options?: Array<{ value: string; label: string }>;
  defaultValue?: string;
  /** A length field: its stored value, shown and read (when bare) in `lengthUnit`, the user's unit. */
  defaultUm?: number | null;
  lengthUnit?: LengthUnit;
  wide?: boolean;
  group?: string;
};

/**
 * The stone, rate-row and machine forms: controlled fields keep what was typed when the server
 * answers with field errors, and each error sits under its field. Works as a plain POST before hydration.
 */
export function LibraryForm<T>({ action, fields, hidden = {}, submitLabel, testId, children }: {
  action: FormAction<T>;
  fields: LibraryField[];
  hidden?: Record<string, string>;
  submitLabel: string;
  testId?: string;
  children?: ReactNode;
}) {
  const { state, formAction, pending, values, set, errorsOf } = useActionForm(action, fields);
  const groups = [...new Set(fields.map((f) => f.group ?? ""))];
  return (
    <form action={formAction} className="flex flex-col gap-5" data-testid={testId} noValidate>
      {Object.entries(hidden).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      {groups.map((group) => (
        <fieldset key={group || "main"} className="flex flex-col gap-3">
          {group ? <legend className="mb-2 text-lead font-semibold">{group}</legend> : null}
          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
            {fields.filter((f) => (f.group ?? "") === group).map((f) => (
              <div key={f.name} className={f.wide ? "sm:col-span-2 lg:col-span-3" : ""}>
                <FieldFor field={f} value={values[f.name] ?? ""} onChange={(v) => set(f.name, v)} errors={errorsOf(f.name)} />
              </div>
            ))}
          </div>
        </fieldset>
      ))}
      {children}
      {state && !state.ok && state.fieldErrors?._form ? <p className="text-stop">{state.fieldErrors._form.join(" ")}</p> : null}
      <div className="flex flex-wrap items-center gap-4">
        <button type="submit" className={buttonClass("primary")} disabled={pending} data-testid={testId ? `${testId}-submit` : undefined}>
          {pending ? "Saving…" : submitLabel}
        </button>
        <FormMessage state={state} />
      </div>
    </form>
  );
}

function FieldFor({ field: f, value, onChange, errors }: { field: LibraryField; value: string; onChange: (v: string) => void; errors?: string[] }) {
  if (f.kind === "length") return <LibraryLength field={f} errors={errors} />;
  if (f.kind === "select") {
    return (
      <SelectField label={f.label} name={f.name} errors={errors} value={value} onChange={(e) => onChange(e.target.value)}>
        {f.options?.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </SelectField>
    );
  }
  if (f.kind === "textarea") {
    const id = `field-${f.name}`;
    return (
      <div className="flex flex-col gap-1">
        <label htmlFor={id} className="font-semibold">{f.label}</label>
        <textarea id={id} name={f.name} value={value} onChange={(e) => onChange(e.target.value)} rows={2} aria-invalid={errors?.length ? true : undefined}
          aria-describedby={errors?.length ? `${id}-error` : undefined} className={`${inputClass} py-2`} />
        {f.hint && !errors?.length ? <p className="text-caption text-ink-faint">{f.hint}</p> : null}
        {errors?.length ? <p id={`${id}-error`} className="text-caption text-stop">{errors.join(" ")}</p> : null}
      </div>
    );
  }
  return (
    <Field label={f.label} name={f.name} unit={f.unit} hint={f.hint} errors={errors} value={value} onChange={(e) => onChange(e.target.value)}
      inputMode={f.kind === "number" ? "decimal" : undefined} autoComplete="off" className={f.kind === "number" ? "num" : ""} />
  );
}

/** Posts the typed text (the server reads a bare number in the same unit); the field checks it as typed. */
function LibraryLength({ field: f, errors }: { field: LibraryField; errors?: string[] }) {
  const [um, setUm] = useState<number | null>(f.defaultUm ?? null);
  return (
    <LengthInput label={f.label} name={f.name} unit={f.lengthUnit ?? "mm"} valueUm={um} onChange={setUm} errors={errors} hint={f.hint} testId={`field-${f.name}`} />
  );
}
