"use client";
import { useId, useState } from "react";
import { formatLength, parseLength, type LengthUnit } from "@/lib/honing";
import { inputClass } from "@/components/ui/field";

const UNIT_LABEL: Record<LengthUnit, string> = { mm: "mm", in: "in", thou: "thou", um: "µm" };

type Props = {
  label: string;
  name: string;
  valueUm: number | null;
  onChange: (um: number | null) => void;
  /** The unit a bare number means (the user's unit system). */
  unit: LengthUnit;
  errors?: string[];
  hint?: string;
  required?: boolean;
  testId?: string;
};

/**
 * A length field that accepts "93.92 mm", "3.6977 in", "2.8 thou", "70 µm" or a bare number in the
 * user's unit (DESIGN.md §5); it shows what it understood, or the reason it could not.
 */
export function LengthInput({ label, name, valueUm, onChange, unit, errors, hint, required, testId }: Props) {
  const id = useId();
  const [text, setText] = useState(valueUm === null ? "" : formatLength(valueUm, unit).replace(/\s.*$/, ""));
  const [problem, setProblem] = useState<string | null>(null);
  const update = (next: string) => {
    setText(next);
    if (next.trim() === "") {
      setProblem(required ? "Required." : null);
      onChange(null);
      return;
    }
    const parsed = parseLength(next, unit);
    setProblem(parsed.ok ? null : parsed.error);
    onChange(parsed.ok ? parsed.um : null);
  };
  const shown = problem ? [problem] : errors;
  const understood = !problem && valueUm !== null && /[a-zµ"]/i.test(text) ? `= ${formatLength(valueUm, unit)}` : null;
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
          onChange={(e) => update(e.target.value)}
          aria-invalid={shown?.length ? true : undefined}
          aria-describedby={`${id}-note`}
          className={`${inputClass} num`}
          data-testid={testId}
        />
        <span className="num w-10 text-ink-soft">{UNIT_LABEL[unit]}</span>
      </div>
      <p id={`${id}-note`} className={`text-caption ${shown?.length ? "text-stop" : "text-ink-faint"}`}>
        {shown?.length ? shown.join(" ") : understood ?? hint ?? `A bare number is in ${UNIT_LABEL[unit]}; or add mm, in, thou, µm.`}
      </p>
    </div>
  );
}
