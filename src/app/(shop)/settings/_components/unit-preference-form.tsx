"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { buttonClass } from "@/components/ui/button";
import { setUnitSystemAction } from "../actions";

const CHOICES = [
  { value: "metric", label: "Metric", example: "86.045 mm" },
  { value: "inch", label: "Inch", example: "3.3876 in" },
] as const;

export function UnitPreferenceForm({ current }: { current: "metric" | "inch" }) {
  const [state, action, pending] = useActionState(setUnitSystemAction, null);
  return (
    <form action={action} className="flex flex-col gap-3" data-testid="unit-form">
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-ink-soft">Lengths on every screen are shown in:</legend>
        {CHOICES.map((c) => (
          <label key={c.value} className="flex min-h-touch cursor-pointer items-center gap-3 rounded-md border border-rule px-3 has-[:checked]:border-steel has-[:checked]:bg-steel-light">
            <input type="radio" name="unitSystem" value={c.value} defaultChecked={current === c.value} className="size-[24px] shrink-0 accent-steel" />
            <span className="font-semibold">{c.label}</span>
            <span className="num ml-auto text-ink-soft">{c.example}</span>
          </label>
        ))}
      </fieldset>
      <button type="submit" className={buttonClass("primary", "self-start")} disabled={pending}>
        Save units
      </button>
      <FormMessage state={state} />
    </form>
  );
}
