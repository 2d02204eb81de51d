"use client";
import { useActionState } from "react";
import { buttonClass } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { fieldErrorsOf } from "@/shared/action-result";
import { setShopTimeZoneAction } from "../actions";

/** The shop's time zone (owner). The list comes from the server, so it is the list the server accepts. */
export function TimeZoneForm({ current, zones, canEdit, example }: { current: string; zones: readonly string[]; canEdit: boolean; example: string }) {
  const [state, action, pending] = useActionState(setShopTimeZoneAction, null);
  const errors = fieldErrorsOf(state, "timeZone");
  return (
    <form action={action} className="flex flex-col gap-3" data-testid="time-zone-form">
      <label htmlFor="field-time-zone" className="font-semibold">Time zone</label>
      <p className="text-caption text-ink-soft">Dates and times on every page, mail and PDF of the shop are shown in this zone, with its abbreviation. Now: <span className="num" data-testid="time-zone-now">{example}</span></p>
      <select id="field-time-zone" name="timeZone" defaultValue={current} disabled={!canEdit} aria-invalid={errors ? true : undefined} className={inputClass} data-testid="time-zone-select">
        {zones.map((z) => (
          <option key={z} value={z}>{z.replaceAll("_", " ")}</option>
        ))}
      </select>
      {errors ? <p className="text-caption text-stop">{errors.join(" ")}</p> : null}
      {canEdit ? (
        <button type="submit" className={buttonClass("primary", "self-start")} disabled={pending}>
          Save time zone
        </button>
      ) : (
        <p className="text-caption text-ink-soft">The owner sets the shop&apos;s time zone.</p>
      )}
      <FormMessage state={state} />
    </form>
  );
}
