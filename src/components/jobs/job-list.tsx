"use client";
import Link from "next/link";
import { useMemo, useState } from "react";
import useSWR from "swr";
import { formatLength } from "@/lib/honing";
import { DataTable, columnHelperFor, type Sort } from "@/components/data-table/data-table";
import { Pager } from "@/components/data-table/pager";
import { inputClass } from "@/components/ui/field";
import { JOB_STATUSES, JOB_STATUS_LABELS, type JobStatus } from "@/shared/jobs/constants";
import type { JobListRow } from "@/server/jobs/queries";
import type { JobListQuery } from "@/shared/jobs/schema";
import { fetchJson } from "./api";
import { StatusBadge } from "./status-badge";

type Page = { rows: JobListRow[]; total: number; page: number; pageSize: number };
type Filters = Pick<JobListQuery, "q" | "status" | "dueFrom" | "dueTo" | "sort" | "dir" | "page" | "pageSize">;

const helper = columnHelperFor<JobListRow>();

function toParams(f: Filters): string {
  const p = new URLSearchParams();
  for (const [k, v] of Object.entries(f)) if (v !== undefined && v !== "") p.set(k, String(v));
  return p.toString();
}

export function JobList({ initial, fallback, sizeUnit }: { initial: Filters; fallback: Page; sizeUnit: "mm" | "in" }) {
  const [filters, setFilters] = useState<Filters>(initial);
  const params = toParams(filters);
  const { data, isLoading } = useSWR<Page>(`/api/jobs?${params}`, fetchJson, { fallbackData: params === toParams(initial) ? fallback : undefined, keepPreviousData: true });
  const page = data ?? fallback;
  const update = (next: Partial<Filters>) => {
    const merged = { ...filters, page: 1, ...next };
    setFilters(merged);
    window.history.replaceState(null, "", `/jobs?${toParams(merged)}`);
  };
  const columns = useMemo(() => [
    helper.accessor("number", { header: "Job", cell: (c) => <Link className="num inline-flex min-h-[24px] min-w-[24px] items-center font-semibold text-steel underline" href={`/jobs/${c.row.original.id}`}>#{c.getValue()}</Link> }),
    helper.accessor("customerName", { id: "customer", header: "Customer", cell: (c) => c.getValue() ?? "—" }),
    helper.accessor("engineDescription", { header: "Engine", enableSorting: false }),
    helper.accessor("cylinderCount", { header: "Cyl.", enableSorting: false, cell: (c) => <span className="num">{c.getValue()}</span> }),
    helper.accessor("standardBoreUm", { header: "Std bore", enableSorting: false, cell: (c) => <span className="num whitespace-nowrap">{formatLength(c.getValue(), sizeUnit)}</span> }),
    helper.accessor("status", { header: "Status", cell: (c) => <StatusBadge status={c.getValue() as JobStatus} /> }),
    helper.accessor("dueDate", { header: "Due", cell: (c) => <span className="num whitespace-nowrap">{c.getValue() ?? "—"}</span> }),
  ], [sizeUnit]);

  return (
    <div className="flex flex-col gap-4" data-testid="job-list">
      <form role="search" className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4" onSubmit={(e) => e.preventDefault()}>
        <label className="flex flex-col gap-1">
          <span className="font-semibold">Search</span>
          <input type="search" className={inputClass} defaultValue={filters.q} placeholder="Number, customer, engine" onChange={(e) => update({ q: e.target.value })} data-testid="job-search" />
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-semibold">Status</span>
          <select className={inputClass} value={filters.status} onChange={(e) => update({ status: e.target.value as Filters["status"] })} data-testid="job-status-filter">
            <option value="open">Open (not delivered)</option>
            <option value="all">All</option>
            {JOB_STATUSES.map((s) => <option key={s} value={s}>{JOB_STATUS_LABELS[s]}</option>)}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-semibold">Due from</span>
          <input type="date" className={inputClass} value={filters.dueFrom ?? ""} onChange={(e) => update({ dueFrom: e.target.value || undefined })} />
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-semibold">Due to</span>
          <input type="date" className={inputClass} value={filters.dueTo ?? ""} onChange={(e) => update({ dueTo: e.target.value || undefined })} />
        </label>
      </form>
      <div aria-busy={isLoading}>
        <DataTable
          caption="Jobs"
          testId="jobs-table"
          columns={columns}
          data={page.rows}
          rowKey={(r) => r.id}
          sort={{ id: filters.sort, desc: filters.dir === "desc" }}
          onSortChange={(s: Sort) => update({ sort: s.id as Filters["sort"], dir: s.desc ? "desc" : "asc", page: filters.page })}
          empty="No jobs match. Clear the search or pick another status."
        />
      </div>
      <Pager page={page.page} pageSize={page.pageSize} total={page.total} onPage={(p) => update({ page: p })} />
    </div>
  );
}
