import Link from "next/link";
import { BackLink } from "@/components/ui/back-link";
import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/card";
import { CustomerEditor } from "@/components/jobs/customer-editor";
import { StatusBadge } from "@/components/jobs/status-badge";
import { can } from "@/shared/auth/policy";
import { getCustomer } from "@/server/customers/queries";
import { listJobs } from "@/server/jobs/queries";
import { setCustomerArchivedAction, updateCustomerAction } from "../actions";
import { pageActor, orNotFound } from "@/server/http/page";

export const metadata: Metadata = { title: "Customer" };

export default async function CustomerPage({ params }: { params: Promise<{ customerId: string }> }) {
  const { customerId } = await params;
  const actor = await pageActor();
  const customer = await orNotFound(getCustomer({ actor, customerId }));
  const jobs = await listJobs({ actor, query: { customerId, status: "all", archived: "include", pageSize: 100 } });
  return (
    <>
      <PageTitle actions={<BackLink href="/customers">All customers</BackLink>}>
        {customer.name} {customer.archived ? <span className="text-caption text-ink-soft">(archived)</span> : null}
      </PageTitle>
      <CustomerEditor customer={customer} canEdit={can(actor, "customers.edit")} actions={{ update: updateCustomerAction, setArchived: setCustomerArchivedAction }} />
      <h2 className="mt-6 mb-2 text-lead font-semibold">Jobs</h2>
      {jobs.rows.length === 0 ? <p className="text-ink-soft">No jobs yet.</p> : (
        <ul className="flex flex-col gap-2">
          {jobs.rows.map((j) => (
            <li key={j.id} className="flex flex-wrap items-center gap-3 rounded-md border border-rule bg-paper-raised px-3 py-2">
              <Link href={`/jobs/${j.id}`} className="num inline-flex min-h-[24px] min-w-[24px] items-center font-semibold text-steel underline">#{j.number}</Link>
              <span>{j.engineDescription}</span>
              <StatusBadge status={j.status} />
              <span className="num ml-auto text-ink-soft">{j.dueDate ? `due ${j.dueDate}` : ""}</span>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
