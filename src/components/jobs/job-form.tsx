"use client";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { newClientId } from "@/shared/client-id";
import { BORE_MATERIALS, type BoreMaterial } from "@/lib/bore-materials";
import type { LengthUnit } from "@/lib/honing";
import { Button } from "@/components/ui/button";
import { Field, SelectField, inputClass } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { Notice } from "@/components/ui/notice";
import { LengthInput } from "@/components/length-input";
import { jobSchema } from "@/shared/jobs/schema";
import { zodFieldErrors } from "./api";
import { useJobActions } from "./job-actions";
import { ROOM_BELOW_BORE } from "@/shared/words/terms";

export type JobFormValues = {
  customerId: string; customerName: string; engineDescription: string; boreMaterial: BoreMaterial; cylinderCount: string;
  standardBoreUm: number | null; boreLengthUm: number | null; bottomClearanceUm: number | null; wallThicknessUm: number | null;
  minWallUm: number | null; torquePlate: boolean; dueDate: string; notes: string; assignedUserId: string;
};

type Props = {
  mode: { kind: "create" } | { kind: "edit"; jobId: string };
  initial: JobFormValues;
  customers: Array<{ id: string; name: string }>;
  members: Array<{ userId: string; name: string; role: string }>;
  sizeUnit: LengthUnit;
};

