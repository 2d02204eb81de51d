"use client";
import { ActionForm } from "@/components/auth/action-form";
import type { FormAction } from "@/shared/action-result";

/** Adopt: the lead writes the learned rate into the rate row as a new version, with a reason. */
export function AdoptForm<T>({ action, rateRowId, machineId, expectedVersion, testId }: { action: FormAction<T>; rateRowId: string; machineId: string; expectedVersion: number; testId: string }) {
  return (
    <ActionForm
      action={action}
      testId={testId}
      hidden={{ rateRowId, machineId, expectedVersion: String(expectedVersion) }}
      fields={[{ name: "reason", label: "Reason for adopting", maxLength: 500, hint: "Kept in the rate row's history with your name." }]}
      submitLabel="Adopt learned rate"
    />
  );
}
