"use client";
import Link from "next/link";
import { useMemo, useState } from "react";
import useSWR from "swr";
import { DataTable, columnHelperFor } from "@/components/data-table/data-table";
import { Pager } from "@/components/data-table/pager";
import { Button } from "@/components/ui/button";
import { Field, inputClass } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { customerSchema, type CustomerInput, type CustomerListQuery } from "@/shared/customers/schema";
import type { ActionResult } from "@/shared/action-result";
import type { CustomerRow } from "@/server/customers/queries";
import { fetchJson, zodFieldErrors } from "./api";
import { dateText } from "@/shared/time";

/** The server action the page passes in (src/app/(shop)/customers/actions.ts). */
export type CreateCustomer = (previous: null, input: CustomerInput) => Promise<ActionResult<unknown>>;

type Page = { rows: CustomerRow[]; total: number; page: number; pageSize: number };
type Filters = Pick<CustomerListQuery, "q" | "sort" | "dir" | "page" | "pageSize" | "archived">;
const helper = columnHelperFor<CustomerRow>();

const toParams = (f: Filters) => new URLSearchParams(Object.entries(f).filter(([, v]) => v !== "" && v !== undefined).map(([k, v]) => [k, String(v)])).toString();

function NewCustomer({ create, onSaved }: { create: CreateCustomer; onSaved: () => void }) {
  const [name, setName] = useState("");
  const [email, setEmail] = useState("");
  const [phone, setPhone] = useState("");
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [state, setState] = useState<{ ok: boolean; message?: string } | null>(null);
  async function save(e: React.FormEvent) {
    e.preventDefault();
    const checked = customerSchema.safeParse({ name, email, phone });
    if (!checked.success) return setErrors(zodFieldErrors(checked.error.issues));
    const result = await create(null, checked.data);
    setState(result);
    if (!result.ok) return setErrors(result.fieldErrors ?? {});
    setErrors({});
    setName(""); setEmail(""); setPhone("");
    onSaved();
  }
  return (
    <form onSubmit={save} className="grid gap-3 rounded-lg border border-rule bg-paper-raised p-4 sm:grid-cols-4" noValidate data-testid="customer-form">
      <Field label="Name" name="name" value={name} onChange={(e) => setName(e.target.value)} errors={errors.name} />
      <Field label="E-mail (optional)" name="email" type="email" value={email} onChange={(e) => setEmail(e.target.value)} errors={errors.email} />
      <Field label="Phone (optional)" name="phone" value={phone} onChange={(e) => setPhone(e.target.value)} errors={errors.phone} />
      <div className="flex items-end"><Button type="submit">Add customer</Button></div>
      <div className="sm:col-span-4"><FormMessage state={state} /></div>
    </form>
  );
}

export function CustomerList({ initial, fallback, canEdit, create, timeZone }: { initial: Filters; fallback: Page; canEdit: boolean; create: CreateCustomer; timeZone: string }) {
  const [filters, setFilters] = useState<Filters>(initial);
  const params = toParams(filters);
  const { data, mutate } = useSWR<Page>(`/api/customers?${params}`, fetchJson, { fallbackData: params === toParams(initial) ? fallback : undefined, keepPreviousData: true });
  const page = data ?? fallback;
  const update = (next: Partial<Filters>) => {
    const merged = { ...filters, page: 1, ...next };
    setFilters(merged);
    window.history.replaceState(null, "", `/customers?${toParams(merged)}`);
  };
  const columns = useMemo(() => [
    helper.accessor("name", { header: "Name", cell: (c) => <Link className="inline-flex min-h-[24px] min-w-[24px] items-center font-semibold text-steel underline" href={`/customers/${c.row.original.id}`}>{c.getValue()}</Link> }),
    helper.accessor("email", { header: "E-mail", enableSorting: false, cell: (c) => c.getValue() ?? "—" }),
    helper.accessor("phone", { header: "Phone", enableSorting: false, cell: (c) => c.getValue() ?? "—" }),
    helper.accessor("jobCount", { header: "Jobs", cell: (c) => <span className="num">{c.getValue()}</span> }),
    helper.accessor("createdAt", { header: "Added", cell: (c) => <span className="num">{dateText(c.getValue(), timeZone)}</span> }),
  ], [timeZone]);
  return (
    <div className="flex flex-col gap-4" data-testid="customer-list">
      {canEdit ? <NewCustomer create={create} onSaved={() => void mutate()} /> : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <label className="flex flex-col gap-1">
          <span className="font-semibold">Search</span>
          <input type="search" className={inputClass} defaultValue={filters.q} placeholder="Name, e-mail, phone" onChange={(e) => update({ q: e.target.value })} />
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-semibold">Show</span>
          <select className={inputClass} value={filters.archived} onChange={(e) => update({ archived: e.target.value as Filters["archived"] })}>
            <option value="exclude">Active customers</option>
            <option value="only">Archived customers</option>
            <option value="include">All</option>
          </select>
        </label>
      </div>
      <DataTable caption="Customers" columns={columns} data={page.rows} rowKey={(r) => r.id} sort={{ id: filters.sort, desc: filters.dir === "desc" }}
        onSortChange={(s) => update({ sort: s.id as Filters["sort"], dir: s.desc ? "desc" : "asc", page: filters.page })} empty="No customers match." />
      <Pager page={page.page} pageSize={page.pageSize} total={page.total} onPage={(p) => update({ page: p })} />
    </div>
  );
}
