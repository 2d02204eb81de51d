"use client";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field, inputClass } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { fieldErrorsOf, type FormAction } from "@/shared/action-result";

type Values = { address: string; contact: string; remarks: string };

/** The shop's words on every machining record: address, contact and the standard remarks. */
export function RecordSettingsForm<T>({ action, values }: { action: FormAction<T>; values: Values }) {
  const [state, formAction, pending] = useActionState(action, null);
  const remarksErrors = fieldErrorsOf(state, "remarks");
  return (
    <form action={formAction} className="flex flex-col gap-4" data-testid="record-settings-form">
      <div className="flex flex-col gap-1">
        <label htmlFor="field-address" className="font-semibold">Address</label>
        <textarea id="field-address" name="address" rows={3} maxLength={400} defaultValue={values.address} className={`${inputClass} py-2`} />
      </div>
      <Field label="Contact (phone, e-mail)" name="contact" maxLength={200} defaultValue={values.contact} errors={fieldErrorsOf(state, "contact")} />
      <div className="flex flex-col gap-1">
        <label htmlFor="field-remarks" className="font-semibold">Standard remarks</label>
        <textarea id="field-remarks" name="remarks" rows={4} maxLength={2000} required defaultValue={values.remarks} aria-invalid={remarksErrors ? true : undefined} className={`${inputClass} py-2`} />
        {remarksErrors ? <p className="text-caption text-stop">{remarksErrors.join(" ")}</p> : null}
      </div>
      <Button type="submit" disabled={pending}>{pending ? "Saving…" : "Save"}</Button>
      <FormMessage state={state} />
    </form>
  );
}
