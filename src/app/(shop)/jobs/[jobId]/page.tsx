import type { Metadata } from "next";
import { BackLink } from "@/components/ui/back-link";
import { JobWorkspace } from "@/components/jobs/job-workspace";
import { JobPlansPanel } from "./_components/job-plans-panel";
import { RecordsPanel } from "./_components/records-panel";
import { getJobDetail } from "@/server/jobs/detail";
import { JobActionsProvider } from "@/components/jobs/job-actions";
import { jobActions } from "@/app/(shop)/jobs/job-actions";
import { pageActor, orNotFound } from "@/server/http/page";
import { jobTitle } from "@/server/http/titles";

export async function generateMetadata({ params }: { params: Promise<{ jobId: string }> }): Promise<Metadata> {
  return jobTitle((await params).jobId, null, "Job");
}

export default async function JobPage({ params }: { params: Promise<{ jobId: string }> }) {
  const { jobId } = await params;
  const actor = await pageActor();
  const detail = await orNotFound(getJobDetail({ actor, jobId }));
  return (
    <div className="flex flex-col gap-6">
      <BackLink href="/jobs">Jobs</BackLink>
      <JobActionsProvider actions={jobActions}>
        <JobWorkspace jobId={jobId} fallback={detail} />
      </JobActionsProvider>
      <JobPlansPanel actor={actor} jobId={jobId} />
      <RecordsPanel actor={actor} jobId={jobId} jobStatus={detail.job.status} />
    </div>
  );
}
