"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { LengthInput } from "@/components/length-input";
import { PISTON_TYPES, PISTON_TYPE_LABELS, type PistonType } from "@/server/jobs/constants";
import { pistonSchema } from "@/server/pistons/schema";
import type { JobDetail } from "@/server/jobs/detail";
import { sendJson, zodFieldErrors } from "./api";

type Draft = { label: string; cylinderId: string; diameterUm: number | null; sizingHeightUm: number | null; type: PistonType; clearanceMinUm: number | null; clearanceMaxUm: number | null };

export function PistonForm({ detail, onSaved }: { detail: JobDetail; onSaved: () => void }) {
  const last = detail.pistons.at(-1);
  const initial = (): Draft => ({
    label: String(detail.pistons.length + 1), cylinderId: "", diameterUm: null, sizingHeightUm: last?.sizingHeightUm ?? null,
    type: last?.type ?? "cast", clearanceMinUm: last?.clearanceMinUm ?? null, clearanceMaxUm: last?.clearanceMaxUm ?? null,
  });
  const [draft, setDraft] = useState<Draft>(initial);
  const [formKey, setFormKey] = useState(0);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [state, setState] = useState<{ ok: boolean; message?: string } | null>(null);
  const { units } = detail;
  const set = <K extends keyof Draft>(k: K, v: Draft[K]) => setDraft((d) => ({ ...d, [k]: v }));

  async function save(e: React.FormEvent) {
    e.preventDefault();
    const input = { ...draft, cylinderId: draft.cylinderId || null, diameterUm: draft.diameterUm ?? Number.NaN, sizingHeightUm: draft.sizingHeightUm ?? Number.NaN, clearanceMinUm: draft.clearanceMinUm ?? Number.NaN, clearanceMaxUm: draft.clearanceMaxUm ?? Number.NaN };
    const checked = pistonSchema.safeParse(input);
    if (!checked.success) {
      setErrors(zodFieldErrors(checked.error.issues));
      setState({ ok: false, message: "Some fields need attention." });
      return;
    }
    const result = await sendJson("POST", `/api/jobs/${detail.job.id}/pistons`, checked.data);
    if (!result.ok) {
      setErrors(result.error.fieldErrors ?? {});
      setState({ ok: false, message: result.error.message });
      return;
    }
    setErrors({});
    setState({ ok: true, message: `Piston ${draft.label} saved.` });
    setDraft({ ...initial(), label: String(detail.pistons.length + 2), sizingHeightUm: draft.sizingHeightUm, type: draft.type, clearanceMinUm: draft.clearanceMinUm, clearanceMaxUm: draft.clearanceMaxUm });
    setFormKey((k) => k + 1);
    onSaved();
  }

  return (
    <form key={formKey} onSubmit={save} className="grid gap-3 rounded-md border border-rule bg-white p-3 sm:grid-cols-2 lg:grid-cols-4" data-testid="piston-form">
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
        <Button type="submit" data-testid="piston-save">Add piston</Button>
      </div>
      <div className="sm:col-span-2 lg:col-span-4"><FormMessage state={state} /></div>
    </form>
  );
}
