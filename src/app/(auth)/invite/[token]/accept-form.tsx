"use client";
import { ActionForm, type FieldSpec } from "@/components/auth/action-form";
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from "@/shared/auth/schemas";
import { acceptInvitationAction } from "../../actions";
import { PASSWORD_HINT } from "../../sign-up/sign-up-form";

const FIELDS: Record<"signed-in" | "existing" | "new", FieldSpec[]> = {
  "signed-in": [],
  existing: [{ name: "password", label: "Your Borewise password", type: "password", autoComplete: "current-password", maxLength: 512 }],
  new: [
    { name: "name", label: "Your name", autoComplete: "name", maxLength: 120 },
    { name: "password", label: "Choose a password", type: "password", autoComplete: "new-password", hint: PASSWORD_HINT, minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH },
  ],
};

const LABELS = { "signed-in": "Join the shop", existing: "Sign in and join", new: "Create account and join" };

export function AcceptInvitationForm({ token, mode }: { token: string; mode: "signed-in" | "existing" | "new" }) {
  return <ActionForm action={acceptInvitationAction} testId="accept-invitation-form" submitLabel={LABELS[mode]} hidden={{ token, mode }} fields={FIELDS[mode]} />;
}
