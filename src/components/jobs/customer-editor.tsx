"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, inputClass } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { useCheckedSave } from "@/components/ui/use-checked-save";
import { customerSchema, type CustomerInput } from "@/shared/customers/schema";
import type { ActionResult } from "@/shared/action-result";
import type { UnitSystem } from "@/shared/units";

type Customer = { id: string; name: string; email: string | null; phone: string | null; notes: string | null; unitSystem: UnitSystem | null; archived: boolean };
/** The server actions the page passes in (src/app/(shop)/customers/actions.ts). */
export type CustomerEditorActions = {
  update: (previous: null, input: CustomerInput & { customerId: string }) => Promise<ActionResult<unknown>>;
  setArchived: (previous: null, input: { customerId: string; archived: boolean }) => Promise<ActionResult<unknown>>;
};

export function CustomerEditor({ customer, canEdit, actions }: { customer: Customer; canEdit: boolean; actions: CustomerEditorActions }) {
  const router = useRouter();
  const [v, setV] = useState({ name: customer.name, email: customer.email ?? "", phone: customer.phone ?? "", notes: customer.notes ?? "", unitSystem: customer.unitSystem ?? "" });
  const { errors, state, pending, submit, send } = useCheckedSave(customerSchema, (input) => actions.update(null, { ...input, customerId: customer.id }), {
    afterAnswer: () => router.refresh(),
  });
  function save(e: React.FormEvent) {
    e.preventDefault();
    submit(v);
  }
  const archive = (archived: boolean) => send(() => actions.setArchived(null, { customerId: customer.id, archived }), { keepErrors: true });
  return (
    <form onSubmit={save} className="grid gap-3 rounded-lg border border-rule bg-paper-raised p-4 sm:grid-cols-3" noValidate>
      <Field label="Name" name="name" value={v.name} disabled={!canEdit} onChange={(e) => setV({ ...v, name: e.target.value })} errors={errors.name} />
      <Field label="E-mail" name="email" value={v.email} disabled={!canEdit} onChange={(e) => setV({ ...v, email: e.target.value })} errors={errors.email} />
      <Field label="Phone" name="phone" value={v.phone} disabled={!canEdit} onChange={(e) => setV({ ...v, phone: e.target.value })} errors={errors.phone} />
      <label className="flex flex-col gap-1">
        <span className="font-semibold">Record in</span>
        <select className={inputClass} value={v.unitSystem} disabled={!canEdit} onChange={(e) => setV({ ...v, unitSystem: e.target.value as UnitSystem | "" })} data-testid="customer-unit">
          <option value="">The sender&apos;s unit</option>
          <option value="metric">mm</option>
          <option value="inch">inch</option>
        </select>
        {errors.unitSystem ? <span className="text-caption text-stop">{errors.unitSystem.join(" ")}</span> : null}
      </label>
      <label className="flex flex-col gap-1 sm:col-span-3">
        <span className="font-semibold">Notes</span>
        <textarea className={`${inputClass} min-h-20 py-2`} value={v.notes} disabled={!canEdit} onChange={(e) => setV({ ...v, notes: e.target.value })} />
      </label>
      {canEdit ? (
        <div className="flex flex-wrap items-center gap-3 sm:col-span-3">
          <Button type="submit" disabled={pending}>Save</Button>
          <Button variant="secondary" disabled={pending} onClick={() => archive(!customer.archived)}>{customer.archived ? "Restore" : "Archive"}</Button>
          <FormMessage state={state} />
        </div>
      ) : null}
    </form>
  );
}
