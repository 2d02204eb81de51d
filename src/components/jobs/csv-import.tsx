"use client";
import { useRef, useState } from "react";
import { newClientId } from "@/shared/client-id";
import { formatLength } from "@/lib/honing";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { inputClass } from "@/components/ui/field";
import { FilePicker } from "@/components/ui/file-picker";
import { GAUGE_CSV_EXTENSIONS, GAUGE_CSV_MAX_BYTES } from "@/shared/uploads/file-rules";
import { Notice } from "@/components/ui/notice";
import { READING_KINDS, READING_KIND_LABELS, type ReadingKind } from "@/shared/jobs/constants";
import type { JobDetail } from "@/server/jobs/detail";
import type { ImportPreview } from "@/server/readings/import";
import { sendForm } from "./api";

/** Gauge CSV import: preview first, then one write of every set; a file with any bad row writes nothing. */
export function CsvImportPanel({ detail, onChanged }: { detail: JobDetail; onChanged: () => void }) {
  const [file, setFile] = useState<File | null>(null);
  // One id per commit: a retried commit writes the sets once.
  const commitId = useRef(newClientId());
  const [kind, setKind] = useState<ReadingKind>("as_received");
  const [preview, setPreview] = useState<ImportPreview | null>(null);
  const [message, setMessage] = useState<{ tone: "stop" | "pass"; text: string } | null>(null);
  const [pending, setPending] = useState(false);
  const { units } = detail;

  async function send(mode: "preview" | "commit") {
    if (!file) return setMessage({ tone: "stop", text: "Choose a CSV file first." });
    const form = new FormData();
    form.append("file", file);
    form.append("kind", kind);
    form.append("mode", mode);
    if (mode === "commit") form.append("clientId", commitId.current);
    setPending(true);
    const result = await sendForm<ImportPreview>(`/api/jobs/${detail.job.id}/readings/import`, form);
    setPending(false);
    if (!result.ok) {
      setPreview(null);
      return setMessage({ tone: "stop", text: result.error.message });
    }
    setPreview(result.data);
    if (result.data.written) {
      commitId.current = newClientId();
      setMessage({ tone: "pass", text: `Wrote ${result.data.sets.length} reading set${result.data.sets.length === 1 ? "" : "s"}.` });
      setPreview(null);
      setFile(null);
      onChanged();
    } else setMessage(result.data.ok ? null : { tone: "stop", text: "Nothing was written: fix these rows and import again." });
  }

  return (
    <Card title="Import gauge readings (CSV)">
      <div className="flex flex-col gap-3" data-testid="csv-import">
        <p className="text-caption text-ink-soft">
          Header <code className="num">cylinder,level,direction,value,unit</code>; one reading per row; levels {detail.settings.readingLevels.join(", ")}; direction A (thrust) or B (pin axis); unit mm, in, thou or µm (empty: {units.size}). For example <code className="num">2,middle,A,86.021,mm</code> is cylinder 2, middle level, thrust direction, 86.021 mm. <a className="underline" href="/samples/gauge-readings.csv" download data-testid="csv-sample">Download a sample CSV</a> (invented demo readings).
        </p>
        <div className="flex flex-wrap items-end gap-3">
          <div className="w-full min-w-0 max-w-xl">
            <FilePicker label="CSV file" rule={{ extensions: GAUGE_CSV_EXTENSIONS, maxBytes: GAUGE_CSV_MAX_BYTES }} chosen={file}
              onChoose={(f) => { setFile(f); setPreview(null); setMessage(null); }} testId="csv-file" />
          </div>
          <label className="flex flex-col gap-1">
            <span className="font-semibold">Taken</span>
            <select className={`${inputClass} w-auto`} value={kind} onChange={(e) => setKind(e.target.value as ReadingKind)}>
              {READING_KINDS.map((k) => <option key={k} value={k}>{READING_KIND_LABELS[k]}</option>)}
            </select>
          </label>
          <Button variant="secondary" disabled={pending} onClick={() => void send("preview")} data-testid="csv-preview">Preview</Button>
          {preview?.ok ? <Button disabled={pending} onClick={() => void send("commit")} data-testid="csv-commit">Write {preview.sets.length} reading set{preview.sets.length === 1 ? "" : "s"}</Button> : null}
        </div>
        {message ? <div role="status" aria-live="polite"><Notice tone={message.tone}>{message.text}</Notice></div> : null}
        {preview && !preview.ok ? (
          <ul className="list-disc pl-6 text-stop" data-testid="csv-problems">
            {preview.problems.map((p, i) => <li key={i}>{p.line > 0 ? `Line ${p.line}: ` : ""}{p.reason}</li>)}
          </ul>
        ) : null}
        {preview?.ok ? (
          <table className="text-body" data-testid="csv-preview-table">
            <thead><tr className="text-left text-caption text-ink-soft"><th className="pr-4">Cylinder</th><th className="pr-4">Levels</th><th className="pr-4">Taper</th><th>Out-of-round</th></tr></thead>
            <tbody>
              {preview.sets.map((s) => (
                <tr key={s.cylinder} className="border-t border-rule">
                  <td className="num pr-4">{s.cylinder}</td>
                  <td className="pr-4">{s.levels.map((l) => l.name).join(", ")}</td>
                  <td className={`num pr-4 ${s.taperUm > detail.settings.taperToleranceUm ? "text-stop" : ""}`}>{formatLength(s.taperUm, units.small)}</td>
                  <td className={`num ${s.outOfRoundUm > detail.settings.outOfRoundToleranceUm ? "text-stop" : ""}`}>{formatLength(s.outOfRoundUm, units.small)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        ) : null}
      </div>
    </Card>
  );
}
