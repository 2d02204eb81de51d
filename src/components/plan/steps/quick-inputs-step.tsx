"use client";
import { inputClass } from "@/components/ui/field";
import { BORE_MATERIALS } from "@/lib/bore-materials";
import type { QuickPlanDraft } from "@/shared/plans/schema";
import { IssuesList } from "../issues-list";
import { LengthInput } from "@/components/length-input";
import { size, small } from "@/shared/units";
import { ClearanceFields } from "./clearance-fields";
import type { StepProps } from "./types";
import { ROOM_BELOW_BORE } from "@/shared/words/terms";

/** Quick plan, step 1: piston, clearance, the bore (size or stock), material and bore length. */
export function QuickInputsStep({ draft, update, preview, errors, units, stoneName }: StepProps<QuickPlanDraft>) {
  const plan = preview?.cylinders[0]?.plan;
  const bore = draft.bore;
  return (
    <>
      <div className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
        <LengthInput label="Piston size at its sizing point" unit={units.size} valueUm={draft.pistonDiameterUm} onChange={(v) => update((d) => ({ ...d, pistonDiameterUm: v ?? Number.NaN }))} errors={errors.pistonDiameterUm} testId="quick-piston" />
        <div className="flex flex-col gap-1">
          <label htmlFor="quick-material" className="font-semibold">Bore material</label>
          <select id="quick-material" className={inputClass} value={draft.boreMaterial} onChange={(e) => update((d) => ({ ...d, boreMaterial: e.target.value as QuickPlanDraft["boreMaterial"] }))}>
            {BORE_MATERIALS.map((m) => <option key={m.code} value={m.code} disabled={!m.honable}>{m.label}</option>)}
          </select>
        </div>
        <LengthInput label="Honed bore length" unit={units.size} valueUm={draft.boreLengthUm} onChange={(v) => update((d) => ({ ...d, boreLengthUm: v ?? Number.NaN }))} errors={errors.boreLengthUm} testId="quick-length" />
        <LengthInput label={ROOM_BELOW_BORE.label} optional unit={units.size} valueUm={draft.bottomClearanceUm} onChange={(v) => update((d) => ({ ...d, bottomClearanceUm: v }))} errors={errors.bottomClearanceUm} hint={ROOM_BELOW_BORE.hint} />
        <div className="flex flex-col gap-1">
          <label htmlFor="quick-basis" className="font-semibold">I know</label>
          <select id="quick-basis" className={inputClass} value={bore.kind} data-testid="quick-basis"
            onChange={(e) => update((d) => ({ ...d, bore: e.target.value === "diameter" ? { kind: "diameter", diameterUm: Number.NaN } : { kind: "stock", stockUm: Number.NaN } }))}>
            <option value="stock">the stock left</option>
            <option value="diameter">the bore size now</option>
          </select>
        </div>
        {bore.kind === "diameter" ? (
          <LengthInput label="Bore size now" unit={units.size} valueUm={bore.diameterUm} onChange={(v) => update((d) => ({ ...d, bore: { kind: "diameter", diameterUm: v ?? Number.NaN } }))} errors={errors["bore.diameterUm"]} testId="quick-bore" />
        ) : (
          <LengthInput label="Stock left (on diameter)" unit={units.small} valueUm={bore.stockUm} onChange={(v) => update((d) => ({ ...d, bore: { kind: "stock", stockUm: v ?? Number.NaN } }))} errors={errors["bore.stockUm"]} hint='e.g. "0.05 mm" or "1.9 thou"' testId="quick-stock" />
        )}
      </div>
      <ClearanceFields clearance={draft.clearance} onChange={(clearance) => update((d) => ({ ...d, clearance }))} errors={errors} units={units} />
      {plan?.sizing ? (
        <p className="num">Finished size <span className="font-semibold">{size(plan.sizing.targetUm, units)}</span> (band {size(plan.sizing.minUm, units)} – {size(plan.sizing.maxUm, units)}); stock {small(plan.stock?.totalUm, units)}. The plan rests on that single figure.</p>
      ) : null}
      <IssuesList cylinders={preview?.cylinders ?? []} units={units} stoneName={stoneName} step="readings" />
    </>
  );
}