export function JobForm({ mode, initial, customers, members, sizeUnit }: Props) {
  const actions = useJobActions();
  const router = useRouter();
  // The device names the job it books in: a retried submission gets the same job back (issue 15).
  const clientId = useRef(newClientId());
  const [v, setV] = useState<JobFormValues>(initial);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [state, setState] = useState<{ ok: boolean; message?: string } | null>(null);
  const [pending, setPending] = useState(false);
  const set = <K extends keyof JobFormValues>(k: K, value: JobFormValues[K]) => setV((old) => ({ ...old, [k]: value }));
  const material = BORE_MATERIALS.find((m) => m.code === v.boreMaterial);

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const input = {
      customerId: v.customerId || null, customerName: v.customerId ? undefined : v.customerName || undefined,
      engineDescription: v.engineDescription, boreMaterial: v.boreMaterial, cylinderCount: Number(v.cylinderCount),
      standardBoreUm: v.standardBoreUm ?? Number.NaN, boreLengthUm: v.boreLengthUm ?? Number.NaN, bottomClearanceUm: v.bottomClearanceUm,
      wallThicknessUm: v.wallThicknessUm, minWallUm: v.minWallUm, torquePlate: v.torquePlate, dueDate: v.dueDate || null,
      notes: v.notes || null, assignedUserId: v.assignedUserId || null,
    };
    const checked = jobSchema.safeParse(input);
    if (!checked.success) {
      setErrors(zodFieldErrors(checked.error.issues));
      setState({ ok: false, message: "Some fields need attention." });
      return;
    }
    setPending(true);
    const result = mode.kind === "create"
      ? await actions.createJob(null, { input: { ...checked.data, clientId: clientId.current } })
      : await actions.updateJob(null, { jobId: mode.jobId, input: checked.data });
    setPending(false);
    if (!result.ok) {
      setErrors(result.fieldErrors ?? {});
      setState(result);
      return;
    }
    router.push(`/jobs/${result.data?.id ?? (mode.kind === "edit" ? mode.jobId : "")}`);
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-5" noValidate data-testid="job-form">
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lead font-semibold">Customer and engine</legend>
        <SelectField label="Customer" name="customerId" value={v.customerId} onChange={(e) => set("customerId", e.target.value)} errors={errors.customerId}>
          <option value="">New customer…</option>
          {customers.map((c) => <option key={c.id} value={c.id}>{c.name}</option>)}
        </SelectField>
        {v.customerId ? <div /> : <Field label="New customer's name" name="customerName" value={v.customerName} onChange={(e) => set("customerName", e.target.value)} errors={errors.customerName} hint="Leave empty for a job without a customer." data-testid="job-customer-name" />}
        <Field label="Engine" name="engineDescription" value={v.engineDescription} onChange={(e) => set("engineDescription", e.target.value)} errors={errors.engineDescription} hint="e.g. flat four, 2.0 L, aluminium block with iron liners" data-testid="job-engine" />
        <SelectField label="Bore material" name="boreMaterial" value={v.boreMaterial} onChange={(e) => set("boreMaterial", e.target.value as BoreMaterial)} errors={errors.boreMaterial} data-testid="job-material">
          {BORE_MATERIALS.map((m) => <option key={m.code} value={m.code}>{m.label}</option>)}
        </SelectField>
        {material && !material.honable ? <div className="sm:col-span-2"><Notice tone="caution">Coated bores follow the coating maker&apos;s process; Borewise will not plan conventional stones for them.</Notice></div> : null}
      </fieldset>
      <fieldset className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <legend className="mb-2 text-lead font-semibold">Bores</legend>
        <Field label="Cylinders" name="cylinderCount" inputMode="numeric" value={v.cylinderCount} onChange={(e) => set("cylinderCount", e.target.value)} errors={errors.cylinderCount} hint="1 to 16" data-testid="job-cylinders" />
        <LengthInput label="Standard bore" name="standardBoreUm" unit={sizeUnit} valueUm={v.standardBoreUm} onChange={(x) => set("standardBoreUm", x)} errors={errors.standardBoreUm} testId="job-standard-bore" />
        <LengthInput label="Honed bore length" name="boreLengthUm" unit={sizeUnit} valueUm={v.boreLengthUm} onChange={(x) => set("boreLengthUm", x)} errors={errors.boreLengthUm} testId="job-bore-length" />
        <LengthInput label={ROOM_BELOW_BORE.label} name="bottomClearanceUm" unit={sizeUnit} valueUm={v.bottomClearanceUm} optional onChange={(x) => set("bottomClearanceUm", x)} errors={errors.bottomClearanceUm} hint={ROOM_BELOW_BORE.hint} />
        <LengthInput label="Thinnest wall (ultrasonic)" name="wallThicknessUm" unit={sizeUnit} valueUm={v.wallThicknessUm} optional onChange={(x) => set("wallThicknessUm", x)} errors={errors.wallThicknessUm} hint="Optional." />
        <LengthInput label="Minimum wall allowed" name="minWallUm" unit={sizeUnit} valueUm={v.minWallUm} optional onChange={(x) => set("minWallUm", x)} errors={errors.minWallUm} hint="Optional." />
        <label className="flex min-h-touch items-center gap-3 sm:col-span-2 lg:col-span-3">
          <input type="checkbox" className="size-[24px] shrink-0" checked={v.torquePlate} onChange={(e) => set("torquePlate", e.target.checked)} />
          <span className="font-semibold">Honed with a torque plate</span>
        </label>
      </fieldset>
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lead font-semibold">Work</legend>
        <Field label="Due date" name="dueDate" type="date" value={v.dueDate} onChange={(e) => set("dueDate", e.target.value)} errors={errors.dueDate} />
        <SelectField label="Assigned to" name="assignedUserId" value={v.assignedUserId} onChange={(e) => set("assignedUserId", e.target.value)} errors={errors.assignedUserId}>
          <option value="">Nobody yet</option>
          {members.map((m) => <option key={m.userId} value={m.userId}>{m.name} ({m.role})</option>)}
        </SelectField>
        <label className="flex flex-col gap-1 sm:col-span-2">
          <span className="font-semibold">Notes</span>
          <textarea className={`${inputClass} min-h-24 py-2`} value={v.notes} maxLength={4000} onChange={(e) => set("notes", e.target.value)} />
        </label>
      </fieldset>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={pending} data-testid="job-save">{pending ? "Saving…" : mode.kind === "create" ? "Book the job in" : "Save changes"}</Button>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
