"use client";
import { useJobActions } from "./job-actions";
import { useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { Confirm } from "@/components/ui/confirm";
import { ReadingSetView } from "@/components/reading-grid/reading-set-view";
import { READING_KIND_LABELS } from "@/shared/jobs/constants";
import type { JobDetail } from "@/server/jobs/detail";

import { ReadingSetForm } from "./reading-set-form";
import { AttachmentTile } from "./attachment-tile";
import { dateTimeText } from "@/shared/time";

type Cylinder = JobDetail["cylinders"][number];

export function CylinderCard({ detail, cylinder, onChanged }: { detail: JobDetail; cylinder: Cylinder; onChanged: () => void }) {
  const actions = useJobActions();
  const [entering, setEntering] = useState(false);
  // Closing the grid (saved or cancelled) hands focus back to the button that opened it.
  const opened = useRef(false);
  useEffect(() => {
    if (entering) opened.current = true;
    else if (opened.current) document.getElementById(`enter-readings-${cylinder.id}`)?.focus();
  }, [entering, cylinder.id]);
  const [showAll, setShowAll] = useState(false);
  const sets = detail.readingSets.filter((s) => s.cylinderId === cylinder.id);
  const kinds = detail.permissions.readingKindsByCylinder[cylinder.id] ?? [];
  const assignee = detail.members.find((m) => m.userId === cylinder.assignedUserId);
  const shown = showAll ? sets : sets.slice(0, 1);
  const files = detail.attachments.filter((a) => a.cylinderId === cylinder.id);

  async function assign(userId: string) {
    await actions.assignCylinder(null, { jobId: detail.job.id, cylinderId: cylinder.id, assignedUserId: userId || null });
    onChanged();
  }
  const [deleting, setDeleting] = useState<string | null>(null);
  async function remove(setId: string) {
    setDeleting(null);
    await actions.deleteReadingSet(null, { jobId: detail.job.id, readingSetId: setId });
    onChanged();
  }

  return (
    <article className={`flex flex-col gap-3 rounded-lg border border-rule bg-paper-raised p-4 ${entering ? "lg:col-span-2" : ""}`} data-testid={`cylinder-${cylinder.number}`}>
      <div className="flex flex-wrap items-center gap-2">
        <h3 className="text-lead font-semibold">Cylinder <span className="num">{cylinder.number}</span></h3>
        {detail.permissions.editJob ? (
          <label className="ml-auto flex items-center gap-1 text-caption text-ink-soft">
            Assigned to
            <select className="min-h-touch rounded-md border border-rule-strong bg-white px-2 text-body text-ink" value={cylinder.assignedUserId ?? ""} onChange={(e) => void assign(e.target.value)}>
              <option value="">nobody</option>
              {detail.members.map((m) => (
                <option key={m.userId} value={m.userId}>{m.name} ({m.role})</option>
              ))}
            </select>
          </label>
        ) : assignee ? (
          <span className="ml-auto text-caption text-ink-soft">Assigned to {assignee.name}</span>
        ) : null}
      </div>
      {sets.length === 0 && !entering ? <p className="text-ink-soft">No readings yet.</p> : null}
      {shown.map((set) => (
        <div key={set.id} className="flex flex-col gap-1">
          <div className="flex items-start justify-between gap-3">
          <p className="text-caption text-ink-soft">
            <strong className="text-ink">{READING_KIND_LABELS[set.kind]}</strong> · <span className="num">{dateTimeText(set.takenAt, detail.timeZone)}</span> · {set.takenByName ?? "unknown"}
            {set.gauge ? ` · ${set.gauge}` : ""}
            {set.temperatureC !== null ? ` · ${set.temperatureC} °C` : ""}
            {set.source === "csv" ? " · from CSV" : ""}
          </p>
            {/* Apart from the header and as big as a floor target: a slip here deletes a whole set. */}
            {detail.permissions.deleteReadings ? (
              <button type="button" className="inline-flex min-h-touch min-w-touch shrink-0 items-center justify-center rounded-md border border-stop px-3 text-stop hover:bg-stop-light" onClick={() => setDeleting(set.id)} data-testid="reading-set-delete">delete</button>
            ) : null}
          </div>
          {deleting === set.id ? (
            <Confirm question="Delete this reading set?" consequence="Its readings leave the job and its intake figures for everyone. This cannot be undone."
              yes="Yes, delete" danger onYes={() => void remove(set.id)} onNo={() => setDeleting(null)} testId="confirm-delete-set" />
          ) : null}
          <ReadingSetView levels={set.levels} units={detail.units} tolerances={detail.settings} testId={`set-${cylinder.number}`} />
        </div>
      ))}
      {sets.length > 1 ? (
        <button type="button" className="inline-flex min-h-touch items-center self-start text-steel underline" onClick={() => setShowAll((v) => !v)}>
          {showAll ? "Show only the latest" : `Show all ${sets.length} reading sets`}
        </button>
      ) : null}
      {files.length > 0 ? (
        <section aria-label={`Attachments of cylinder ${cylinder.number}`} className="flex flex-col gap-1">
          <h4 className="text-caption font-semibold text-ink-soft">Attachments</h4>
          <ul className="grid grid-cols-2 gap-2 sm:grid-cols-3" data-testid={`cylinder-attachments-${cylinder.number}`}>
            {files.map((a) => <AttachmentTile key={a.id} attachment={a} compact />)}
          </ul>
        </section>
      ) : null}
      {entering ? (
        <ReadingSetForm detail={detail} cylinderId={cylinder.id} cylinderNumber={cylinder.number} kinds={kinds} onCancel={() => setEntering(false)} onSaved={() => { setEntering(false); onChanged(); }} />
      ) : kinds.length > 0 ? (
        <Button variant="secondary" className="self-start" onClick={() => setEntering(true)} id={`enter-readings-${cylinder.id}`} data-testid={`enter-readings-${cylinder.number}`}>
          Enter readings
        </Button>
      ) : null}
    </article>
  );
}
