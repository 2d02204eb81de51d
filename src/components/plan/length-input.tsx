"use client";
import { useId, useState } from "react";
import { formatLength, fromUm, parseLength, type LengthUnit } from "@/lib/honing";
import { inputClass } from "@/components/ui/field";

type Props = {
  label: string;
  valueUm: number | null | undefined;
  /** A parsed length in µm, null for an empty optional field, NaN for text that is not a length. */
  onChange: (um: number | null) => void;
  unit: LengthUnit;
  errors?: string[];
  hint?: string;
  optional?: boolean;
  testId?: string;
};

const toText = (um: number | null | undefined, unit: LengthUnit) => (um == null || !Number.isFinite(um) ? "" : String(fromUm(um, unit)));

/** A length typed with or without its unit ("93.92 mm", "2.8 thou", "70 µm"); bare numbers are in `unit`. */
export function LengthInput({ label, valueUm, onChange, unit, errors, hint, optional, testId }: Props) {
  const id = useId();
  const [text, setText] = useState(() => toText(valueUm, unit));
  const [parseError, setParseError] = useState<string | null>(null);

  // Follow outside changes (a restored draft) without fighting what the user is typing.
  const [seen, setSeen] = useState(valueUm);
  if (!Object.is(seen, valueUm)) {
    setSeen(valueUm);
    const parsed = parseLength(text, unit);
    if (valueUm != null && Number.isFinite(valueUm) && (!parsed.ok || Math.abs(parsed.um - valueUm) > 1e-6)) setText(toText(valueUm, unit));
  }

  function change(next: string) {
    setText(next);
    if (optional && next.trim() === "") {
      setParseError(null);
      onChange(null);
      return;
    }
    const parsed = parseLength(next, unit);
    setParseError(parsed.ok ? null : parsed.error);
    onChange(parsed.ok ? parsed.um : Number.NaN);
  }

  const shown = parseError ? [parseError] : errors;
  const described = shown?.length ? `${id}-error` : `${id}-hint`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={id} inputMode="decimal" autoComplete="off" className={`${inputClass} num`} value={text} data-testid={testId}
          aria-invalid={shown?.length ? true : undefined} aria-describedby={described} onChange={(e) => change(e.target.value)}
        />
        <span className="num w-10 text-ink-soft">{formatLength(0, unit).split(" ")[1]}</span>
      </div>
      {shown?.length ? (
        <p id={`${id}-error`} className="text-caption text-stop">{shown.join(" ")}</p>
      ) : (
        <p id={`${id}-hint`} className="text-caption text-ink-faint">{hint ?? `A bare number is in ${formatLength(0, unit).split(" ")[1]}; or type the unit.`}</p>
      )}
    </div>
  );
}

/** A plain number (rpm, degrees, pressure, %); empty means "use the default" when optional. */
export function NumberInput({ label, value, onChange, unit, errors, hint, optional, testId }: {
  label: string; value: number | null | undefined; onChange: (v: number | null) => void; unit?: string; errors?: string[]; hint?: string; optional?: boolean; testId?: string;
}) {
  const id = useId();
  const [text, setText] = useState(value == null || !Number.isFinite(value) ? "" : String(value));
  const [seen, setSeen] = useState(value);
  if (!Object.is(seen, value)) {
    setSeen(value);
    if (value != null && Number.isFinite(value) && Number(text) !== value) setText(String(value));
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
        {unit ? <span className="num w-10 text-ink-soft">{unit}</span> : null}
      </div>
      <p id={`${id}-note`} className={`text-caption ${errors?.length ? "text-stop" : "text-ink-faint"}`}>{errors?.length ? errors.join(" ") : hint ?? ""}</p>
    </div>
  );
}
