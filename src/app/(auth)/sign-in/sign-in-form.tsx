"use client";
import { ActionForm } from "@/components/auth/action-form";
import { signInAction } from "../actions";

export function SignInForm({ next }: { next: string }) {
  return (
    <ActionForm
      action={signInAction}
      testId="sign-in-form"
      submitLabel="Sign in"
      hidden={next ? { next } : {}}
      fields={[
        { name: "email", label: "E-mail", type: "email", autoComplete: "username", maxLength: 254 },
        { name: "password", label: "Password", type: "password", autoComplete: "current-password", maxLength: 512 },
      ]}
    />
  );
}
