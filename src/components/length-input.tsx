"use client";
import { useId, useState } from "react";
import { formatLength, parseLength, type LengthUnit } from "@/lib/honing";
import { inputClass } from "@/components/ui/field";
import { useFieldReveal } from "@/components/ui/reveal-errors";
import { UNIT_LABEL, bareNumberHint, lengthText } from "./length-text";

type Props = {
  label: string;
  valueUm: number | null | undefined;
  /**
   * The typed length in µm; `null` when the field is empty; `NaN` when the text is not a length (the
   * field shows why, and a schema refuses NaN, so bad text is never mistaken for "left empty").
   */
  onChange: (um: number | null) => void;
  /** The unit a bare number means: the user's unit system (DESIGN.md §5). */
  unit: LengthUnit;
  /** Posted with a plain form submit (the typed text; the server parses it with the same unit). */
  name?: string;
  errors?: string[];
  hint?: string;
  /** Empty is a valid answer ("not known", "use the default"); otherwise emptying says a length is needed. */
  optional?: boolean;
  testId?: string;
};

/**
 * A length field that accepts "86.05 mm", "3.3878 in", "1.9 thou", "70 µm" or a bare number in the
 * user's unit; it shows what it understood, or the reason it could not.
 */
export function LengthInput({ label, valueUm, onChange, unit, name, errors, hint, optional, testId }: Props) {
  const id = useId();
  const [text, setText] = useState(() => lengthText(valueUm, unit));
  const [problem, setProblem] = useState<string | null>(null);
  const reveal = useFieldReveal();

  // Follow outside changes (a restored draft, a reset form) without fighting what the user is typing:
  // the text is replaced only when it no longer means the value it is given.
  const [seen, setSeen] = useState(valueUm);
  if (!Object.is(seen, valueUm)) {
    setSeen(valueUm);
    const parsed = parseLength(text, unit);
    const follows = valueUm != null && Number.isFinite(valueUm) && (!parsed.ok || Math.abs(parsed.um - valueUm) > 1e-6);
    if (follows) {
      setText(lengthText(valueUm, unit));
      setProblem(null);
    }
  }

  function change(next: string) {
    setText(next);
    if (next.trim() === "") {
      const empty = parseLength("", unit);
      setProblem(optional || empty.ok ? null : empty.error);
      onChange(null);
      return;
    }
    const parsed = parseLength(next, unit);
    setProblem(parsed.ok ? null : parsed.error);
    onChange(parsed.ok ? parsed.um : Number.NaN);
  }

  const shown = reveal.shown ? (problem ? [problem] : errors) : undefined;
  const understood = !problem && !shown?.length && valueUm != null && Number.isFinite(valueUm) && /[a-zµμ"″']/i.test(text) ? `= ${formatLength(valueUm, unit)}` : null;
  const note = shown?.length ? shown.join(" ") : (understood ?? hint ?? bareNumberHint(unit));
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={id}
          name={name}
          inputMode="decimal"
          autoComplete="off"
          value={text}
          onChange={(e) => change(e.target.value)}
          onBlur={reveal.onBlur}
          aria-invalid={shown?.length ? true : undefined}
          aria-describedby={`${id}-note`}
          className={`${inputClass} num`}
          data-testid={testId}
        />
        <span className="num w-10 shrink-0 text-ink-soft" data-testid={testId ? `${testId}-unit` : undefined}>{UNIT_LABEL[unit]}</span>
      </div>
      <p id={`${id}-note`} className={`text-caption ${shown?.length ? "text-stop" : "text-ink-faint"}`}>
        {note}
      </p>
    </div>
  );
}
