"use client";
import { useActionState, useRef, useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { fieldErrorsOf, type FormAction } from "@/shared/action-result";
import { newClientId } from "@/shared/client-id";
import type { UnitSystem } from "@/shared/units";
import type { SentRecord } from "@/server/records/send";

/** Sends the record as shown to the customer: one device id per send, renewed after a success. */
export function SendRecordForm({ jobId, action, defaultTo, unitSystem, nextVersion }: { jobId: string; action: FormAction<SentRecord>; defaultTo: string; unitSystem: UnitSystem; nextVersion: number }) {
  const clientId = useRef(newClientId());
  const router = useRouter();
  const [state, formAction, pending] = useActionState(async (previous: Awaited<ReturnType<typeof action>> | null, formData: FormData) => {
    formData.set("clientId", clientId.current);
    const result = await action(previous, formData);
    if (result.ok) {
      clientId.current = newClientId();
      router.refresh();
    }
    return result.ok ? { ...result, message: `Version ${result.data?.version} sent to ${result.data?.sentTo}. The job is delivered.` } : result;
  }, null);
  const [to, setTo] = useState(defaultTo);
  return (
    <form action={formAction} className="flex flex-col gap-3" data-testid="send-record-form">
      <input type="hidden" name="jobId" value={jobId} />
      <input type="hidden" name="unitSystem" value={unitSystem} />
      <Field label="Customer's e-mail" name="to" type="email" autoComplete="email" required maxLength={254} value={to} onChange={(e) => setTo(e.target.value)} errors={fieldErrorsOf(state, "to")} />
      <p className="text-caption text-ink-soft">
        Sent as version {nextVersion}, in {unitSystem === "inch" ? "inches and thou" : "mm and µm"} as shown, with the PDF attached and a link that works 90 days.
      </p>
      <Button type="submit" disabled={pending} data-testid="send-record">
        {pending ? "Sending…" : nextVersion > 1 ? `Send version ${nextVersion}` : "Send the record"}
      </Button>
      <FormMessage state={state} />
    </form>
  );
}
