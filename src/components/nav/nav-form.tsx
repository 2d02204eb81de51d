"use client";
import { useActionState, type ReactNode } from "react";
import type { FormAction } from "@/shared/action-result";
import { forgetFloorPages } from "@/components/floor/offline-pages";

/** A header form (sign out, switch shop) on a server action; a refusal is read out beside it. */
export function NavForm<T>({ action, className, children }: { action: FormAction<T>; className?: string; children: ReactNode }) {
  const [state, formAction] = useActionState(action, null);
  return (
    // Every header form changes whose data this device shows (sign out, switch shop): the floor pages it kept go.
    <form action={formAction} className={className} onSubmit={() => void forgetFloorPages()}>
      {children}
      {state && !state.ok ? (
        <span role="status" aria-live="polite" className="text-stop">
          {state.message}
        </span>
      ) : null}
    </form>
  );
}
