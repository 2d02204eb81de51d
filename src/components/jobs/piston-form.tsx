"use client";
import { useJobActions } from "./job-actions";
import { useEffect, useRef, useState } from "react";
import { newClientId } from "@/shared/client-id";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { LengthInput } from "@/components/length-input";
import { PISTON_TYPES, PISTON_TYPE_LABELS, type PistonType } from "@/shared/jobs/constants";
import { pistonSchema } from "@/shared/pistons/schema";
import type { JobDetail } from "@/server/jobs/detail";
import type { PistonView } from "@/server/pistons/queries";
import { zodFieldErrors } from "./api";

type Draft = { label: string; cylinderId: string; diameterUm: number | null; sizingHeightUm: number | null; type: PistonType; clearanceMinUm: number | null; clearanceMaxUm: number | null };

const draftOf = (p: PistonView): Draft => ({
  label: p.label, cylinderId: p.cylinderId ?? "", diameterUm: p.diameterUm, sizingHeightUm: p.sizingHeightUm,
  type: p.type, clearanceMinUm: p.clearanceMinUm, clearanceMaxUm: p.clearanceMaxUm,
});

type Props = {
  detail: JobDetail;
  onSaved: (label: string) => void;
  /** The piston being edited; without it the form adds a new one. */
  editing?: PistonView;
  onCancel?: () => void;
};

/** Adds a piston, or edits one (the same fields and the same schema; PATCH instead of POST). */
export function PistonForm({ detail, onSaved, editing, onCancel }: Props) {
  const actions = useJobActions();
  const last = detail.pistons.at(-1);
  const initial = (): Draft => editing ? draftOf(editing) : ({
    label: String(detail.pistons.length + 1), cylinderId: "", diameterUm: null, sizingHeightUm: last?.sizingHeightUm ?? null,
    type: last?.type ?? "cast", clearanceMinUm: last?.clearanceMinUm ?? null, clearanceMaxUm: last?.clearanceMaxUm ?? null,
  });
  // The device names the piston it records: a retried save records it once.
  const pistonId = useRef(newClientId());
  const [draft, setDraft] = useState<Draft>(initial);
  const [formKey, setFormKey] = useState(0);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [state, setState] = useState<{ ok: boolean; message?: string } | null>(null);
  const { units } = detail;
  const formRef = useRef<HTMLFormElement>(null);
  useEffect(() => {
    // Focusing the first field also scrolls the form into view below the table.
    if (!editing) return;
    formRef.current?.querySelector<HTMLInputElement>("input")?.focus();
  }, [editing]);
  const set = <K extends keyof Draft>(k: K, v: Draft[K]) => setDraft((d) => ({ ...d, [k]: v }));

  async function save(e: React.FormEvent) {
    e.preventDefault();
    // Notes are not on this form: an edit keeps the ones the piston has.
    const input = { ...draft, notes: editing?.notes ?? null, cylinderId: draft.cylinderId || null, diameterUm: draft.diameterUm ?? Number.NaN, sizingHeightUm: draft.sizingHeightUm ?? Number.NaN, clearanceMinUm: draft.clearanceMinUm ?? Number.NaN, clearanceMaxUm: draft.clearanceMaxUm ?? Number.NaN };
    const checked = pistonSchema.safeParse(input);
    if (!checked.success) {
      setErrors(zodFieldErrors(checked.error.issues));
      setState({ ok: false, message: "Some fields need attention." });
      return;
    }
    const result = editing
      ? await actions.updatePiston(null, { jobId: detail.job.id, pistonId: editing.id, input: checked.data })
      : await actions.createPiston(null, { jobId: detail.job.id, input: { ...checked.data, clientId: pistonId.current } });
    if (!result.ok) {
      setErrors(result.fieldErrors ?? {});
      setState(result);
      return;
    }
    setErrors({});
    setState({ ok: true, message: `Piston ${draft.label} saved.` });
    if (editing) return onSaved(draft.label);
    pistonId.current = newClientId();
    setDraft({ ...initial(), label: String(detail.pistons.length + 2), sizingHeightUm: draft.sizingHeightUm, type: draft.type, clearanceMinUm: draft.clearanceMinUm, clearanceMaxUm: draft.clearanceMaxUm });
    setFormKey((k) => k + 1);
    onSaved(draft.label);
  }

  return (
    <form key={formKey} ref={formRef} onSubmit={save} className={`grid gap-3 rounded-md border bg-white p-3 sm:grid-cols-2 lg:grid-cols-4 ${editing ? "border-steel" : "border-rule"}`} data-testid="piston-form" data-mode={editing ? "edit" : "add"}
      aria-label={editing ? `Edit piston ${editing.label}` : "Add a piston"}>
      {editing ? <p className="font-semibold sm:col-span-2 lg:col-span-4">Editing piston {editing.label}</p> : null}
      <label className="flex flex-col gap-1">
        <span className="font-semibold">Label</span>
        <input className={inputClass} value={draft.label} maxLength={40} onChange={(e) => set("label", e.target.value)} data-testid="piston-label" />
        {errors.label ? <span className="text-caption text-stop">{errors.label.join(" ")}</span> : null}
      </label>
      <label className="flex flex-col gap-1">
        <span className="font-semibold">Cylinder</span>
        <select className={inputClass} value={draft.cylinderId} onChange={(e) => set("cylinderId", e.target.value)} data-testid="piston-cylinder">
          <option value="">Loose set (match later)</option>
          {detail.cylinders.map((c) => (
            <option key={c.id} value={c.id}>Cylinder {c.number}</option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-1">
        <span className="font-semibold">Type</span>
        <select className={inputClass} value={draft.type} onChange={(e) => set("type", e.target.value as PistonType)}>
          {PISTON_TYPES.map((t) => (
            <option key={t} value={t}>{PISTON_TYPE_LABELS[t]}</option>
          ))}
        </select>
      </label>
      <LengthInput label="Diameter at sizing point" name="diameterUm" unit={units.size} valueUm={draft.diameterUm} onChange={(v) => set("diameterUm", v)} errors={errors.diameterUm} testId="piston-diameter" />
      <LengthInput label="Sizing height (from skirt bottom)" name="sizingHeightUm" unit={units.size} valueUm={draft.sizingHeightUm} onChange={(v) => set("sizingHeightUm", v)} errors={errors.sizingHeightUm} testId="piston-height" />
      <LengthInput label="Maker's clearance, smallest" name="clearanceMinUm" unit={units.small} valueUm={draft.clearanceMinUm} onChange={(v) => set("clearanceMinUm", v)} errors={errors.clearanceMinUm} testId="piston-cmin" />
      <LengthInput label="Maker's clearance, largest" name="clearanceMaxUm" unit={units.small} valueUm={draft.clearanceMaxUm} onChange={(v) => set("clearanceMaxUm", v)} errors={errors.clearanceMaxUm} testId="piston-cmax" />
      <div className="flex items-end gap-3">
        <Button type="submit" data-testid="piston-save">{editing ? "Save piston" : "Add piston"}</Button>
        {editing ? <Button type="button" variant="secondary" onClick={onCancel} data-testid="piston-cancel">Cancel</Button> : null}
      </div>
      <div className="sm:col-span-2 lg:col-span-4"><FormMessage state={state} /></div>
    </form>
  );
}
