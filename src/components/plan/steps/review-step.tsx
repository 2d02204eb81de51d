import { Cautions } from "../cautions";
import { IssuesList } from "../issues-list";
import type { Blocker } from "../review-blockers";
import type { Options, StepProps } from "./types";

type ReviewProps<D> = StepProps<D> & {
  blockers: Blocker[];
  loading: boolean;
  /** The step a blocker sits on, as this wizard names it, with its title. */
  stepOf: (b: Blocker) => { id: string; title: string; index: number };
  go: (index: number) => void;
};

/** Step 5: everything that blocks saving or release, each linked to its step; then warnings and cautions. */
export function ReviewStep<D extends Options>({ preview, units, stoneName, blockers, loading, stepOf, go }: ReviewProps<D>) {
  const widened = preview?.cylinders.find((c) => c.plan?.sizing?.bandWideningUm)?.plan?.sizing?.bandWideningUm;
  return (
    <>
      {loading && blockers.length === 0 ? <p className="text-ink-soft" data-testid="review-verdict">Checking the plan…</p> : blockers.length === 0 ? (
        <p className="text-pass" data-testid="review-verdict">No errors: this plan can be released once saved.</p>
      ) : (
        <div data-testid="review-blockers">
          <p className="text-stop" data-testid="review-verdict">{blockers.length} problem{blockers.length === 1 ? "" : "s"} to resolve before release:</p>
          <ul className="mt-2 flex flex-col gap-1">
            {blockers.map((b, i) => {
              const step = stepOf(b);
              return (
                <li key={i} className="flex flex-wrap items-center gap-2" data-testid={`blocker-${step.id}`}>
                  <button type="button" className="min-h-touch rounded-md border border-stop px-2 text-stop underline" onClick={() => go(step.index)}>
                    {step.index + 1}. {step.title}
                  </button>
                  <span>{b.text}</span>
                </li>
              );
            })}
          </ul>
        </div>
      )}
      {widened ? <p className="text-caution" data-testid="review-widened">The band&apos;s upper limit is widened by {widened} µm by your choice: the final check accepts that looser bore.</p> : null}
      <h3 className="font-semibold">Warnings and errors</h3>
      <IssuesList cylinders={preview?.cylinders ?? []} units={units} stoneName={stoneName} emptyText="No warnings." />
      <Cautions />
    </>
  );
}
