import { BackLink } from "@/components/ui/back-link";
import { PageTitle } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { JobForm } from "@/components/jobs/job-form";
import { can } from "@/shared/auth/policy";
import { listCustomerChoices } from "@/server/customers/queries";
import { getJob, getUnitSystem, listShopMembers } from "@/server/jobs/queries";
import { JobActionsProvider } from "@/components/jobs/job-actions";
import { jobActions } from "@/app/(shop)/jobs/job-actions";
import { pageActor, orNotFound } from "@/server/http/page";
import { jobTitle } from "@/server/http/titles";

export async function generateMetadata({ params }: { params: Promise<{ jobId: string }> }) {
  return jobTitle((await params).jobId, "Edit", "Edit job");
}

export default async function EditJobPage({ params }: { params: Promise<{ jobId: string }> }) {
  const { jobId } = await params;
  const actor = await pageActor();
  const job = await orNotFound(getJob({ actor, jobId }));
  if (!can(actor, "jobs.edit")) return <Notice tone="caution" title="Not for your role">Only a machinist or above edits jobs.</Notice>;
  const [customers, members, unitSystem] = await Promise.all([listCustomerChoices({ actor }), listShopMembers({ actor }), getUnitSystem({ userId: actor.userId })]);
  return (
    <>
      <PageTitle actions={<BackLink href={`/jobs/${jobId}`}>Back to the job</BackLink>}>
        Edit job <span className="num">#{job.number}</span>
      </PageTitle>
      <JobActionsProvider actions={jobActions}>
        <JobForm
          mode={{ kind: "edit", jobId }}
          customers={customers}
          members={members}
          sizeUnit={unitSystem === "inch" ? "in" : "mm"}
          initial={{
            customerId: job.customerId ?? "", customerName: "", engineDescription: job.engineDescription, boreMaterial: job.boreMaterial,
            cylinderCount: String(job.cylinderCount), standardBoreUm: job.standardBoreUm, boreLengthUm: job.boreLengthUm,
            bottomClearanceUm: job.bottomClearanceUm, wallThicknessUm: job.wallThicknessUm, minWallUm: job.minWallUm,
            torquePlate: job.torquePlate, dueDate: job.dueDate ?? "", notes: job.notes ?? "", assignedUserId: job.assignedUserId ?? "",
          }}
        />
      </JobActionsProvider>
    </>
  );
}
