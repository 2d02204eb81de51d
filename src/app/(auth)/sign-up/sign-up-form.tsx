"use client";
import { ActionForm } from "@/components/auth/action-form";
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from "@/shared/auth/schemas";
import { signUpAction } from "../actions";

export const PASSWORD_HINT = `${PASSWORD_MIN_LENGTH} to ${PASSWORD_MAX_LENGTH} characters. A few unrelated words make a good one; common passwords are refused.`;

export function SignUpForm() {
  return (
    <ActionForm
      action={signUpAction}
      testId="sign-up-form"
      submitLabel="Create shop"
      fields={[
        { name: "shopName", label: "Shop name", autoComplete: "organization", maxLength: 120 },
        { name: "name", label: "Your name", autoComplete: "name", maxLength: 120 },
        { name: "email", label: "E-mail", type: "email", autoComplete: "email", maxLength: 254 },
        { name: "password", label: "Password", type: "password", autoComplete: "new-password", hint: PASSWORD_HINT, minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH },
      ]}
    />
  );
}
