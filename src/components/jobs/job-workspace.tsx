"use client";
import useSWR from "swr";
import type { JobDetail } from "@/server/jobs/detail";
import { Notice } from "@/components/ui/notice";
import { fetchJson } from "./api";
import { JobHeader } from "./job-header";
import { IntakeSummaryCard } from "./intake-summary";
import { CylinderCard } from "./cylinder-card";
import { PistonsPanel } from "./pistons-panel";
import { CsvImportPanel } from "./csv-import";
import { AttachmentsPanel } from "./attachments-panel";

export const jobKey = (jobId: string) => `/api/jobs/${jobId}`;

/** The job page: one SWR key, refreshed after every action so the page updates without a reload. */
export function JobWorkspace({ jobId, fallback }: { jobId: string; fallback: JobDetail }) {
  const { data, error, mutate } = useSWR<JobDetail>(jobKey(jobId), fetchJson, { fallbackData: fallback, revalidateOnFocus: true });
  const detail = data ?? fallback;
  const refresh = () => void mutate();
  return (
    <div className="flex flex-col gap-6" data-testid="job-workspace">
      {error ? <Notice tone="caution" title="Could not refresh">{error.message} The page shows the last figures it had.</Notice> : null}
      <JobHeader detail={detail} onChanged={refresh} />
      <IntakeSummaryCard detail={detail} />
      <section aria-labelledby="cylinders-title" className="flex flex-col gap-3">
        <h2 id="cylinders-title" className="text-title">Cylinders</h2>
        <div className="grid gap-4 lg:grid-cols-2">
          {detail.cylinders.map((c) => (
            <CylinderCard key={c.id} detail={detail} cylinder={c} onChanged={refresh} />
          ))}
        </div>
      </section>
      <PistonsPanel detail={detail} onChanged={refresh} />
      {detail.permissions.importCsv ? <CsvImportPanel detail={detail} onChanged={refresh} /> : null}
      <AttachmentsPanel detail={detail} onChanged={refresh} />
    </div>
  );
}
