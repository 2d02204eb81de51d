"use client";
import { ActionForm, type FormAction } from "@/components/auth/action-form";
import { requestResetAction } from "../actions";

export function ResetRequestForm() {
  return (
    <ActionForm
      action={requestResetAction as FormAction}
      testId="reset-request-form"
      submitLabel="Send reset link"
      fields={[{ name: "email", label: "E-mail", type: "email", autoComplete: "email", maxLength: 254 }]}
    />
  );
}
