"use client";
import { useState } from "react";
import { newClientId } from "@/shared/client-id";

export type AttachedReport = { id: string; name: string };

const ACCEPT = ".pdf,.csv,.jpg,.jpeg,.png,application/pdf,text/csv,image/jpeg,image/png";

/**
 * The profilometer's report (PDF, CSV or a photo of its screen) attached to the final check. It goes
 * straight to the server's upload checks, so it needs the network; the typed figures do not.
 */
export function SurfaceReportUpload({ planId, cylinder, value, onChange, disabled }: { planId: string; cylinder: number; value: AttachedReport | null; onChange: (v: AttachedReport | null) => void; disabled?: boolean }) {
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function send(file: File) {
    if (!navigator.onLine) return setMessage("Attaching a report needs the network; the typed figures can be sent without it.");
    setBusy(true);
    setMessage(null);
    const form = new FormData();
    form.set("file", file);
    form.set("clientId", newClientId());
    try {
      const response = await fetch(`/api/floor/surface-reports?planId=${encodeURIComponent(planId)}&cylinder=${cylinder}`, { method: "POST", body: form });
      const answer = (await response.json().catch(() => ({}))) as { id?: string; displayName?: string; message?: string; fieldErrors?: { file?: string[] } };
      if (response.ok && answer.id) onChange({ id: answer.id, name: answer.displayName ?? file.name });
      else setMessage(answer.fieldErrors?.file?.[0] ?? answer.message ?? `Not accepted (${response.status}).`);
    } catch {
      setMessage("The report could not be sent; check the network and try again.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-col gap-2" data-testid="surface-report">
      {value ? (
        <p className="flex flex-wrap items-center gap-3 text-body">
          <span>Report attached: <span className="font-semibold" data-testid="surface-report-name">{value.name}</span></span>
          <button type="button" className="min-h-touch rounded-md border border-rule-strong px-3" onClick={() => onChange(null)} disabled={disabled}>Remove</button>
        </p>
      ) : (
        <label className="flex flex-col gap-1 text-caption text-ink-soft">Profilometer report (PDF, CSV, JPEG or PNG; optional)
          <input type="file" accept={ACCEPT} className="min-h-touch text-body" disabled={disabled || busy} data-testid="surface-report-file"
            onChange={(e) => { const file = e.target.files?.[0]; e.target.value = ""; if (file) void send(file); }} />
        </label>
      )}
      {busy ? <p className="text-caption text-ink-soft" role="status">Sending the report…</p> : null}
      {message ? <p className="text-caption text-stop" role="alert" data-testid="surface-report-error">{message}</p> : null}
    </div>
  );
}
