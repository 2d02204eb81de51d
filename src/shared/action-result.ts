// The one result every form mutation answers with (server actions through defineAction and friends,
// rendered with useActionState), and the one error shape the JSON routes send.
export type FieldErrors = Record<string, string[]>;

export type ActionResult<T = undefined> =
  | { ok: true; message?: string; data?: T }
  | { ok: false; message: string; fieldErrors?: FieldErrors };

/** A server action as a form's `useActionState` takes it. */
export type FormAction<T = undefined> = (previous: ActionResult<T> | null, formData: FormData) => Promise<ActionResult<T>>;

/** The errors a result holds for one field (none after a success). */
export const fieldErrorsOf = (result: ActionResult<unknown> | null, name: string): string[] | undefined => (result && !result.ok ? result.fieldErrors?.[name] : undefined);
