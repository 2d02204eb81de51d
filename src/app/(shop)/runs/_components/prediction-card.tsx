import { medianAbsoluteError } from "@/lib/honing";
import { Card } from "@/components/ui/card";
import { PredictionChartLazy } from "@/components/learning/prediction-chart-lazy";
import type { PredictionPoint } from "@/server/run-log/queries";
import { fixed } from "@/shared/units";
import { dateText } from "@/shared/time";

/** Predicted vs done strokes per observed run: the table alone, and with what had been learned by then. */
export function PredictionCard({ points, timeZone }: { points: PredictionPoint[]; timeZone: string }) {
  if (points.length === 0) {
    return <Card title="Predicted vs done strokes"><p className="text-ink-soft">No run under these filters has a reading before and after it yet.</p></Card>;
  }
  const tableError = medianAbsoluteError(points.map((p) => ({ predicted: p.table, actual: p.actual })));
  const learnedError = medianAbsoluteError(points.filter((p) => p.learned !== null).map((p) => ({ predicted: p.learned!, actual: p.actual })));
  return (
    <Card title="Predicted vs done strokes">
      <p className="mb-2" data-testid="prediction-summary">
        Over the newest {points.length} measured run{points.length === 1 ? "" : "s"}: the table alone was off by a median of <span className="num">{fixed(tableError, 1)}</span> double strokes
        {learnedError === null ? "." : <>, the learned rate of the time by <span className="num">{fixed(learnedError, 1)}</span>.</>}
      </p>
      <PredictionChartLazy points={points} testId="prediction-chart" />
      <p className="text-caption text-ink-soft">Predicted: the strokes that would remove the stock the run really removed, by the table&apos;s rate, and by the table × the learned multiplier held just before the run. On the dashed diagonal the prediction was exact.</p>
      <details className="mt-3">
        <summary className="min-h-touch cursor-pointer py-2 text-steel">The same runs as a table</summary>
        <div className="relative max-h-96 overflow-auto" tabIndex={0} role="region" aria-label="Predicted and done strokes per run">
          <table className="w-full text-left" data-testid="prediction-table">
            <thead className="text-caption uppercase text-ink-soft">
              <tr><th scope="col" className="px-2 py-1">When</th><th scope="col" className="px-2 py-1 text-right">Done</th><th scope="col" className="px-2 py-1 text-right">Table alone</th><th scope="col" className="px-2 py-1 text-right">With learning</th></tr>
            </thead>
            <tbody>
              {points.map((p) => (
                <tr key={p.id} className="border-t border-rule">
                  <td className="px-2 py-1 num">{dateText(p.doneAt, timeZone)}</td>
                  <td className="px-2 py-1 num text-right">{p.actual}</td>
                  <td className="px-2 py-1 num text-right">{fixed(p.table, 1)}</td>
                  <td className="px-2 py-1 num text-right">{p.learned === null ? "—" : fixed(p.learned, 1)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </details>
    </Card>
  );
}
