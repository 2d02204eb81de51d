"use client";
import { inputClass } from "@/components/ui/field";
import type { JobPlanDraft } from "@/shared/plans/schema";
import type { PreviewCylinder } from "@/server/plans/preview";
import { IssuesList } from "../issues-list";
import { LengthInput } from "@/components/length-input";
import { size, small, type DisplayUnits } from "@/shared/units";
import { withCylinder, type CylinderDraft, type StepProps } from "./types";
import { dateTimeText } from "@/shared/time";

function ReadingGrid({ row, units, timeZone }: { row: PreviewCylinder; units: DisplayUnits; timeZone: string }) {
  if (!row.bore || row.bore.basis !== "readings") return null;
  const g = row.plan?.geometry;
  return (
    <div className="flex flex-wrap gap-4">
      <table className="border-collapse text-body">
        <caption className="text-left text-caption text-ink-soft">{row.bore.readingKind?.replace("_", " ")} · {row.bore.takenAt ? dateTimeText(row.bore.takenAt, timeZone) : ""}</caption>
        <thead><tr className="text-ink-soft"><th className="px-2 text-left">Level</th><th className="px-2">A (thrust)</th><th className="px-2">B (pin)</th></tr></thead>
        <tbody>
          {row.bore.levels.map((l) => (
            <tr key={l.name}><th scope="row" className="px-2 text-left font-normal">{l.name}</th><td className="num px-2">{size(l.aUm, units)}</td><td className="num px-2">{size(l.bUm, units)}</td></tr>
          ))}
        </tbody>
      </table>
      {g ? (
        <dl className="num grid grid-cols-[auto_auto] gap-x-3 text-body">
          <dt className="text-ink-soft">Taper</dt><dd>{small(g.taperUm, units)} ({g.taperDirection}{g.tightEnd ? `, tight at the ${g.tightEnd}` : ""})</dd>
          <dt className="text-ink-soft">Out-of-round</dt><dd>{small(g.outOfRoundUm, units)} at {g.outOfRoundLevel}</dd>
          <dt className="text-ink-soft">Smallest</dt><dd>{size(g.minUm, units)} ({g.minAt.level} {g.minAt.direction})</dd>
          <dt className="text-ink-soft">Largest</dt><dd>{size(g.maxUm, units)} ({g.maxAt.level} {g.maxAt.direction})</dd>
        </dl>
      ) : null}
    </div>
  );
}

function BasisFields({ c, index, update, errors, units }: { c: CylinderDraft; index: number; update: StepProps<JobPlanDraft>["update"]; errors: StepProps<JobPlanDraft>["errors"]; units: DisplayUnits }) {
  const kind = c.bore?.kind ?? "readings";
  const setBore = (bore: CylinderDraft["bore"]) => update((d) => withCylinder(d, c.cylinder, (x) => ({ ...x, bore })));
  const choose = (k: string) => setBore(k === "diameter" ? { kind: "diameter", diameterUm: Number.NaN } : k === "stock" ? { kind: "stock", stockUm: Number.NaN } : { kind: "readings" });
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <div className="flex flex-col gap-1">
        <label htmlFor={`basis-${c.cylinder}`} className="font-semibold">Plan from</label>
        <select id={`basis-${c.cylinder}`} className={inputClass} value={kind} onChange={(e) => choose(e.target.value)} data-testid={`bore-basis-${c.cylinder}`}>
          <option value="readings">The latest reading set</option>
          <option value="diameter">A bore size I type</option>
          <option value="stock">The stock left, as I type it</option>
        </select>
      </div>
      {c.bore?.kind === "diameter" ? (
        <LengthInput label="Current bore size" unit={units.size} valueUm={c.bore.diameterUm} onChange={(v) => setBore({ kind: "diameter", diameterUm: v ?? Number.NaN })} errors={errors[`cylinders.${index}.bore.diameterUm`]} testId={`bore-size-${c.cylinder}`} />
      ) : c.bore?.kind === "stock" ? (
        <LengthInput label="Stock left (on diameter)" unit={units.small} valueUm={c.bore.stockUm} onChange={(v) => setBore({ kind: "stock", stockUm: v ?? Number.NaN })} errors={errors[`cylinders.${index}.bore.stockUm`]} hint='e.g. "0.05 mm" or "1.9 thou"' testId={`bore-stock-${c.cylinder}`} />
      ) : null}
    </div>
  );
}

