"use client";
import { useId, useState } from "react";
import { inputClass } from "@/components/ui/field";
import { useFieldReveal } from "@/components/ui/reveal-errors";
import type { ParseQuantityResult } from "@/shared/quantity";

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
  /** Reads a number typed with its unit ("9 bar", "250 rpm") into the stored unit; default: a bare number. */
  parse?: (text: string) => ParseQuantityResult;
};

const bare = (text: string): ParseQuantityResult => {
  const n = Number(text.replace(",", "."));
  return Number.isFinite(n) ? { ok: true, value: n } : { ok: false, error: "Enter a number." };
};

/** A plain number (rpm, degrees, pressure, %), with the same outside-change rule as LengthInput. */
export function NumberInput({ label, value, onChange, unit, errors, hint, optional, testId, parse = bare }: Props) {
  const id = useId();
  const [text, setText] = useState(value == null || !Number.isFinite(value) ? "" : String(value));
  const [seen, setSeen] = useState(value);
  const [typedError, setTypedError] = useState<string | null>(null);
  const reveal = useFieldReveal();
  if (!Object.is(seen, value)) {
    setSeen(value);
    const shown = parse(text);
    if (value != null && Number.isFinite(value) && !(shown.ok && shown.value === value)) setText(String(value));
  }
  function change(next: string) {
    setText(next);
    if (next.trim() === "") {
      setTypedError(null);
      return onChange(optional ? null : Number.NaN);
    }
    const parsed = parse(next);
    setTypedError(parsed.ok ? null : parsed.error);
    onChange(parsed.ok ? parsed.value : Number.NaN);
  }
  const shownErrors = reveal.shown ? (typedError ? [typedError] : errors) : undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">{label}</label>
      <div className="flex items-center gap-2">
        <input id={id} inputMode="decimal" autoComplete="off" className={`${inputClass} num`} value={text} data-testid={testId}
          aria-invalid={shownErrors?.length ? true : undefined} aria-describedby={`${id}-note`} onChange={(e) => change(e.target.value)} onBlur={reveal.onBlur} />
        {unit ? <span className="num w-10 shrink-0 text-ink-soft">{unit}</span> : null}
      </div>
      <p id={`${id}-note`} className={`text-caption ${shownErrors?.length ? "text-stop" : "text-ink-faint"}`}>{shownErrors?.length ? shownErrors.join(" ") : hint ?? ""}</p>
    </div>
  );
}
