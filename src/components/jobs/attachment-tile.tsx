import type { JobDetail } from "@/server/jobs/detail";
import { fileSizeText } from "@/shared/bytes";

type Attachment = JobDetail["attachments"][number];

export const KIND_LABEL = { photo: "Photo", report: "Surface report", gauge: "Gauge file" } as const;

/** One attachment with its thumbnail (or its kind), opening the file through the shop-checked handler. */
export function AttachmentTile({ attachment: a, where, onRemove, compact = false }: { attachment: Attachment; where?: string; onRemove?: () => void; compact?: boolean }) {
  const box = compact ? "h-20" : "h-28";
  const fit = compact ? "max-h-20" : "max-h-28";
  return (
    <li className="flex min-w-0 flex-col gap-1 rounded-md border border-rule bg-white p-2" data-testid="attachment-tile">
      <a href={`/api/attachments/${a.id}`} target="_blank" rel="noopener" className={`flex ${box} items-center justify-center overflow-hidden rounded bg-paper-sunk`}>
        {a.hasThumbnail ? (
          // eslint-disable-next-line @next/next/no-img-element -- served by our own shop-checked handler
          <img src={`/api/attachments/${a.id}/thumbnail`} alt={`${KIND_LABEL[a.kind]}: ${a.displayName}`} className={`${fit} object-contain`} />
        ) : (
          <span className="text-caption font-semibold text-ink-soft">{a.kind === "report" ? "PDF" : "CSV"}</span>
        )}
      </a>
      <span className="truncate text-caption font-semibold" title={a.displayName}>{a.displayName}</span>
      <span className="text-caption text-ink-soft">{KIND_LABEL[a.kind]}{where ? ` · ${where}` : ""} · {fileSizeText(a.sizeBytes)}</span>
      {onRemove ? <button type="button" className="self-start text-caption text-stop underline" onClick={onRemove}>remove</button> : null}
    </li>
  );
}
