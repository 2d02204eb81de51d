"use client";
import { useActionState, useState } from "react";
import { fieldErrorsOf, type FormAction } from "@/shared/action-result";

/**
 * The one state of a spec-driven server-action form (ActionForm, LibraryForm): the action's result,
 * the typed values, kept when the server answers with field errors, and each field's errors.
 * `resetOnSuccess` starts the form empty again after a success (ready for the next invitation).
 */
export function useActionForm<T>(action: FormAction<T>, fields: ReadonlyArray<{ name: string; defaultValue?: string }>, { resetOnSuccess = false } = {}) {
  const [state, formAction, pending] = useActionState(action, null);
  const initialValues = () => Object.fromEntries(fields.map((f) => [f.name, f.defaultValue ?? ""]));
  const [values, setValues] = useState<Record<string, string>>(initialValues);
  const [answered, setAnswered] = useState(state);
  if (state !== answered) {
    setAnswered(state);
    if (resetOnSuccess && state?.ok) setValues(initialValues());
  }
  const set = (name: string, value: string) => setValues((v) => ({ ...v, [name]: value }));
  return { state, formAction, pending, values, set, errorsOf: (name: string) => fieldErrorsOf(state, name) };
}
