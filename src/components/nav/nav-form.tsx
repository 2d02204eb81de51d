"use client";
import { useActionState, type ReactNode } from "react";
import type { FormAction } from "@/shared/action-result";

/** A header form (sign out, switch shop) on a server action; a refusal is read out beside it. */
export function NavForm<T>({ action, className, children }: { action: FormAction<T>; className?: string; children: ReactNode }) {
  const [state, formAction] = useActionState(action, null);
  return (
    <form action={formAction} className={className}>
      {children}
      {state && !state.ok ? (
        <span role="status" aria-live="polite" className="text-stop">
          {state.message}
        </span>
      ) : null}
    </form>
  );
}
