"use client";
import { createContext, useContext, useState } from "react";

// When a field shows its errors. A form that checks as the user types (the plan wizards) hides a field's
// errors until the user has left that field or tried to go on (Next, Save), so an untouched form is not
// red; the errors still clear the moment the value is right. Elsewhere fields show what they are given.
const RevealAll = createContext(true);

export const RevealErrors = RevealAll.Provider;

/** Whether this field shows its errors now, and the handler that marks it left (put it on onBlur). */
export function useFieldReveal(): { shown: boolean; onBlur: () => void } {
  const all = useContext(RevealAll);
  const [left, setLeft] = useState(false);
  return { shown: all || left, onBlur: () => setLeft(true) };
}

/** Errors of a control that has no blur of its own to wait for (a select): shown once the form reveals all. */
export function RevealedError({ errors, testId }: { errors: string[] | undefined; testId?: string }) {
  const all = useContext(RevealAll);
  return all && errors?.length ? <p className="text-caption text-stop" data-testid={testId}>{errors.join(" ")}</p> : null;
}
