"use client";
import { ActionForm } from "@/components/auth/action-form";
import { requestResetAction } from "../actions";

export function ResetRequestForm() {
  return (
    <ActionForm
      action={requestResetAction}
      testId="reset-request-form"
      submitLabel="Send reset link"
      fields={[{ name: "email", label: "E-mail", type: "email", autoComplete: "email", maxLength: 254 }]}
    />
  );
}
