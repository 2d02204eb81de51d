"use client";
import { useState, useTransition } from "react";
import type { z } from "zod";
import type { ActionResult, FieldErrors } from "@/shared/action-result";
import { zodFieldErrors } from "@/components/jobs/api";

/**
 * The one save of a controlled form: check the values with the server's own schema, show each field's
 * errors without posting when they fail, post the checked object otherwise, then show the answer
 * (saved, or why nothing changed, with the server's field errors). `send` posts something the schema
 * does not cover (Archive) into the same status line; `showErrors` shows a form's own check that runs
 * before the schema (a list typed as text).
 */
export function useCheckedSave<S extends z.ZodType, T = unknown>(
  schema: S,
  post: (input: z.output<S>) => Promise<ActionResult<T>>,
  { afterAnswer }: { afterAnswer?: (result: ActionResult<T>) => void } = {},
) {
  const [errors, setErrors] = useState<FieldErrors>({});
  const [state, setState] = useState<ActionResult<T> | null>(null);
  const [pending, startTransition] = useTransition();

  function send(request: () => Promise<ActionResult<T>>, { keepErrors = false } = {}) {
    startTransition(async () => {
      const result = await request();
      setState(result);
      if (!keepErrors) setErrors(result.ok ? {} : result.fieldErrors ?? {});
      afterAnswer?.(result);
    });
  }

  function submit(values: unknown) {
    const checked = schema.safeParse(values);
    if (!checked.success) return setErrors(zodFieldErrors(checked.error.issues));
    send(() => post(checked.data));
  }

  return { errors, state, pending, submit, send, showErrors: setErrors };
}
