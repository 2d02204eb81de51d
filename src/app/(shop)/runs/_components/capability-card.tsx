import { boreMaterialLabel } from "@/lib/bore-materials";
import { CAPABILITY_RULE, capabilityVerdict, oneIn } from "@/lib/honing";
import { Card } from "@/components/ui/card";
import type { CapabilityView } from "@/server/run-log/capability";
import { fixed, small, type DisplayUnits } from "@/shared/units";

const dt = "text-ink-soft";

/** Cp/Cpk of one machine × bore material, its histogram of deviations from target, and what it means. */
export function CapabilityCard({ view, units }: { view: CapabilityView | null; units: DisplayUnits }) {
  if (!view) return <Card title="Process capability"><p className="text-ink-soft">No finished bore has a final check yet.</p></Card>;
  const title = `Process capability · ${view.machineName} · ${boreMaterialLabel(view.boreMaterial)}`;
  const c = view.capability;
  if (view.count < view.needed || !c) {
    return (
      <Card title={title}>
        <p data-testid="capability-too-few">
          {view.count} finished bore{view.count === 1 ? "" : "s"} with a final check on this machine and material; at least {view.needed} are needed before Cp and Cpk say anything{view.count < view.needed ? ` (${view.needed - view.count} more)` : ""}.
        </p>
      </Card>
    );
  }
  const most = Math.max(...view.bins.map((b) => b.count));
  return (
    <Card title={title}>
      <div data-testid="capability">
        <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1">
          <dt className={dt}>Bores</dt><dd className="num">{c.count} (the last {view.asked} asked)</dd>
          <dt className={dt}>Band around target</dt><dd className="num">{small(view.lowerUm, units)} to +{small(view.upperUm, units)}</dd>
          <dt className={dt}>Mean deviation</dt><dd className="num" data-testid="capability-mean">{small(c.meanUm, units)}</dd>
          <dt className={dt}>Standard deviation</dt><dd className="num" data-testid="capability-sd">{small(c.sdUm, units)}</dd>
          <dt className={dt}>Cp</dt><dd className="num" data-testid="capability-cp">{fixed(c.cp, 2)}</dd>
          <dt className={dt}>Cpk</dt><dd className="num" data-testid="capability-cpk">{fixed(c.cpk, 2)}</dd>
        </dl>
        <p className="mt-3" data-testid="capability-sentence">
          {c.cpk === null ? capabilityVerdict(c) : (
            <>Cpk {fixed(c.cpk, 2)}: {view.outsideShare === null ? "no spread measured" : oneIn(view.outsideShare)} would land outside the band, if the finished sizes scatter as a normal distribution (the model Cp and Cpk rest on; real scatter often has heavier tails). {capabilityVerdict(c)}</>
          )}
        </p>
        {/* 30 as the point where the indices firm up: common practice in process-capability work. */}
        {c.count < 30 ? <p className="mt-1 text-caption text-ink-soft">From fewer than 30 bores the indices are rough estimates; 30 or more give a firmer figure (a usual rule of thumb).</p> : null}
        <table className="mt-4 w-full max-w-xl text-left" data-testid="capability-histogram">
          <caption className="mb-1 text-left text-caption text-ink-soft">Finished size minus target (mean of the final readings), bores per bin</caption>
          <thead className="sr-only"><tr><th scope="col">Deviation</th><th scope="col">Bores</th></tr></thead>
          <tbody>
            {view.bins.map((b) => {
              const outside = b.toUm <= view.lowerUm! || b.fromUm >= view.upperUm!;
              return (
                <tr key={b.fromUm}>
                  <th scope="row" className="num w-40 whitespace-nowrap pr-3 text-right font-normal text-ink-soft">{small(b.fromUm, units)} to {small(b.toUm, units)}</th>
                  <td className="py-0.5">
                    <span className="inline-flex items-center gap-2">
                      <span className={`inline-block h-4 rounded-sm ${outside ? "bg-stop" : "bg-steel"}`} style={{ width: `${Math.max(2, (b.count / most) * 240)}px` }} aria-hidden="true" />
                      <span className="num">{b.count}</span>
                    </span>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
        <p className="mt-2 text-caption text-ink-soft">{CAPABILITY_RULE}. The band is the narrowest among these bores, relative to each bore&apos;s own target.</p>
      </div>
    </Card>
  );
}