/** Step 2: the bore each plan rests on, its geometry and stock; boring with its bore-to size. */
export function ReadingsStep({ draft, update, preview, errors, units, stoneName, timeZone }: StepProps<JobPlanDraft> & { timeZone: string }) {
  const boring = draft.boring ?? { enabled: null, marginUm: null };
  const boresInPreview = preview?.cylinders.some((c) => c.plan?.stages.some((s) => s.kind === "bore")) ?? false;
  const boringOn = boring.enabled ?? boresInPreview;
  return (
    <>
      <fieldset className="grid gap-3 sm:grid-cols-2">
        <legend className="mb-2 font-semibold">Boring</legend>
        <label className="flex min-h-touch items-center gap-2">
          <input type="checkbox" className="size-[24px] shrink-0" checked={boringOn} onChange={(e) => update((d) => ({ ...d, boring: { ...boring, enabled: e.target.checked } }))} data-testid="boring-enabled" />
          Bore first, then hone (the bore-to size leaves the honing allowance)
        </label>
        <p className="text-caption text-ink-soft" data-testid="boring-mode">
          {boring.enabled === null || boring.enabled === undefined
            ? "Set by the stock: on where a cylinder has more to hone than the shop's bore-first setting."
            : <>Your choice. <button type="button" className="min-h-touch underline" onClick={() => update((d) => ({ ...d, boring: { ...boring, enabled: null } }))}>Let the stock decide</button></>}
        </p>
        {boringOn ? <LengthInput label="Margin on top of the stones' clean-up stocks (empty: the shop's)" unit={units.small} valueUm={boring.marginUm ?? null} optional onChange={(v) => update((d) => ({ ...d, boring: { ...boring, marginUm: v } }))} errors={errors["boring.marginUm"]} /> : null}
      </fieldset>
      {(draft.cylinders ?? []).map((c, i) => {
        const row = preview?.cylinders.find((p) => p.cylinder === c.cylinder);
        const bore = row?.plan?.stages.find((s) => s.kind === "bore");
        return (
          <section key={c.cylinder} className="rounded-lg border border-rule bg-paper-raised p-3" aria-labelledby={`cyl-${c.cylinder}-title`} data-testid={`readings-cylinder-${c.cylinder}`}>
            <h3 id={`cyl-${c.cylinder}-title`} className="mb-2 text-lead font-semibold">Cylinder {c.cylinder}</h3>
            <BasisFields c={c} index={i} update={update} errors={errors} units={units} />
            {row ? <div className="mt-3"><ReadingGrid row={row} units={units} timeZone={timeZone} /></div> : null}
            {row?.bore && row.bore.basis !== "readings" ? <p className="mt-2 text-caption text-caution">This cylinder&apos;s plan rests on that single figure: no taper or out-of-round is known.</p> : null}
            {row?.plan?.stock ? (
              <p className="num mt-2">
                Stock to the target: <span className="font-semibold">{small(row.plan.stock.totalUm, units)}</span> from {size(row.plan.stock.startDiameterUm, units)}
                {bore && bore.kind === "bore" ? <> · bore to <span className="font-semibold">{size(bore.boreToUm, units)}</span>, honing allowance {small(bore.honingAllowanceUm, units)}</> : null}
              </p>
            ) : null}
            <div className="mt-2">
              <IssuesList cylinders={row ? [{ cylinder: c.cylinder, plan: row.plan, needs: row.needs.filter((n) => n.field === "bore") }] : []} units={units} stoneName={stoneName} step="readings" />
            </div>
          </section>
        );
      })}
    </>
  );
}
