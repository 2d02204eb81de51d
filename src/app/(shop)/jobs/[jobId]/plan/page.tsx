import { Suspense } from "react";
import { BackLink } from "@/components/ui/back-link";
import { PageTitle } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { JobPlanWizard } from "@/components/plan/job-wizard";
import { pageActor } from "@/server/http/page";
import { viewerUnits } from "@/server/units";
import { can } from "@/shared/auth/policy";
import { getWizardContext } from "@/server/plans/wizard";
import { releasePlanAction, savePlanDraftAction } from "@/app/(shop)/plan/actions";
import { jobTitle } from "@/server/http/titles";

export async function generateMetadata({ params }: { params: Promise<{ jobId: string }> }) {
  return jobTitle((await params).jobId, "Plan", "Plan the job");
}

export default async function PlanWizardPage({ params }: { params: Promise<{ jobId: string }> }) {
  const { jobId } = await params;
  const actor = await pageActor();
  if (!can(actor, "plans.create")) {
    return <Notice tone="info" title="Planning is for machinists, leads and owners">Released plans are on the floor screens.</Notice>;
  }
  const context = await getWizardContext({ actor, jobId });
  return (
    <>
      <PageTitle actions={<BackLink href={`/jobs/${jobId}`}>Back to the job</BackLink>}>
        Plan job #{context.job.number}
        <span className="block text-body font-normal text-ink-soft">{context.job.engineDescription} · {context.job.boreMaterialLabel} · {context.job.cylinderCount} cylinders</span>
      </PageTitle>
      <Suspense>
        <JobPlanWizard context={context} unitSystem={(await viewerUnits(actor)).system} actions={{ savePlanDraft: savePlanDraftAction, releasePlan: releasePlanAction }} />
      </Suspense>
    </>
  );
}
