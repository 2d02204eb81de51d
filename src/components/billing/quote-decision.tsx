"use client";
import { useActionState } from "react";
import { buttonClass } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import type { FormAction } from "@/shared/action-result";

/** Accept or decline, once: after an answer the buttons go and the answer stays on screen. */
export function QuoteDecision<T>({ action, token }: { action: FormAction<T>; token: string }) {
  const [state, formAction, pending] = useActionState(action, null);
  if (state?.ok) return <p className="text-lead font-semibold text-pass" role="status" data-testid="quote-answer">{state.message}</p>;
  return (
    <form action={formAction} className="flex flex-col gap-2">
      <input type="hidden" name="token" value={token} />
      <div className="flex flex-wrap gap-3">
        <button type="submit" name="decision" value="accept" className={buttonClass("primary")} disabled={pending} data-testid="quote-accept">Accept the quote</button>
        <button type="submit" name="decision" value="decline" className={buttonClass("secondary")} disabled={pending} data-testid="quote-decline">Decline</button>
      </div>
      <FormMessage state={state} />
    </form>
  );
}
