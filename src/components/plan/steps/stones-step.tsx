"use client";
import { inputClass } from "@/components/ui/field";
import { RevealedError } from "@/components/ui/reveal-errors";
import type { PlanPreview } from "@/server/plans/preview";
import { IssuesList } from "../issues-list";
import { parsePressure, parseWithUnit } from "@/shared/quantity";
import { NumberInput } from "@/components/number-input";
import { STONE_ROLES } from "@/shared/stones/constants";
import { StagesTable } from "../stages-table";
import type { Options, StepProps } from "./types";
import { userText } from "@/shared/words/user-text";

function StoneChoices<D extends Options>({ draft, update, preview, errors }: Pick<StepProps<D>, "draft" | "update" | "preview" | "errors">) {
  const stones = preview?.stones ?? [];
  return (
    <fieldset className="grid gap-3 md:grid-cols-3">
      <legend className="mb-2 font-semibold">Stones and pressure per stage</legend>
      {STONE_ROLES.map((role) => {
        const ofRole = stones.filter((s) => s.role === role);
        const chosen = ofRole.find((s) => s.id === draft.stoneIds?.[role]) ?? ofRole[0];
        return (
          <div key={role} className="flex flex-col gap-2 rounded-md border border-rule p-2">
            <label htmlFor={`stone-${role}`} className="font-semibold">{role[0]!.toUpperCase()}{role.slice(1)} stone</label>
            <select id={`stone-${role}`} className={inputClass} value={draft.stoneIds?.[role] ?? ""} disabled={ofRole.length === 0} data-testid={`stone-${role}`}
              onChange={(e) => update((d) => ({ ...d, stoneIds: { ...d.stoneIds, [role]: e.target.value || null } }))}>
              <option value="">{ofRole.length ? "First usable in the library" : "None for this material"}</option>
              {ofRole.map((s) => <option key={s.id} value={s.id}>{s.code} · {s.gritLabel}{s.rateSource === "demo" ? " (demo data)" : ""}</option>)}
            </select>
            <RevealedError errors={errors[`stoneIds.${role}`]} />
            <NumberInput label={`${role[0]!.toUpperCase()}${role.slice(1)} pressure`} optional unit={chosen?.pressureUnit} value={draft.pressures?.[role]}
              parse={(text) => parsePressure(text, chosen?.pressureUnit ?? "bar")}
              hint={chosen ? `Empty: the rate row's ${chosen.referencePressure} ${chosen.pressureUnit}.` : undefined} errors={errors[`pressures.${role}`]} testId={`pressure-${role}`}
              onChange={(v) => update((d) => ({ ...d, pressures: { ...d.pressures, [role]: v } }))} />
          </div>
        );
      })}
    </fieldset>
  );
}

export function stoneLookup(preview: PlanPreview | null) {
  return (id: string) => preview?.stones.find((s) => s.id === id)?.code ?? "a stone";
}

/** Step 3: the stage sequence per cylinder; swap a stone of the same role, the pressure or the checkpoint. */
export function StonesStep<D extends Options>({ draft, update, preview, errors, units, stoneName }: StepProps<D>) {
  const fraction = draft.checkpointFraction;
  return (
    <>
      <StoneChoices draft={draft} update={update} preview={preview} errors={errors} />
      <div className="max-w-xs">
        <NumberInput label="Checkpoint at" unit="%" parse={(t) => parseWithUnit(t, ["%"], "checkpoint")} value={fraction == null ? 75 : Math.round(fraction * 100)} errors={errors.checkpointFraction}
          hint="Of each stage's estimated strokes: stop and measure there." testId="checkpoint-percent"
          onChange={(v) => update((d) => ({ ...d, checkpointFraction: v == null ? Number.NaN : v / 100 }))} />
      </div>
      {preview?.cylinders.map((c) => (
        <section key={c.cylinder} className="rounded-lg border border-rule bg-paper-raised p-3" data-testid={`stages-cylinder-${c.cylinder}`}>
          <h3 className="mb-2 text-lead font-semibold">Cylinder {c.cylinder}</h3>
          {c.plan ? <StagesTable plan={c.plan} units={units} stones={preview.stones} caption={`Stages of cylinder ${c.cylinder}`} /> : <p className="text-stop">{c.needs.map((n) => userText(n.message)).join(" ")}</p>}
          <div className="mt-2"><IssuesList cylinders={[{ cylinder: c.cylinder, plan: c.plan }]} units={units} stoneName={stoneName} step="stones" /></div>
        </section>
      ))}
    </>
  );
}
