"use client";
import { inputClass } from "@/components/ui/field";
import type { JobPlanDraft } from "@/shared/plans/schema";
import type { WizardContext } from "@/server/plans/wizard";
import { IssuesList } from "../issues-list";
import { LengthInput } from "@/components/length-input";
import { size, small } from "@/shared/units";
import { ClearanceFields } from "./clearance-fields";
import { withCylinder, type StepProps } from "./types";
import { PairingDrawing, PISTON_SOURCE_TEXT } from "../pairing-drawing";

const TYPED = "__typed";

/** Step 1: clearance band and target, a piston per cylinder, the finished size and band it gives. */
export function PistonsStep({ draft, update, preview, errors, units, stoneName, context }: StepProps<JobPlanDraft> & { context: WizardContext }) {
  return (
    <>
      <ClearanceFields clearance={draft.clearance} onChange={(clearance) => update((d) => ({ ...d, clearance }))} errors={errors} units={units} />
      <div className="overflow-x-auto">
        <table className="w-full min-w-[640px] border-collapse">
          <caption className="mb-1 text-left font-semibold">Piston per cylinder and the finished size</caption>
          <thead>
            <tr className="text-left text-ink-soft">
              <th className="px-2 py-1">Cyl</th><th className="px-2 py-1">Piston</th><th className="px-2 py-1">Used</th><th className="px-2 py-1">Finished size (band)</th>
            </tr>
          </thead>
          <tbody>
            {(draft.cylinders ?? []).map((c, i) => {
              const row = preview?.cylinders.find((p) => p.cylinder === c.cylinder);
              const typed = c.pistonDiameterUm !== undefined && c.pistonDiameterUm !== null;
              const choose = (value: string) =>
                update((d) => withCylinder(d, c.cylinder, (x) => value === TYPED ? { ...x, pistonId: null, pistonDiameterUm: Number.NaN } : { ...x, pistonId: value || null, pistonDiameterUm: null }));
              return (
                <tr key={c.cylinder} className="border-t border-rule align-top">
                  <th scope="row" className="px-2 py-2 text-left">{c.cylinder}</th>
                  <td className="px-2 py-2">
                    <label className="sr-only" htmlFor={`piston-${c.cylinder}`}>Piston for cylinder {c.cylinder}</label>
                    <select id={`piston-${c.cylinder}`} className={inputClass} value={typed ? TYPED : (c.pistonId ?? "")} onChange={(e) => choose(e.target.value)} data-testid={`piston-select-${c.cylinder}`}>
                      <option value="">Proposed</option>
                      {context.pistons.map((p) => <option key={p.id} value={p.id}>{p.label}: {size(p.diameterUm, units)}{p.cylinderNumber ? ` (cyl ${p.cylinderNumber})` : ""}</option>)}
                      <option value={TYPED}>Type a size…</option>
                    </select>
                    {typed ? (
                      <div className="mt-2"><LengthInput label={`Piston size, cylinder ${c.cylinder}`} unit={units.size} valueUm={c.pistonDiameterUm} onChange={(v) => update((d) => withCylinder(d, c.cylinder, (x) => ({ ...x, pistonDiameterUm: v ?? Number.NaN })))} errors={errors[`cylinders.${i}.pistonDiameterUm`]} testId={`piston-size-${c.cylinder}`} /></div>
                    ) : null}
                    {errors[`cylinders.${i}.pistonId`] ? <p className="text-caption text-stop">{errors[`cylinders.${i}.pistonId`]!.join(" ")}</p> : null}
                  </td>
                  <td className="num px-2 py-2">{row?.piston ? <>{row.piston.label} · {size(row.piston.diameterUm, units)}<br /><span className="text-caption text-ink-soft">{PISTON_SOURCE_TEXT[row.piston.source]}</span></> : <span className="text-stop">none</span>}</td>
                  <td className="num px-2 py-2">
                    {row?.plan?.sizing ? <><span className="font-semibold">{size(row.plan.sizing.targetUm, units)}</span><br /><span className="text-caption text-ink-soft">{size(row.plan.sizing.minUm, units)} – {size(row.plan.sizing.maxUm, units)}; clearance {small(row.plan.sizing.clearanceTargetUm, units)}{row.plan.sizing.performanceAllowanceUm ? ` + ${small(row.plan.sizing.performanceAllowanceUm, units)} allowance` : ""}{row.plan.sizing.bandWideningUm ? `; band widened by ${small(row.plan.sizing.bandWideningUm, units)}` : ""}</span></> : "—"}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="text-caption text-ink-soft">Finished size = piston at its sizing point + clearance. Loose pistons are paired so every bore can clean up with the most even stock.</p>
      <PairingDrawing cylinders={preview?.cylinders ?? []} units={units} />
      <IssuesList cylinders={preview?.cylinders.map((c) => ({ cylinder: c.cylinder, plan: c.plan, needs: c.needs.filter((n) => n.field === "piston") })) ?? []} units={units} stoneName={stoneName} step="pistons" />
    </>
  );
}
