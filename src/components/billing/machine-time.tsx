import type { PlanTime } from "@/server/billing/plan-time";
import { fixed } from "@/shared/units";

// Planned vs logged machine time of a plan: per stage, per cylinder with its allowances, per job.
const th = "px-2 py-1 text-left font-semibold text-ink-soft";
const num = "num whitespace-nowrap px-2 py-1 text-right";
const min = (value: number | null | undefined) => (value == null ? "—" : `${fixed(value, 1)} min`);
const hours = (value: number) => `${fixed(value / 60, 2)} h`;

export function MachineTime({ time }: { time: PlanTime }) {
  const anyLogged = time.loggedTotalMin !== null;
  return (
    <section className="no-print flex flex-col gap-2 rounded-lg border border-rule bg-paper-raised p-4" data-testid="machine-time">
      <h2 className="text-title">Machine time</h2>
      <p className="text-ink-soft">
        Spindle time is double strokes ÷ double strokes per minute. Allowances from the billing settings: {min(time.allowances.cylinderSetUpMin)} set-up per cylinder,
        {" "}{min(time.allowances.stoneChangeMin)} per stone change{time.allowances.jobSetUpMin > 0 ? `, ${min(time.allowances.jobSetUpMin)} job set-up (torque plate)` : ""}.
        {anyLogged ? " Logged is what the run log holds." : " Logged time appears once the floor logs runs."}
      </p>
      <div className="overflow-x-auto">
        <table className="plan-table w-full min-w-[560px] border-collapse text-body">
          <caption className="sr-only">Planned and logged machine time</caption>
          <thead>
            <tr>
              <th className={th}>Cylinder · stage</th><th className={`${th} text-right`}>Double strokes planned</th><th className={`${th} text-right`}>Spindle planned</th>
              <th className={`${th} text-right`}>Double strokes logged</th><th className={`${th} text-right`}>Spindle logged</th>
            </tr>
          </thead>
          {time.cylinders.map((c) => (
            <tbody key={c.cylinder} data-testid={`time-cylinder-${c.cylinder}`}>
              {c.stages.filter((s) => s.kind !== "bore").map((s) => (
                <tr key={s.position} className="border-t border-rule">
                  <td className="px-2 py-1 capitalize">{c.cylinder} · {s.kind}</td>
                  <td className={num}>{s.plannedStrokes}</td><td className={num}>{min(s.plannedMin)}</td>
                  <td className={num}>{s.loggedStrokes ?? "—"}</td><td className={num}>{min(s.loggedMin)}</td>
                </tr>
              ))}
              <tr className="border-t border-rule text-ink-soft">
                <td className="px-2 py-1">{c.cylinder} · set-up and {c.planned.stoneChanges} stone change{c.planned.stoneChanges === 1 ? "" : "s"}</td>
                <td /><td className={num}>{min(c.planned.allowanceMin)}</td><td /><td className={num}>{min(c.logged?.allowanceMin)}</td>
              </tr>
              <tr className="border-t border-rule font-semibold">
                <td className="px-2 py-1">Cylinder {c.cylinder} total</td>
                <td /><td className={num} data-testid={`time-planned-${c.cylinder}`}>{min(c.planned.totalMin)}</td><td /><td className={num} data-testid={`time-logged-${c.cylinder}`}>{min(c.logged?.totalMin)}</td>
              </tr>
            </tbody>
          ))}
          <tfoot>
            <tr className="border-t-2 border-ink font-semibold">
              <td className="px-2 py-1">Job total{time.allowances.jobSetUpMin > 0 ? " (with job set-up)" : ""}</td>
              <td /><td className={num} data-testid="time-planned-total">{min(time.plannedTotalMin)} · {hours(time.plannedTotalMin)}</td><td />
              <td className={num} data-testid="time-logged-total">{time.loggedTotalMin === null ? "—" : `${min(time.loggedTotalMin)} · ${hours(time.loggedTotalMin)}`}</td>
            </tr>
          </tfoot>
        </table>
      </div>
    </section>
  );
}
