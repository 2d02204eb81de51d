import type { PlanPreview } from "@/server/plans/preview";
import { isHoneStage } from "./stages-table";
import { fixed, size, small, type DisplayUnits } from "@/shared/units";
import { cylinderStatus, stageStrokes } from "./summary-words";

const TONE = { stop: "text-stop", caution: "text-caution", pass: "text-pass" } as const;

/** Always beside the steps: per cylinder the target, stock and strokes per stage, and the status. */
export function PlanSummary({ preview, units, loading, error, title }: { preview: PlanPreview | null; units: DisplayUnits; loading: boolean; error: string | null; title: string }) {
  const first = preview?.cylinders.find((c) => c.plan?.stages.some(isHoneStage))?.plan?.stages.find(isHoneStage);
  return (
    <section className="rounded-lg border border-rule bg-paper-raised p-4" data-testid="plan-summary">
      <div className="mb-2 flex items-center gap-2">
        <h2 className="text-lead font-semibold">{title}</h2>
        <span className="ml-auto text-caption text-ink-soft" aria-live="polite">{loading ? "Updating…" : preview ? "Up to date" : ""}</span>
      </div>
      {error ? <p className="mb-2 text-stop" role="alert">{error}</p> : null}
      {!preview ? (
        <p className="text-ink-soft">Fill in the fields to see the plan.</p>
      ) : (
        <>
          <p className="text-caption text-ink-soft">{preview.machine.name}{first ? ` · ${fixed(first.speeds.spindleRpm, 0)} rpm · ${fixed(first.speeds.doubleStrokesPerMin)} double strokes/min · ${fixed(first.speeds.includedAngleDeg)}°` : ""}</p>
          <ul className="mt-2 flex flex-col gap-1">
            {preview.cylinders.map((c) => {
              const status = cylinderStatus(c);
              return (
                <li key={c.cylinder} className="border-t border-rule pt-1" data-testid={`summary-cylinder-${c.cylinder}`}>
                  <div className="flex items-baseline gap-2">
                    <span className="font-semibold">Cylinder {c.cylinder}</span>
                    <span className="num">{size(c.plan?.sizing?.targetUm, units)}</span>
                    <span className={`ml-auto text-caption font-semibold ${TONE[status.tone]}`} data-testid={`summary-status-${c.cylinder}`}>{status.text}</span>
                  </div>
                  <p className="num text-caption text-ink-soft">
                    stock {small(c.plan?.stock?.totalUm, units)}
                    {c.plan?.stages.length ? ` · ${stageStrokes(c.plan.stages)}` : ""}
                  </p>
                </li>
              );
            })}
          </ul>
          <p className="mt-2 text-caption" data-testid="summary-counts">
            <span className={preview.errorCount ? "font-semibold text-stop" : ""}>{preview.errorCount} {preview.errorCount === 1 ? "error" : "errors"}</span> · {preview.warningCount} {preview.warningCount === 1 ? "warning" : "warnings"}
          </p>
        </>
      )}
    </section>
  );
}

/** The summary on narrow screens: one sticky line that stays in view while the step scrolls. */
export function PlanStrip({ preview, units, loading }: { preview: PlanPreview | null; units: DisplayUnits; loading: boolean }) {
  return (
    <div className="sticky top-0 z-10 -mx-4 mb-3 border-b border-rule bg-paper-raised/95 px-4 py-2 backdrop-blur lg:hidden" data-testid="plan-strip" aria-hidden="true">
      {!preview ? (
        <p className="text-caption text-ink-soft">{loading ? "Updating…" : "Fill in the fields to see the plan."}</p>
      ) : (
        <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-caption">
          {preview.cylinders.map((c) => {
            const bad = c.needs.length + (c.plan?.errors.length ?? 0) > 0;
            return (
              <span key={c.cylinder} className={`num rounded px-1 ${bad ? "bg-stop-light text-stop" : "bg-pass-light text-pass"}`}>
                {c.cylinder}: {size(c.plan?.sizing?.targetUm, units)}
              </span>
            );
          })}
          <span className="ml-auto text-ink-soft">{preview.errorCount} {preview.errorCount === 1 ? "error" : "errors"} · {preview.warningCount} {preview.warningCount === 1 ? "warning" : "warnings"} · {loading ? "updating…" : "up to date"}</span>
        </div>
      )}
    </div>
  );
}
