"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { useCheckedSave } from "@/components/ui/use-checked-save";
import { floorSettingsSchema, TEMPERATURE_DIFFERENCE_LIMITS_K, type FloorSettings, type FloorSettingsInput } from "@/shared/shop-settings/floor-schema";
import type { ActionResult } from "@/shared/action-result";

type Props = { settings: FloorSettings; canEdit: boolean; save: (previous: null, input: FloorSettingsInput) => Promise<ActionResult<unknown>> };

/** How warm a block may be for a final verdict, and the gauge temperature the reading cards take when left blank. */
export function FloorSettingsForm({ settings, canEdit, save }: Props) {
  const [difference, setDifference] = useState(String(settings.maxTemperatureDifferenceK));
  const [gauge, setGauge] = useState(settings.gaugeTemperatureC === null ? "" : String(settings.gaugeTemperatureC));
  const { errors, state, pending, submit: check } = useCheckedSave(floorSettingsSchema, (input) => save(null, input));

  function submit(e: React.FormEvent) {
    e.preventDefault();
    check({ maxTemperatureDifferenceK: difference, gaugeTemperatureC: gauge });
  }

  return (
    <form onSubmit={submit} className="grid max-w-3xl gap-4 sm:grid-cols-2" noValidate data-testid="floor-settings-form">
      <fieldset disabled={!canEdit} className="contents">
        <Field label="Block may be this much warmer than the gauge for a final verdict" name="maxTemperatureDifferenceK" unit="K" inputMode="decimal"
          value={difference} onChange={(e) => setDifference(e.target.value)} errors={errors.maxTemperatureDifferenceK}
          hint={`${TEMPERATURE_DIFFERENCE_LIMITS_K.min} to ${TEMPERATURE_DIFFERENCE_LIMITS_K.max} K; default 2 K. A warmer block reads large, so its verdict waits.`} />
        <Field label="The gauge's usual temperature (optional)" name="gaugeTemperatureC" unit="°C" inputMode="decimal"
          value={gauge} onChange={(e) => setGauge(e.target.value)} errors={errors.gaugeTemperatureC}
          hint="Taken on the floor's reading cards when the gauge temperature is left blank; leave empty to type it each time." />
      </fieldset>
      {canEdit ? (
        <div className="flex items-center gap-3 sm:col-span-2">
          <Button type="submit" disabled={pending}>{pending ? "Saving…" : "Save floor settings"}</Button>
          <FormMessage state={state} />
        </div>
      ) : <p className="text-ink-soft sm:col-span-2">Only the owner or a lead changes these settings.</p>}
    </form>
  );
}
