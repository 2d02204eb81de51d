"use client";
import type { FormEvent, ReactNode } from "react";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { buttonClass } from "@/components/ui/button";
import { RevealErrors } from "@/components/ui/reveal-errors";

export type StepDef = { id: string; title: string };

/** The current step from ?step=, so a reload or a shared link opens the same step. */
export function useStep(steps: StepDef[]) {
  const params = useSearchParams();
  const router = useRouter();
  const pathname = usePathname();
  const index = Math.max(0, steps.findIndex((s) => s.id === params.get("step")));
  const go = (i: number) => {
    const next = steps[Math.min(Math.max(i, 0), steps.length - 1)]!;
    router.push(`${pathname}?step=${next.id}`, { scroll: false });
    requestAnimationFrame(() => document.getElementById("wizard-step-title")?.focus());
  };
  return { index, step: steps[index]!, go };
}

/** Steps as a numbered list of links, the step's form with Back/Next, and the summary beside it. */
export function WizardShell({ steps, index, go, summary, strip, children, last, marks = {}, revealed = true, onNext }: {
  steps: StepDef[]; index: number; go: (i: number) => void; summary: ReactNode; strip?: ReactNode; children: ReactNode; last?: ReactNode;
  /** Problems per step id: the step's tab shows how many. */
  marks?: Record<string, number>;
  /**
   * Whether every field shows its errors and the tabs their marks; until then a field shows its own
   * once the user leaves it (src/components/ui/reveal-errors.tsx).
   */
  revealed?: boolean;
  /** Next was pressed: the wizard usually reveals every error from here on. */
  onNext?: () => void;
}) {
  const pathname = usePathname();
  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    onNext?.();
    if (index < steps.length - 1) go(index + 1);
  };
  return (
    // The steps span the summary's column too, so their tabs keep to one row on a desktop.
    <div className="flex flex-col">
      {strip}
      <nav aria-label="Plan steps" className="mb-4">
        <ol className="flex flex-wrap gap-2 lg:flex-nowrap">
          {steps.map((s, i) => (
            <li key={s.id}>
              <a
                href={`${pathname}?step=${s.id}`}
                onClick={(e) => { e.preventDefault(); go(i); }}
                aria-current={i === index ? "step" : undefined}
                className={`flex min-h-touch items-center gap-2 whitespace-nowrap rounded-md border px-3 ${i === index ? "border-steel bg-steel text-white" : "border-rule bg-paper-raised text-ink hover:bg-paper-sunk"}`}
                data-testid={`step-link-${s.id}`}
              >
                <span className="num">{i + 1}</span> {s.title}
                {revealed && marks[s.id] ? <span className="num rounded-full bg-stop px-2 text-caption text-white" aria-label={`${marks[s.id]} to fix`} data-testid={`step-mark-${s.id}`}>{marks[s.id]}</span> : null}
              </a>
            </li>
          ))}
        </ol>
      </nav>
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_300px]">
      <div className="min-w-0">
        <form onSubmit={onSubmit} noValidate aria-labelledby="wizard-step-title" className="flex flex-col gap-4">
          <h2 id="wizard-step-title" tabIndex={-1} className="text-title outline-none">
            {index + 1}. {steps[index]!.title}
          </h2>
          <RevealErrors value={revealed}>{children}</RevealErrors>
          <div className="no-print flex flex-wrap gap-3 border-t border-rule pt-4">
            <button type="button" className={buttonClass("secondary")} onClick={() => go(index - 1)} disabled={index === 0} data-testid="wizard-back">
              Back
            </button>
            {index < steps.length - 1 ? (
              <button type="submit" className={buttonClass("primary")} data-testid="wizard-next">
                Next: {steps[index + 1]!.title}
              </button>
            ) : (
              last
            )}
          </div>
        </form>
      </div>
      <aside className="lg:sticky lg:top-4 lg:self-start" aria-label="Plan summary">{summary}</aside>
    </div>
    </div>
  );
}
