import Link from "next/link";
import { boreMaterialLabel, type BoreMaterial } from "@/lib/bore-materials";
import type { HistoryEntry } from "@/server/stones/history";
import type { DisplayUnits } from "@/shared/units";
import { fieldLabel, showField } from "@/shared/stones/format";
import { dateTimeText } from "@/shared/time";

const KIND_WORDS = { create: "Added", update: "Changed", retire: "Retired", reactivate: "Back in use", restore: "Restored" } as const;

export function subjectOf(entry: HistoryEntry): string {
  if (entry.subject === "stone") return "Stone set";
  const material = (entry.newValues.boreMaterial ?? entry.oldValues?.boreMaterial) as BoreMaterial | undefined;
  return `Rate row · ${material ? boreMaterialLabel(material) : "?"}`;
}

/** Every change of the stone and its rate rows, newest first: who, when, why and what changed. */
export function HistoryList({ stoneId, entries, units, timeZone }: { stoneId: string; entries: HistoryEntry[]; units: DisplayUnits; timeZone: string }) {
  if (entries.length === 0) return <p className="text-ink-soft">No changes recorded yet.</p>;
  return (
    <ol className="flex flex-col divide-y divide-rule" data-testid="history-list">
      {entries.map((e) => (
        <li key={e.id} className="flex flex-col gap-1 py-3" data-testid="history-entry">
          <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
            <span className="font-semibold">{KIND_WORDS[e.kind]}{e.kind === "restore" && e.restoredFromVersion ? ` version ${e.restoredFromVersion}` : ""}</span>
            <span className="text-ink-soft">{subjectOf(e)}</span>
            <span className="num text-caption text-ink-soft">v{e.version}</span>
            <span className="text-caption text-ink-soft"><span className="num">{dateTimeText(e.changedAt, timeZone)}</span> · {e.changedByName ?? "former member"}</span>
            <Link href={`/stones/${stoneId}/versions/${e.id}`} className="ml-auto inline-flex min-h-touch items-center rounded-md px-3 font-semibold text-steel hover:bg-steel-light" data-testid="view-version">
              View version
            </Link>
          </div>
          <p data-testid="history-reason">“{e.reason}”</p>
          {e.kind !== "create" && e.changed.length > 0 ? (
            <ul className="text-caption text-ink-soft">
              {e.changed.slice(0, 6).map((field) => (
                <li key={field}>
                  {fieldLabel(field)}: <span className="num">{showField(field, e.oldValues?.[field], units)}</span> → <span className="num text-ink">{showField(field, e.newValues[field], units)}</span>
                </li>
              ))}
              {e.changed.length > 6 ? <li>and {e.changed.length - 6} more</li> : null}
            </ul>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
