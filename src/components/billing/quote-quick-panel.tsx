"use client";
import { useRef, useState } from "react";
import { useRouter } from "next/navigation";
import { buttonClass } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import type { ActionResult } from "@/shared/action-result";
import { newClientId } from "@/shared/client-id";
import { quoteCreateSchema } from "@/shared/billing/schema";

export type QuoteAction = (previous: null, payload: Record<string, unknown>) => Promise<ActionResult<{ id: string }>>;

/** Quote the quick plan as it stands: validated with the server's schema, then drafted on the server. */
export function QuoteQuickPanel({ action, quick }: { action: QuoteAction; quick: unknown }) {
  const router = useRouter();
  const id = useRef(newClientId());
  const [customer, setCustomer] = useState({ customerName: "", customerEmail: "" });
  const [state, setState] = useState<{ ok: boolean; message?: string } | null>(null);
  const [pending, setPending] = useState(false);

  async function draft() {
    const checked = quoteCreateSchema.safeParse({ id: id.current, ...customer, quick });
    if (!checked.success) return setState({ ok: false, message: checked.error.issues.map((i) => i.message).slice(0, 3).join(" ") });
    setPending(true);
    const result = await action(null, { ...checked.data, quick });
    setPending(false);
    if (!result.ok) return setState(result);
    router.push(`/quotes/${result.data?.id ?? id.current}`);
  }

  return (
    <fieldset className="mt-4 grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end" data-testid="quote-quick">
      <legend className="mb-2 font-semibold">Or quote it first: the customer accepts from an e-mail and the job is booked in then</legend>
      <div className="flex flex-col gap-1">
        <label htmlFor="quote-customer" className="font-semibold">Customer</label>
        <input id="quote-customer" className={inputClass} maxLength={120} value={customer.customerName} onChange={(e) => setCustomer({ ...customer, customerName: e.target.value })} data-testid="quote-customer" />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="quote-email" className="font-semibold">Customer&apos;s e-mail</label>
        <input id="quote-email" type="email" className={inputClass} maxLength={254} value={customer.customerEmail} onChange={(e) => setCustomer({ ...customer, customerEmail: e.target.value })} data-testid="quote-email" />
      </div>
      <button type="button" className={buttonClass("secondary")} disabled={pending} onClick={draft} data-testid="quote-draft">{pending ? "Drafting…" : "Draft a quote"}</button>
      <div className="sm:col-span-3"><FormMessage state={state} /></div>
    </fieldset>
  );
}
