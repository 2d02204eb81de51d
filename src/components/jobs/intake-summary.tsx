import { formatLength, formatOversizeStep } from "@/lib/honing";
import { Card } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import type { JobDetail } from "@/server/jobs/detail";
import { userText } from "@/shared/words/user-text";

function OversizeLine({ detail }: { detail: JobDetail }) {
  const { oversize } = detail.summary;
  const { units } = detail;
  if (!oversize) return <p className="text-ink-soft">Enter readings to see the proposed oversize.</p>;
  if (!oversize.ok) return <p className="font-semibold text-stop" data-testid="proposed-oversize">No oversize proposed: {oversize.message}</p>;
  const step = oversize.stepUm === 0 ? "standard size" : `${formatOversizeStep(oversize.stepUm)} oversize`;
  const allowance = detail.summary.allowance;
  return (
    <div data-testid="proposed-oversize">
      <p className="text-lead">
        Proposed: <strong>{step}</strong> → finished bore <span className="num font-semibold">{formatLength(oversize.finishedBoreUm, units.size)}</span>, bore to{" "}
        <span className="num">{formatLength(oversize.boreToUm, units.size)}</span>
      </p>
      <p className="text-caption text-ink-soft">
        Where a cylinder has its piston, the table sizes it as the plan will: piston + the pistons&apos; common target clearance, bore to = that − the honing allowance.
      </p>
      <p className="text-caption text-ink-soft">
        Rule: {userText(oversize.rule)}. Honing allowance <span className="num">{allowance ? formatLength(allowance.allowanceUm, units.small) : "—"}</span>
        {allowance ? <> (boring clean-up {formatLength(allowance.boringCleanupUm, units.small)} + coarse clean-up {formatLength(allowance.coarseCleanupUm, units.small)} + plateau {formatLength(allowance.plateauUm, units.small)} + margin {formatLength(allowance.marginUm, units.small)}, from the shop&apos;s stones and settings; the plan uses the same)</> : null}
        {oversize.wallAfterUm !== null ? <>; wall left about <span className="num">{formatLength(oversize.wallAfterUm, units.size)}</span></> : null}.
      </p>
    </div>
  );
}

/** The intake summary: worst bore, proposed oversize, stock per cylinder and every warning with numbers. */
export function IntakeSummaryCard({ detail }: { detail: JobDetail }) {
  const { summary, units } = detail;
  const measured = summary.cylinders.filter((c) => c.kind !== null);
  return (
    <Card title="Intake summary">
      <div className="flex flex-col gap-3" data-testid="intake-summary">
        <p>
          Worst bore:{" "}
          {summary.worst ? (
            <strong data-testid="worst-bore">
              cylinder {summary.worst.cylinder}, <span className="num">{formatLength(summary.worst.readingUm, units.size)}</span> largest reading
            </strong>
          ) : (
            <span className="text-ink-soft">no readings yet</span>
          )}
        </p>
        <OversizeLine detail={detail} />
        {measured.length > 0 ? (
          <div className="overflow-x-auto">
            <table className="w-full min-w-[32rem] text-body">
              <thead>
                <tr className="text-left text-caption text-ink-soft">
                  <th className="py-1">Cyl.</th><th>Smallest</th><th>Largest</th><th>Taper</th><th>Out-of-round</th><th>Finished</th><th>Bore to</th><th>Stock to finished</th>
                </tr>
              </thead>
              <tbody>
                {measured.map((c) => (
                  <tr key={c.cylinderId} className="border-t border-rule" data-testid={`summary-row-${c.number}`}>
                    <td className="py-1 num">{c.number}</td>
                    <td className="num">{formatLength(c.minUm!, units.size)}</td>
                    <td className="num">{formatLength(c.maxUm!, units.size)}</td>
                    <td className={`num ${c.taperOk === false ? "font-semibold text-stop" : ""}`}>{formatLength(c.taperUm!, units.small)}</td>
                    <td className={`num ${c.outOfRoundOk === false ? "font-semibold text-stop" : ""}`}>{formatLength(c.outOfRoundUm!, units.small)}</td>
                    <td className="num" data-testid={`summary-finished-${c.number}`}>
                      {c.finishedUm === null ? "—" : formatLength(c.finishedUm, units.size)}
                      {c.finishedFrom ? <span className="block text-caption text-ink-soft">{c.finishedFrom === "piston" ? `piston ${c.pistonLabel} + clearance` : "nominal oversize"}</span> : null}
                    </td>
                    <td className="num" data-testid={`summary-bore-to-${c.number}`}>{c.boreToUm === null ? "—" : formatLength(c.boreToUm, units.size)}</td>
                    <td className="num">{c.stockUm === null ? "—" : formatLength(c.stockUm, units.small)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        ) : null}
        {summary.warnings.length > 0 ? (
          <ul className="flex flex-col gap-2" data-testid="intake-warnings">
            {summary.warnings.map((w, i) => (
              <li key={`${w.code}-${w.cylinder ?? ""}-${i}`}>
                <Notice tone={w.tone}>{userText(w.message)}</Notice>
              </li>
            ))}
          </ul>
        ) : null}
        <p className="text-caption text-ink-faint">
          Tolerances: taper <span className="num">{formatLength(detail.settings.taperToleranceUm, units.small)}</span>, out-of-round{" "}
          <span className="num">{formatLength(detail.settings.outOfRoundToleranceUm, units.small)}</span> (the shop&apos;s settings; a finished bore must meet them).
        </p>
      </div>
    </Card>
  );
}
