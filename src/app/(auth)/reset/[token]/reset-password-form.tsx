"use client";
import { ActionForm } from "@/components/auth/action-form";
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from "@/shared/auth/schemas";
import { resetPasswordAction } from "../../actions";
import { PASSWORD_HINT } from "../../sign-up/sign-up-form";

export function ResetPasswordForm({ token }: { token: string }) {
  return (
    <ActionForm
      action={resetPasswordAction}
      testId="reset-password-form"
      submitLabel="Save new password"
      hidden={{ token }}
      fields={[{ name: "password", label: "New password", type: "password", autoComplete: "new-password", hint: PASSWORD_HINT, minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH }]}
    />
  );
}
