"use client";
import { useState } from "react";
import { parseLength, formatLength, type LengthUnit } from "@/lib/honing";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { LengthInput } from "@/components/length-input";
import { useCheckedSave } from "@/components/ui/use-checked-save";
import { shopSettingsSchema, type ShopSettings, type ShopSettingsInput } from "@/shared/shop-settings/schema";
import type { ActionResult } from "@/shared/action-result";

type Props = { settings: ShopSettings; units: { size: LengthUnit; small: LengthUnit }; canEdit: boolean; save: (previous: null, input: ShopSettingsInput) => Promise<ActionResult<unknown>> };

/** Parses "0, 0.25, 0.50" (in the user's size unit, or with units) into µm steps, or says which item is wrong. */
function parseSteps(text: string, unit: LengthUnit): { ok: true; um: number[] } | { ok: false; error: string } {
  const parts = text.split(/[,;]/).map((p) => p.trim()).filter(Boolean);
  const um: number[] = [];
  for (const part of parts) {
    const parsed = parseLength(part, unit);
    // parseLength's message names the text itself when it cannot read it at all.
    if (!parsed.ok) return { ok: false, error: parsed.error.includes(`"${part}"`) ? parsed.error : `"${part}": ${parsed.error}` };
    um.push(parsed.um);
  }
  return { ok: true, um };
}

export function TolerancesForm({ settings, units, canEdit, save }: Props) {
  const [taper, setTaper] = useState<number | null>(settings.taperToleranceUm);
  const [round, setRound] = useState<number | null>(settings.outOfRoundToleranceUm);
  const [margin, setMargin] = useState<number | null>(settings.boringMarginUm);
  const [boringRz, setBoringRz] = useState<number | null>(settings.boringRzUm);
  const [asReceived, setAsReceived] = useState<number | null>(settings.asReceivedCleanupUm);
  const [boreAbove, setBoreAbove] = useState<number | null>(settings.boreAboveStockUm);
  const [steps, setSteps] = useState(settings.oversizeStepsUm.map((s) => formatLength(s, units.size, { decimals: units.size === "in" ? 3 : 2 }).replace(/\s.*$/, "")).join(", "));
  const [levels, setLevels] = useState(settings.readingLevels.join(", "));
  const { errors, state, pending, submit: check, showErrors } = useCheckedSave(shopSettingsSchema, (input) => save(null, input));

  function submit(e: React.FormEvent) {
    e.preventDefault();
    const parsedSteps = parseSteps(steps, units.size);
    if (!parsedSteps.ok) return showErrors({ oversizeStepsUm: [parsedSteps.error] });
    const input = { taperToleranceUm: taper ?? Number.NaN, outOfRoundToleranceUm: round ?? Number.NaN, boringMarginUm: margin ?? Number.NaN, boringRzUm: boringRz ?? Number.NaN, asReceivedCleanupUm: asReceived ?? Number.NaN, boreAboveStockUm: boreAbove ?? Number.NaN, oversizeStepsUm: parsedSteps.um, readingLevels: levels.split(",").map((l) => l.trim()).filter(Boolean) };
    check(input);
  }

  return (
    <form onSubmit={submit} className="grid max-w-3xl gap-4 sm:grid-cols-2" noValidate data-testid="tolerances-form">
      <fieldset disabled={!canEdit} className="contents">
      <LengthInput label="Taper tolerance (finished bore)" name="taper" unit={units.small} valueUm={taper} onChange={setTaper} errors={errors.taperToleranceUm} hint="Default 10 µm: common practice for a finished bore." />
      <LengthInput label="Out-of-round tolerance (finished bore)" name="round" unit={units.small} valueUm={round} onChange={setRound} errors={errors.outOfRoundToleranceUm} hint="Default 5 µm: common practice for a finished bore." />
      <LengthInput label="Boring margin" name="margin" unit={units.small} valueUm={margin} onChange={setMargin} errors={errors.boringMarginUm} hint="Left after boring on top of what the stones must clean up; default 10 µm." />
      <LengthInput label="Finish boring roughness (Rz)" name="boringRz" unit="um" valueUm={boringRz} onChange={setBoringRz} errors={errors.boringRzUm} hint="Its clean-up (2 × 3 × Rz) is owed by the first stones; default 6 µm." />
      <LengthInput label="Clean-up of a worn bore" name="asReceived" unit={units.small} valueUm={asReceived} onChange={setAsReceived} errors={errors.asReceivedCleanupUm} hint="Stock to new metal when the plan hones without boring; default 10 µm." />
      <LengthInput label="Bore first above this honing stock" name="boreAbove" unit={units.small} valueUm={boreAbove} onChange={setBoreAbove} errors={errors.boreAboveStockUm} hint="Plans bore first by default above it; default 0.10 mm." />
      <Field label={`Oversize steps (${units.size}, above standard)`} name="steps" value={steps} onChange={(e) => setSteps(e.target.value)} errors={errors.oversizeStepsUm} hint="Comma-separated, 0 for standard; e.g. 0, 0.25, 0.50, 0.75, 1.00" />
      <div className="sm:col-span-2">
        <Field label="Reading levels (from the deck down)" name="levels" value={levels} onChange={(e) => setLevels(e.target.value)} errors={errors.readingLevels} hint="Comma-separated, 2 to 6 levels; default top, middle, bottom." />
      </div>
      </fieldset>
      {canEdit ? (
        <div className="flex items-center gap-3 sm:col-span-2">
          <Button type="submit" disabled={pending}>{pending ? "Saving…" : "Save settings"}</Button>
          <FormMessage state={state} />
        </div>
      ) : <p className="text-ink-soft sm:col-span-2">Only the owner changes these settings.</p>}
    </form>
  );
}
