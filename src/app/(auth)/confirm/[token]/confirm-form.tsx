"use client";
import { ActionForm } from "@/components/auth/action-form";
import { confirmEmailAction } from "../../actions";

export function ConfirmEmailForm({ token }: { token: string }) {
  return <ActionForm action={confirmEmailAction} testId="confirm-email-form" submitLabel="Confirm my address" hidden={{ token }} fields={[]} />;
}
