import type { Metadata } from "next";
import { BackLink } from "@/components/ui/back-link";
import { pageActor } from "@/server/http/page";
import { PageTitle } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { JobForm } from "@/components/jobs/job-form";
import { can } from "@/shared/auth/policy";
import { listCustomerChoices } from "@/server/customers/queries";
import { JobActionsProvider } from "@/components/jobs/job-actions";
import { jobActions } from "@/app/(shop)/jobs/job-actions";
import { getUnitSystem, listShopMembers } from "@/server/jobs/queries";

export const metadata: Metadata = { title: "New job" };

export default async function NewJobPage() {
  const actor = await pageActor();
  if (!can(actor, "jobs.create")) {
    return <Notice tone="caution" title="Not for your role">Only a machinist or above books jobs in.</Notice>;
  }
  const [customers, members, unitSystem] = await Promise.all([listCustomerChoices({ actor }), listShopMembers({ actor }), getUnitSystem({ userId: actor.userId })]);
  return (
    <>
      <BackLink href="/jobs">Jobs</BackLink>
      <PageTitle>Book a block in</PageTitle>
      <JobActionsProvider actions={jobActions}>
        <JobForm
          mode={{ kind: "create" }}
          customers={customers}
          members={members}
          sizeUnit={unitSystem === "inch" ? "in" : "mm"}
          initial={{
            customerId: "", customerName: "", engineDescription: "", boreMaterial: "grey_iron", cylinderCount: "", standardBoreUm: null,
            boreLengthUm: null, bottomClearanceUm: null, wallThicknessUm: null, minWallUm: null, torquePlate: false, dueDate: "", notes: "", assignedUserId: "",
          }}
        />
      </JobActionsProvider>
    </>
  );
}
