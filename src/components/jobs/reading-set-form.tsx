"use client";
import { newClientId } from "@/shared/client-id";
import { useJobActions } from "./job-actions";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { ReadingGrid } from "@/components/reading-grid/reading-grid";
import type { GridLevel } from "@/components/reading-grid/geometry";
import { READING_KIND_LABELS, type ReadingKind } from "@/shared/jobs/constants";
import { readingSetSchema } from "@/shared/readings/schema";
import type { JobDetail } from "@/server/jobs/detail";
import { zodFieldErrors } from "./api";

type Props = { detail: JobDetail; cylinderId: string; cylinderNumber: number; kinds: ReadingKind[]; onSaved: () => void; onCancel: () => void };

// getRandomValues, not randomUUID: a shop LAN page on plain http has no randomUUID.
function newClientKey(): string {
  return newClientId().replaceAll("-", "");
}

export function ReadingSetForm({ detail, cylinderId, cylinderNumber, kinds, onSaved, onCancel }: Props) {
  const actions = useJobActions();
  const [kind, setKind] = useState<ReadingKind>(kinds[0]!);
  const [gauge, setGauge] = useState("");
  const [temperature, setTemperature] = useState("");
  const [levels, setLevels] = useState<GridLevel[]>([]);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [submitted, setSubmitted] = useState(false);
  const [state, setState] = useState<{ ok: boolean; message?: string } | null>(null);
  const [pending, setPending] = useState(false);
  // One key per form: a retried save after a dropped connection is written once.
  const [clientKey] = useState(newClientKey);
  const prefix = `c${cylinderNumber}`;
  // Derived, not stored: the message goes as soon as the last cell is filled.
  const complete = levels.length > 0 && levels.every((l) => l.aUm !== null && l.bUm !== null);
  const incomplete = submitted && !complete ? { ok: false, message: "Fill every level in both directions." } : null;

  async function save(event: React.FormEvent) {
    event.preventDefault();
    const input = {
      cylinderId, kind, clientKey, gauge: gauge || null,
      temperatureC: temperature.trim() === "" ? null : Number(temperature),
      levels: levels.map((l) => ({ name: l.name, aUm: l.aUm ?? Number.NaN, bUm: l.bUm ?? Number.NaN })),
    };
    const checked = readingSetSchema.safeParse(input);
    setSubmitted(true);
    if (!checked.success || !complete) {
      setErrors(checked.success ? {} : zodFieldErrors(checked.error.issues));
      setState(null);
      return;
    }
    setPending(true);
    const result = await actions.createReadingSet(null, { jobId: detail.job.id, input: checked.data });
    setPending(false);
    if (!result.ok) {
      setErrors(result.fieldErrors ?? {});
      setState(result);
      return;
    }
    onSaved();
  }

  return (
    <form onSubmit={save} className="flex flex-col gap-3 rounded-md border border-steel bg-white p-3" data-testid={`reading-form-${cylinderNumber}`}>
      <div className="grid gap-3 sm:grid-cols-3">
        <label className="flex flex-col gap-1">
          <span className="font-semibold">Taken</span>
          <select className={inputClass} value={kind} onChange={(e) => setKind(e.target.value as ReadingKind)} data-testid="reading-kind">
            {kinds.map((k) => (
              <option key={k} value={k}>{READING_KIND_LABELS[k]}</option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-semibold">Gauge (optional)</span>
          <input className={inputClass} value={gauge} maxLength={80} onChange={(e) => setGauge(e.target.value)} placeholder="e.g. dial bore gauge 2" />
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-semibold">Block temperature (optional, °C)</span>
          <input className={`${inputClass} num`} inputMode="decimal" value={temperature} onChange={(e) => setTemperature(e.target.value)} />
          {errors.temperatureC && submitted ? <span className="text-caption text-stop">{errors.temperatureC.join(" ")}</span> : null}
        </label>
      </div>
      <ReadingGrid
        idPrefix={prefix}
        levelNames={detail.settings.readingLevels}
        units={detail.units}
        tolerances={detail.settings}
        errors={errors}
        submitted={submitted}
        standardBoreUm={detail.job.standardBoreUm}
        autoFocus
        onChange={(next) => { setLevels(next); setState(null); }}
      />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={pending} data-testid="reading-save">{pending ? "Saving…" : `Save cylinder ${cylinderNumber} readings`}</Button>
        <Button variant="secondary" onClick={onCancel}>Cancel</Button>
        <FormMessage state={incomplete ?? state} />
      </div>
    </form>
  );
}
