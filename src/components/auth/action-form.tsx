"use client";
import type { ReactNode } from "react";
import { Field, SelectField } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { buttonClass } from "@/components/ui/button";
import type { FormAction } from "@/shared/action-result";
import { useActionForm } from "@/components/ui/use-action-form";


export type FieldSpec = {
  name: string;
  label: string;
  type?: "text" | "email" | "password" | "select";
  autoComplete?: string;
  hint?: ReactNode;
  minLength?: number;
  maxLength?: number;
  required?: boolean;
  defaultValue?: string;
  options?: Array<{ value: string; label: string }>;
};

/**
 * A server-action form: fields keep what was typed (except passwords) when the server answers with
 * field errors; the status line is read out (aria-live). Works before hydration as a plain POST.
 */
export function ActionForm<T>({
  action,
  fields,
  submitLabel,
  hidden = {},
  testId,
  danger = false,
  children,
}: {
  action: FormAction<T>;
  fields: FieldSpec[];
  submitLabel: string;
  hidden?: Record<string, string>;
  testId?: string;
  danger?: boolean;
  children?: ReactNode;
}) {
  const { state, formAction, pending, values, set, errorsOf } = useActionForm(action, fields, { resetOnSuccess: true });
  return (
    <form action={formAction} className="flex flex-col gap-4" data-testid={testId} noValidate>
      {Object.entries(hidden).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      {fields.map((f) =>
        f.type === "select" ? (
          <SelectField key={f.name} label={f.label} name={f.name} errors={errorsOf(f.name)} value={values[f.name]} onChange={(e) => set(f.name, e.target.value)}>
            {f.options?.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </SelectField>
        ) : (
          <Field
            key={f.name}
            label={f.label}
            name={f.name}
            type={f.type ?? "text"}
            autoComplete={f.autoComplete}
            hint={f.hint}
            minLength={f.minLength}
            maxLength={f.maxLength}
            required={f.required ?? true}
            errors={errorsOf(f.name)}
            {...(f.type === "password" ? {} : { value: values[f.name] ?? "", onChange: (e) => set(f.name, e.target.value) })}
          />
        ),
      )}
      {children}
      <div className="flex flex-col gap-2">
        <button type="submit" className={buttonClass(danger ? "danger" : "primary", "w-full sm:w-auto sm:self-start")} disabled={pending}>
          {pending ? "Working…" : submitLabel}
        </button>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
