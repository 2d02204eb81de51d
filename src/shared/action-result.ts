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

/** A server action a controlled form calls with the object it validated (defineAction parses it again). */
export type ObjectAction<I, T = unknown> = (previous: null, input: I) => Promise<ActionResult<T>>;

/** A refused result as one line: its message and the first few field errors. */
export function refusalText(result: { message: string; fieldErrors?: FieldErrors }): string {
  const fields = Object.values(result.fieldErrors ?? {}).flat().slice(0, 3).join(" ");
  return [result.message, fields].filter(Boolean).join(" ");
}
