import Link from "next/link";
import type { RunLogRow } from "@/server/run-log/queries";
import { small, type DisplayUnits } from "@/shared/units";
import { dateTimeText } from "@/shared/time";

const th = "px-3 py-2";
const td = "px-3 py-2 align-top";

export function RunTable({ rows, units, timeZone }: { rows: RunLogRow[]; units: DisplayUnits; timeZone: string }) {
  if (rows.length === 0) return <p className="text-ink-soft" data-testid="no-runs">No runs match these filters.</p>;
  return (
    <div className="relative overflow-x-auto" tabIndex={0} role="region" aria-label="Logged runs">
      <table className="w-full text-left lg:min-w-[760px]" data-testid="run-table">
        <thead className="border-b border-rule bg-paper-sunk text-caption uppercase tracking-wide text-ink-soft">
          <tr>
            <th scope="col" className={th}>When</th>
            <th scope="col" className={th}>Job · cylinder</th>
            <th scope="col" className={th}>Stage</th>
            <th scope="col" className={th}>Stone</th>
            <th scope="col" className={th}>Machine</th>
            <th scope="col" className={`${th} text-right`}>Strokes planned / done</th>
            <th scope="col" className={`${th} text-right`}>Stock removed</th>
            <th scope="col" className={th}>Who</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id} className="border-b border-rule last:border-0" data-testid="run-row">
              <td className={`${td} num lg:whitespace-nowrap`}>{dateTimeText(r.doneAt, timeZone)}</td>
              <td className={td}><Link href={`/jobs/${r.jobId}`} className="text-steel underline">#{r.jobNumber}</Link> · {r.cylinder}</td>
              <td className={td}>{r.stagePosition + 1} · {r.stageKind ?? "—"}{r.block === "dwell" ? " (dwell)" : ""}</td>
              <td className={td}>{r.stoneCode ?? "—"}</td>
              <td className={td} data-testid="run-machine">{r.machineName}</td>
              <td className={`${td} num text-right`}>{r.strokesPlanned ?? "—"} / {r.strokesDone}</td>
              <td className={`${td} num text-right`}>{r.stockRemovedUm === null ? "—" : small(r.stockRemovedUm, units)}</td>
              <td className={td}>{r.who}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-2 text-caption text-ink-soft">Planned: the stage&apos;s strokes in the plan; done: this block&apos;s double strokes. Stock removed on the diameter, from the readings before and after the block (blank when there was no reading on both sides).</p>
    </div>
  );
}
