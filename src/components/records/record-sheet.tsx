import type { RecordCylinder, RecordView } from "@/shared/records/view";
import { dateTimeText, knownTimeZone } from "@/shared/time";

// The machining record on screen and on paper (the print stylesheet in globals.css): the same
// RecordView as the PDF. Figures are set in the monospaced face, right-aligned, each with its unit.

function Fact({ label, children, figure = false }: { label: string; children: React.ReactNode; figure?: boolean }) {
  return (
    <div>
      <dt className="text-caption uppercase tracking-wide text-ink-soft">{label}</dt>
      <dd className={`font-semibold ${figure ? "num" : ""}`}>{children}</dd>
    </div>
  );
}

function Line({ label, value, words = false }: { label: string; value: string | string[]; words?: boolean }) {
  const parts = Array.isArray(value) ? value : [value];
  return (
    <div className="flex justify-between gap-3 py-0.5">
      <dt className="text-ink-soft">{label}</dt>
      <dd className={`flex flex-wrap justify-end gap-x-3 text-right ${words ? "" : "num"}`}>
        {parts.map((p, i) => <span key={i} className={words ? "" : "whitespace-nowrap"}>{p}</span>)}
      </dd>
    </div>
  );
}

function CylinderCard({ c, zone }: { c: RecordCylinder; zone: string }) {
  return (
    <section className="record-cylinder rounded-md border border-rule p-3" data-testid={`record-cylinder-${c.number}`}>
      <h3 className="text-lead font-semibold">Cylinder {c.number}</h3>
      <p className="text-ink-soft">
        Piston {c.piston.label}: <span className="num">Ø {c.piston.diameter.text}</span>
        {c.piston.sizingHeight ? <> at <span className="num">{c.piston.sizingHeight.text}</span> from the crown</> : null}
      </p>
      <table className="mt-2 w-full border-collapse">
        <caption className="sr-only">Finished diameters of cylinder {c.number} at 20 °C</caption>
        <thead>
          <tr className="border-b border-rule text-caption uppercase text-ink-soft">
            <th scope="col" className="py-1 text-left font-normal">Finished Ø, 20 °C</th>
            <th scope="col" className="py-1 text-right font-normal">A</th>
            <th scope="col" className="py-1 text-right font-normal">B</th>
          </tr>
        </thead>
        <tbody>
          {c.levels.map((l) => (
            <tr key={l.name} className="border-b border-rule">
              <th scope="row" className="py-1 text-left font-normal">{l.name}</th>
              <td className="num py-1 text-right" data-testid={`record-${c.number}-${l.name}-A`}>{l.a.text}</td>
              <td className="num py-1 text-right">{l.b.text}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <dl className="mt-2">
        <Line label="Piston clearance" value={`${c.clearance.min.text} – ${c.clearance.max.text}`} />
        <Line label="Taper" value={c.taper.text} />
        <Line label="Out-of-round" value={c.outOfRound.text} />
        {c.finish.length > 0 ? <Line label="Finish" value={c.finish.map((f) => `${f.name} ${f.text}`)} /> : null}
        {c.stones.map((s, i) => <Line key={i} label={`${s.stage} stone`} value={`${s.code} · ${s.grit}`} />)}
        <Line label="Inspected" value={`${c.inspectedBy}, ${dateTimeText(c.inspectedAt, zone)}`} words />
      </dl>
    </section>
  );
}

/** `logoSrc` is where the shop's logo is served from for this viewer (member or link), null for none. */
export function RecordSheet({ record, version, logoSrc = null }: { record: RecordView; version?: { number: number; replaces: number | null } | null; logoSrc?: string | null }) {
  const j = record.job;
  const zone = knownTimeZone(record.shop.timeZone);
  return (
    <article className="record-sheet mx-auto flex max-w-[186mm] flex-col gap-4 bg-paper-raised p-4 print:p-0" data-print="record" data-testid="record-sheet">
      <header className="flex flex-wrap items-start justify-between gap-3 border-b-2 border-steel pb-3">
        <div className="flex items-start gap-3">
          {/* eslint-disable-next-line @next/next/no-img-element -- a served upload, sized by the box, no optimiser */}
          {logoSrc ? <img src={logoSrc} alt={`${record.shop.name} logo`} className="h-16 w-16 object-contain" data-testid="record-logo" /> : null}
          <div>
            <p className="text-title">{record.shop.name}</p>
            {record.shop.address ? <p className="whitespace-pre-line text-ink-soft">{record.shop.address}</p> : null}
            {record.shop.contact ? <p className="text-ink-soft">{record.shop.contact}</p> : null}
          </div>
        </div>
        <div className="text-right">
          <h1 className="text-lead font-bold text-steel">Machining record</h1>
          <p>
            Job #{j.number}
            {version ? `, version ${version.number}` : ""}
          </p>
          {version?.replaces ? <p className="text-ink-soft" data-testid="record-replaces">Replaces version {version.replaces}</p> : null}
          <p className="num text-caption text-ink-soft">{dateTimeText(record.madeAt, zone)}</p>
        </div>
      </header>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-3 print:grid-cols-3">
        <Fact label="Customer">{j.customer}</Fact>
        <Fact label="Engine">{j.engineDescription}</Fact>
        <Fact label="Bore material">{j.material}</Fact>
        <Fact label="Standard bore" figure>Ø {j.standardBore.text}</Fact>
        <Fact label="Oversize" figure>{j.oversize.text}</Fact>
        <Fact label="Torque plate">{j.torquePlate ? "used" : "not used"}</Fact>
        <Fact label="Inspected by">{record.inspection.by}</Fact>
        <Fact label="Final inspection">{dateTimeText(record.inspection.at, zone)}</Fact>
        <Fact label="Units">{record.units.size}; clearance and geometry in {record.units.small}</Fact>
      </dl>
      <div className="grid gap-3 md:grid-cols-2 print:grid-cols-2">
        {record.cylinders.map((c) => <CylinderCard key={c.number} c={c} zone={zone} />)}
      </div>
      {j.notes ? (
        <section className="record-cylinder">
          <h2 className="text-caption uppercase tracking-wide text-ink-soft">Notes</h2>
          <p className="whitespace-pre-line">{j.notes}</p>
        </section>
      ) : null}
      <section className="record-cylinder">
        <h2 className="text-caption uppercase tracking-wide text-ink-soft">Remarks</h2>
        <p className="whitespace-pre-line">{record.remarks}</p>
      </section>
    </article>
  );
}
