import Link from "next/link";
import { pageActor } from "@/server/http/page";
import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";
import { JobList } from "@/components/jobs/job-list";
import { can } from "@/shared/auth/policy";
import { getUnitSystem, listJobs } from "@/server/jobs/queries";
import { jobListSchema } from "@/shared/jobs/schema";

export const metadata: Metadata = { title: "Jobs" };

export default async function JobsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await pageActor();
  const raw = Object.fromEntries(Object.entries(await searchParams).filter((e): e is [string, string] => typeof e[1] === "string"));
  const parsed = jobListSchema.safeParse(raw);
  const query = parsed.success ? parsed.data : jobListSchema.parse({});
  const [page, unitSystem] = await Promise.all([listJobs({ actor, query }), getUnitSystem({ userId: actor.userId })]);
  const initial = { q: query.q, status: query.status, dueFrom: query.dueFrom, dueTo: query.dueTo, sort: query.sort, dir: query.dir, page: query.page, pageSize: query.pageSize };
  return (
    <>
      <PageTitle actions={
        <>
          <Link href="/customers" className={buttonClass("secondary")}>Customers</Link>
          {can(actor, "jobs.create") ? <Link href="/jobs/new" className={buttonClass()} data-testid="new-job">New job</Link> : null}
        </>
      }>
        Jobs
      </PageTitle>
      <JobList initial={initial} fallback={page} sizeUnit={unitSystem === "inch" ? "in" : "mm"} />
    </>
  );
}
