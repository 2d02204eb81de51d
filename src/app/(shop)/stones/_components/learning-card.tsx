import { boreMaterialLabel } from "@/lib/bore-materials";
import { LearnedInterval, runsText } from "@/components/learning/learned-rate";
import { RateChartLazy } from "@/components/learning/rate-chart-lazy";
import { AdoptForm } from "@/components/learning/adopt-form";
import type { StoneLearning } from "@/server/learning/queries";
import type { FormAction } from "@/shared/action-result";
import { micro } from "@/shared/units";

const dt = "text-ink-soft";

/** Per bore material × machine: the table's rate, the learned one, the chart of every run, and Adopt for the lead. */
export function LearningCard<T>({ entries, adopt, timeZone }: { entries: StoneLearning[]; adopt: FormAction<T> | null; timeZone: string }) {
  if (entries.length === 0) {
    return <p className="text-ink-soft">No runs with a reading before and after them are logged for this stone set yet: the plans use the table alone.</p>;
  }
  return (
    <div className="flex flex-col gap-8">
      {entries.map((e) => {
        const id = `${e.boreMaterial}-${e.machineId}`;
        const learnedUm = e.learned ? e.tableRateUm * e.learned.multiplier : null;
        return (
          <section key={id} className="flex flex-col gap-3" data-testid={`learning-${id}`}>
            <h3 className="text-lead font-semibold">{boreMaterialLabel(e.boreMaterial)} · {e.machineName}</h3>
            <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1">
              <dt className={dt}>Table (rate row v{e.rateVersion})</dt>
              <dd className="num">{micro(e.tableRateUm, 3)} per double stroke</dd>
              <dt className={dt}>Learned</dt>
              <dd className="num" data-testid="learned-value">
                {e.learned && learnedUm !== null
                  ? <>{micro(learnedUm, 3)} per double stroke · <LearnedInterval learned={e.learned} /> · {runsText(e.learned)}</>
                  : "no runs on this version yet: the table alone"}
              </dd>
            </dl>
            <RateChartLazy points={e.points} tableRateUm={e.tableRateUm} learnedRateUm={learnedUm} testId={`rate-chart-${id}`} timeZone={timeZone} />
            {adopt && e.learned && e.learned.runsUsed > 0 ? (
              <div className="max-w-xl">
                <p className="mb-2 text-caption text-ink-soft">
                  Adopt writes {micro(learnedUm, 3)} into the rate row as version {e.rateVersion + 1} for every machine; learning then starts again from it.
                </p>
                <AdoptForm action={adopt} rateRowId={e.rateRowId} machineId={e.machineId} expectedVersion={e.rateVersion} testId={`adopt-${id}`} />
              </div>
            ) : null}
          </section>
        );
      })}
    </div>
  );
}
