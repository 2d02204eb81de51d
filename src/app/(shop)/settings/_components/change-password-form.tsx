"use client";
import { ActionForm } from "@/components/auth/action-form";
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from "@/shared/auth/schemas";
import { changePasswordAction } from "../actions";

export function ChangePasswordForm() {
  return (
    <ActionForm
      action={changePasswordAction}
      testId="change-password-form"
      submitLabel="Change password"
      fields={[
        { name: "currentPassword", label: "Current password", type: "password", autoComplete: "current-password", maxLength: 512 },
        {
          name: "newPassword",
          label: "New password",
          type: "password",
          autoComplete: "new-password",
          minLength: PASSWORD_MIN_LENGTH,
          maxLength: PASSWORD_MAX_LENGTH,
          hint: `${PASSWORD_MIN_LENGTH} to ${PASSWORD_MAX_LENGTH} characters. Your other sessions are signed out.`,
        },
      ]}
    />
  );
}
