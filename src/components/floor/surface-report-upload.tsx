"use client";
import { useState } from "react";
import { newClientId } from "@/shared/client-id";
import { FilePicker } from "@/components/ui/file-picker";
import { SURFACE_REPORT_KINDS } from "@/shared/floor/constants";
import { extensionsOfKinds } from "@/shared/uploads/file-rules";
import { enqueue, removeEntry, useQueueOf } from "./device-store";
import { useFloorPerson } from "./floor-person";

export type AttachedReport = { id: string; name: string };

const REPORT_EXTENSIONS = extensionsOfKinds(SURFACE_REPORT_KINDS);

/**
 * The profilometer's report (PDF, CSV or a photo of its screen) attached to the final check. The file's
 * bytes are kept on the tablet (IndexedDB) and goes out through the send queue, before the final check that
 * names it, so choosing it offline works; the server's upload checks still decide on arrival. The
 * picker checks type and size against the server's own rule, so a wrong file is refused at once.
 */
export function SurfaceReportUpload({ planId, cylinder, value, onChange, disabled, maxBytes }: { planId: string; cylinder: number; value: AttachedReport | null; onChange: (v: AttachedReport | null) => void; disabled?: boolean; maxBytes: number }) {
  const owner = useFloorPerson();
  const waiting = useQueueOf(owner).some((e) => e.id === value?.id);
  const [message, setMessage] = useState<string | null>(null);

  async function keep(file: File) {
    let bytes: ArrayBuffer;
    try {
      bytes = await file.arrayBuffer();
    } catch {
      return setMessage("That file could not be read; choose it again.");
    }
    setMessage(null);
    const id = newClientId();
    enqueue({ id, kind: "upload", url: `/api/floor/surface-reports?planId=${encodeURIComponent(planId)}&cylinder=${cylinder}`, body: { bytes, type: file.type, name: file.name }, owner });
    onChange({ id, name: file.name });
  }

  function remove() {
    if (value && waiting) removeEntry(value.id);
    onChange(null);
  }

  return (
    <div className="flex flex-col gap-2" data-testid="surface-report">
      {value ? (
        <p className="flex flex-wrap items-center gap-3 text-body">
          <span>Report attached: <span className="font-semibold" data-testid="surface-report-name">{value.name}</span></span>
          {waiting ? <span className="text-caption text-ink-soft" data-testid="surface-report-waiting">kept on this tablet, waiting to send</span> : null}
          <button type="button" className="min-h-touch rounded-md border border-rule-strong px-3" onClick={remove} disabled={disabled}>Remove</button>
        </p>
      ) : (
        <FilePicker label="Profilometer report" rule={{ extensions: REPORT_EXTENSIONS, maxBytes }} chosen={null} optional large disabled={disabled}
          onChoose={(file) => void keep(file)} testId="surface-report-file" />
      )}
      {message ? <p className="text-caption text-stop" role="alert" data-testid="surface-report-error">{message}</p> : null}
    </div>
  );
}
