"use client";
import { useActionState, type FormEvent, type ReactNode } from "react";
import type { FormAction } from "@/shared/action-result";
import { forgetFloorPages } from "@/components/floor/offline-pages";
import { signOutQuestion, waitingOnDevice } from "@/components/floor/waiting-note";

/**
 * A header form (sign out, switch shop) on a server action; a refusal is read out beside it. With
 * `askFor` (the signed-in person's id) it first asks when that person's floor entries wait on this tablet.
 */
export function NavForm<T>({ action, className, children, askFor }: { action: FormAction<T>; className?: string; children: ReactNode; askFor?: string }) {
  const [state, formAction] = useActionState(action, null);
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    const waiting = askFor ? waitingOnDevice(askFor) : 0;
    if (waiting > 0 && !window.confirm(signOutQuestion(waiting))) return event.preventDefault();
    // The floor's kept pages go (the next person never sees them); its queue stays, each entry for its owner.
    void forgetFloorPages();
  };
  return (
    // Every header form changes whose data this device shows (sign out, switch shop).
    <form action={formAction} className={className} onSubmit={onSubmit}>
      {children}
      {state && !state.ok ? (
        <span role="status" aria-live="polite" className="text-stop">
          {state.message}
        </span>
      ) : null}
    </form>
  );
}
