"use client";
import { useId, useState } from "react";
import { inputClass } from "@/components/ui/field";

type Props = {
  label: string;
  value: number | null | undefined;
  /** The typed number; `null` for an empty optional field ("use the default"); `NaN` for anything else. */
  onChange: (value: number | null) => void;
  unit?: string;
  errors?: string[];
  hint?: string;
  optional?: boolean;
  testId?: string;
};

/** A plain number (rpm, degrees, pressure, %), with the same outside-change rule as LengthInput. */
export function NumberInput({ label, value, onChange, unit, errors, hint, optional, testId }: Props) {
  const id = useId();
  const [text, setText] = useState(value == null || !Number.isFinite(value) ? "" : String(value));
  const [seen, setSeen] = useState(value);
  if (!Object.is(seen, value)) {
    setSeen(value);
    if (value != null && Number.isFinite(value) && Number(text.replace(",", ".")) !== value) setText(String(value));
  }
  function change(next: string) {
    setText(next);
    if (next.trim() === "") return onChange(optional ? null : Number.NaN);
    const n = Number(next.replace(",", "."));
    onChange(Number.isFinite(n) ? n : Number.NaN);
  }
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">{label}</label>
      <div className="flex items-center gap-2">
        <input id={id} inputMode="decimal" autoComplete="off" className={`${inputClass} num`} value={text} data-testid={testId}
          aria-invalid={errors?.length ? true : undefined} aria-describedby={`${id}-note`} onChange={(e) => change(e.target.value)} />
        {unit ? <span className="num w-10 shrink-0 text-ink-soft">{unit}</span> : null}
      </div>
      <p id={`${id}-note`} className={`text-caption ${errors?.length ? "text-stop" : "text-ink-faint"}`}>{errors?.length ? errors.join(" ") : hint ?? ""}</p>
    </div>
  );
}
