import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

type FieldProps = {
  label: ReactNode;
  name: string;
  errors?: string[];
  hint?: ReactNode;
  unit?: string;
};

export const inputClass =
  "min-h-touch w-full rounded-md border border-rule-strong bg-white px-3 text-body aria-[invalid=true]:border-stop";

/** A labelled input with its unit beside it and its errors read out by screen readers. */
export function Field({ label, name, errors, hint, unit, id, className = "", ...input }: FieldProps & InputHTMLAttributes<HTMLInputElement>) {
  const inputId = id ?? `field-${name}`;
  const describedBy = errors?.length ? `${inputId}-error` : hint ? `${inputId}-hint` : undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={inputId} className="font-semibold">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <input id={inputId} name={name} aria-invalid={errors?.length ? true : undefined} aria-describedby={describedBy} className={`${inputClass} ${className}`} {...input} />
        {unit ? <span className="num text-ink-soft">{unit}</span> : null}
      </div>
      {hint && !errors?.length ? <p id={`${inputId}-hint`} className="text-caption text-ink-faint">{hint}</p> : null}
      {errors?.length ? (
        <p id={`${inputId}-error`} className="text-caption text-stop">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

export function SelectField({ label, name, errors, children, id, ...select }: FieldProps & SelectHTMLAttributes<HTMLSelectElement>) {
  const selectId = id ?? `field-${name}`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={selectId} className="font-semibold">
        {label}
      </label>
      <select id={selectId} name={name} aria-invalid={errors?.length ? true : undefined} className={inputClass} {...select}>
        {children}
      </select>
      {errors?.length ? <p className="text-caption text-stop">{errors.join(" ")}</p> : null}
    </div>
  );
}
