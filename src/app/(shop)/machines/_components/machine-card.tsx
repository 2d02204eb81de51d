import Link from "next/link";
import type { MachineView } from "@/server/machines/queries";
import type { DisplayUnits } from "@/shared/units";
import { DRIVE_LABELS, PRESSURE_UNIT_LABELS } from "@/shared/stones/constants";
import { length, plain } from "@/shared/units";

export function MachineCard({ machine: m, canEdit, units }: { machine: MachineView; canEdit: boolean; units: DisplayUnits }) {
  const facts: Array<[string, string]> = [
    ["Spindle speed", `${m.spindleRpmMin}–${m.spindleRpmMax} rpm`],
    ["Stroke rate", `${plain(m.doubleStrokesPerMinMin, 1)}–${plain(m.doubleStrokesPerMinMax, 1)} double strokes/min`],
    ["Stroke drive", DRIVE_LABELS[m.drive]],
    ["Maximum stroke", length(m.maxStrokeLengthUm, units, 0)],
    ["Feed pressure", `${plain(m.pressureMin, 2)}–${plain(m.pressureMax, 2)} ${PRESSURE_UNIT_LABELS[m.pressureUnit]}`],
    ["Head stone length", length(m.headStoneLengthUm, units, 0)],
  ];
  return (
    <section className={`rounded-lg border border-rule bg-paper-raised p-4 ${m.active ? "" : "opacity-70"}`} data-testid="machine-card">
      <div className="mb-3 flex flex-wrap items-center gap-2">
        <h2 className="text-lead font-semibold">{m.name}</h2>
        {m.isDemo ? <span className="rounded bg-steel-light px-1.5 text-caption text-steel-dark">Demo</span> : null}
        {m.active ? null : <span className="rounded bg-paper-sunk px-1.5 text-caption">Retired</span>}
        {canEdit ? (
          <Link href={`/machines/${m.id}`} className="ml-auto inline-flex min-h-touch items-center rounded-md px-3 font-semibold text-steel hover:bg-steel-light">
            Edit<span className="sr-only"> {m.name}</span>
          </Link>
        ) : null}
      </div>
      <dl className="grid grid-cols-1 gap-x-6 gap-y-1 sm:grid-cols-2">
        {facts.map(([term, value]) => (
          <div key={term} className="flex justify-between gap-3 border-b border-rule py-1 last:border-0">
            <dt className="text-ink-soft">{term}</dt>
            <dd className="num text-right">{value}</dd>
          </div>
        ))}
      </dl>
      {m.notes ? <p className="mt-2 text-caption text-ink-soft">{m.notes}</p> : null}
    </section>
  );
}
