import "server-only";
import { and, asc, count, desc, eq, isNotNull, isNull, like, or, sql, type SQL } from "drizzle-orm";
import { db } from "@/server/db";
import { customers } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import { can, type Actor } from "@/shared/auth/policy";
import { notFound } from "@/server/errors";
import { customerListSchema } from "@/shared/customers/schema";

export type CustomerRow = {
  id: string;
  name: string;
  email: string | null;
  phone: string | null;
  notes: string | null;
  archived: boolean;
  jobCount: number;
  createdAt: string;
};

/** Escapes LIKE wildcards so a search for "50%" means the text "50%". */
export function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

// Written out in full: drizzle leaves columns unqualified inside a raw subquery, which would bind to jobs.id.
const jobCount = sql<number>`(select count(*) from \`jobs\` as j where j.customer_id = \`customers\`.\`id\`)`.mapWith(Number);

/** An apprentice needs to know whose engine it is, not how to reach them (DESIGN.md §2 roles). */
function withoutContact<T extends { email: string | null; phone: string | null; notes: string | null }>(row: T): T {
  return { ...row, email: null, phone: null, notes: null };
}

/** One page of the shop's customers, searched, sorted and paged in the database. */
export async function listCustomers({ actor, query }: { actor: Actor; query: unknown }) {
  assertCan(actor, "jobs.view");
  const q = customerListSchema.parse(query);
  const filters: SQL[] = [eq(customers.shopId, actor.shopId)];
  if (q.archived === "exclude") filters.push(isNull(customers.archivedAt));
  if (q.archived === "only") filters.push(isNotNull(customers.archivedAt));
  const contact = can(actor, "customers.viewContact");
  if (q.q) filters.push(contact ? or(like(customers.name, likePattern(q.q)), like(customers.email, likePattern(q.q)), like(customers.phone, likePattern(q.q)))! : like(customers.name, likePattern(q.q)));
  const where = and(...filters);
  const column = q.sort === "createdAt" ? customers.createdAt : q.sort === "jobCount" ? jobCount : customers.name;
  const order = q.dir === "desc" ? desc(column) : asc(column);
  const rows = await db
    .select({ id: customers.id, name: customers.name, email: customers.email, phone: customers.phone, notes: customers.notes, archivedAt: customers.archivedAt, createdAt: customers.createdAt, jobCount })
    .from(customers)
    .where(where)
    .orderBy(order, asc(customers.id))
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  const [total] = await db.select({ n: count() }).from(customers).where(where);
  return {
    rows: rows.map(({ archivedAt, createdAt, ...r }): CustomerRow => ({ ...(contact ? r : withoutContact(r)), archived: archivedAt !== null, createdAt: createdAt.toISOString() })),
    total: total?.n ?? 0,
    page: q.page,
    pageSize: q.pageSize,
  };
}

/** A customer of the actor's shop, or "not found". */
export async function getCustomer({ actor, customerId }: { actor: Actor; customerId: string }) {
  assertCan(actor, "jobs.view");
  const [row] = await db
    .select({ id: customers.id, name: customers.name, email: customers.email, phone: customers.phone, notes: customers.notes, unitSystem: customers.unitSystem, archivedAt: customers.archivedAt })
    .from(customers)
    .where(and(eq(customers.id, customerId), eq(customers.shopId, actor.shopId)))
    .limit(1);
  if (!row) throw notFound("That customer");
  const { archivedAt, ...rest } = row;
  return { ...(can(actor, "customers.viewContact") ? rest : withoutContact(rest)), archived: archivedAt !== null };
}

/** Every active customer's id and name, for the job form's picker. */
export async function listCustomerChoices({ actor }: { actor: Actor }) {
  assertCan(actor, "jobs.view");
  return db
    .select({ id: customers.id, name: customers.name })
    .from(customers)
    .where(and(eq(customers.shopId, actor.shopId), isNull(customers.archivedAt)))
    .orderBy(asc(customers.name))
    .limit(1000);
}
