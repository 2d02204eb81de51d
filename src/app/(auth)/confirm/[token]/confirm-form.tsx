"use client";
import { ActionForm, type FormAction } from "@/components/auth/action-form";
import { confirmEmailAction } from "../../actions";

export function ConfirmEmailForm({ token }: { token: string }) {
  return <ActionForm action={confirmEmailAction as FormAction} testId="confirm-email-form" submitLabel="Confirm my address" hidden={{ token }} fields={[]} />;
}
