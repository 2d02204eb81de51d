import type { Metadata } from "next";
import { pageActor } from "@/server/http/page";
import { PageTitle } from "@/components/ui/card";
import { CustomerList } from "@/components/jobs/customer-list";
import { can } from "@/shared/auth/policy";
import { listCustomers } from "@/server/customers/queries";
import { customerListSchema } from "@/shared/customers/schema";
import { createCustomerAction } from "./actions";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

export const metadata: Metadata = { title: "Customers" };

export default async function CustomersPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await pageActor();
  const raw = Object.fromEntries(Object.entries(await searchParams).filter((e): e is [string, string] => typeof e[1] === "string"));
  const parsed = customerListSchema.safeParse(raw);
  const query = parsed.success ? parsed.data : customerListSchema.parse({});
  const page = await listCustomers({ actor, query });
  return (
    <>
      <PageTitle>Customers</PageTitle>
      <CustomerList initial={query} fallback={page} canEdit={can(actor, "customers.edit")} create={createCustomerAction} timeZone={await shopTimeZone(actor)} />
    </>
  );
}
