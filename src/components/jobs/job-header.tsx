"use client";
import { useJobActions } from "./job-actions";
import Link from "next/link";
import { useState } from "react";
import { boreMaterialLabel } from "@/lib/bore-materials";
import { formatLength } from "@/lib/honing";
import { buttonClass } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { JOB_STATUSES, JOB_STATUS_LABELS, type JobStatus } from "@/shared/jobs/constants";
import type { JobDetail } from "@/server/jobs/detail";

import { StatusBadge } from "./status-badge";
import { ROOM_BELOW_BORE } from "@/shared/words/terms";

function Fact({ term, children }: { term: string; children: React.ReactNode }) {
  return (
    <div>
      <dt className="text-caption text-ink-soft">{term}</dt>
      <dd className="font-semibold">{children}</dd>
    </div>
  );
}

export function JobHeader({ detail, onChanged }: { detail: JobDetail; onChanged: () => void }) {
  const actions = useJobActions();
  const { job, units } = detail;
  const [state, setState] = useState<{ ok: boolean; message?: string } | null>(null);
  async function setStatus(status: JobStatus) {
    const result = await actions.setJobStatus(null, { jobId: job.id, input: { status } });
    setState(result.ok ? { ok: true, message: `Status set to ${JOB_STATUS_LABELS[status]}.` } : result);
    onChanged();
  }
  async function setArchived(archived: boolean) {
    const result = await actions.setJobArchived(null, { jobId: job.id, archived });
    setState(result.ok ? { ok: true, message: archived ? "Archived: the job leaves the open list." : "Restored to the open list." } : result);
    onChanged();
  }
  return (
    <header className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-title" data-testid="job-title">
          Job <span className="num">#{job.number}</span> · {job.customer?.name ?? "no customer"}
        </h1>
        <StatusBadge status={job.status} />
        {job.archived ? <span className="text-caption text-ink-soft">(archived)</span> : null}
        <div className="ml-auto flex flex-wrap items-center gap-2">
          {detail.permissions.setStatus ? (
            <label className="flex items-center gap-2">
              <span className="text-caption text-ink-soft">Status</span>
              <select className={`${inputClass} w-auto`} value={job.status} onChange={(e) => void setStatus(e.target.value as JobStatus)} data-testid="status-select">
                {JOB_STATUSES.map((s) => (
                  <option key={s} value={s}>{JOB_STATUS_LABELS[s]}</option>
                ))}
              </select>
            </label>
          ) : null}
          {detail.permissions.editJob ? <Link href={`/jobs/${job.id}/edit`} className={buttonClass("secondary")}>Edit job</Link> : null}
          {detail.permissions.editJob ? (
            <button type="button" className={buttonClass("ghost")} onClick={() => void setArchived(!job.archived)}>{job.archived ? "Restore" : "Archive"}</button>
          ) : null}
        </div>
      </div>
      <dl className="grid grid-cols-2 gap-3 rounded-lg border border-rule bg-paper-raised p-4 sm:grid-cols-4">
        <Fact term="Engine">{job.engineDescription}</Fact>
        <Fact term="Bore material">{boreMaterialLabel(job.boreMaterial)}</Fact>
        <Fact term="Cylinders"><span className="num">{job.cylinderCount}</span></Fact>
        <Fact term="Standard bore"><span className="num">{formatLength(job.standardBoreUm, units.size)}</span></Fact>
        <Fact term="Honed bore length"><span className="num">{formatLength(job.boreLengthUm, units.size)}</span></Fact>
        <Fact term={ROOM_BELOW_BORE.label}><span className="num">{job.bottomClearanceUm === null ? "—" : formatLength(job.bottomClearanceUm, units.size)}</span></Fact>
        <Fact term="Torque plate">{job.torquePlate ? "Yes" : "No"}</Fact>
        <Fact term="Due"><span className="num">{job.dueDate ?? "—"}</span></Fact>
      </dl>
      {job.notes ? <p className="whitespace-pre-line text-ink-soft">{job.notes}</p> : null}
      {state ? <FormMessage state={state} /> : null}
    </header>
  );
}
