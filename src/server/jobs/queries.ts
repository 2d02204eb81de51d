import "server-only";
import { and, asc, count, desc, eq, gte, isNotNull, isNull, like, lte, ne, or, sql, type SQL } from "drizzle-orm";
import { db } from "@/server/db";
import { customers, cylinders, jobs, memberships, users } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { likePattern } from "@/server/customers/queries";
import { loadJob } from "./access";
import { jobListSchema, type JobListQuery } from "@/shared/jobs/schema";
import { addDays, todayIn } from "@/shared/time";
import { getShopTimeZone } from "@/server/shop-settings/time-zone";

const listColumns = {
  id: jobs.id,
  number: jobs.number,
  customerId: jobs.customerId,
  customerName: customers.name,
  engineDescription: jobs.engineDescription,
  boreMaterial: jobs.boreMaterial,
  cylinderCount: jobs.cylinderCount,
  standardBoreUm: jobs.standardBoreUm,
  status: jobs.status,
  dueDate: jobs.dueDate,
  archivedAt: jobs.archivedAt,
};

function listFilters(shopId: string, q: JobListQuery): SQL | undefined {
  const filters: SQL[] = [eq(jobs.shopId, shopId)];
  if (q.archived === "exclude") filters.push(isNull(jobs.archivedAt));
  if (q.archived === "only") filters.push(isNotNull(jobs.archivedAt));
  if (q.status === "open") filters.push(ne(jobs.status, "delivered"));
  else if (q.status !== "all") filters.push(eq(jobs.status, q.status));
  if (q.dueFrom) filters.push(gte(jobs.dueDate, q.dueFrom));
  if (q.dueTo) filters.push(lte(jobs.dueDate, q.dueTo));
  if (q.customerId) filters.push(eq(jobs.customerId, q.customerId));
  if (q.q) {
    const text = likePattern(q.q);
    const number = /^#?\d{1,9}$/.test(q.q) ? Number(q.q.replace("#", "")) : null;
    const matches = [like(jobs.engineDescription, text), like(customers.name, text), like(jobs.notes, text)];
    if (number !== null) matches.push(eq(jobs.number, number));
    filters.push(or(...matches)!);
  }
  return and(...filters);
}

function listOrder(q: JobListQuery): SQL[] {
  const dir = q.dir === "desc" ? desc : asc;
  switch (q.sort) {
    // Jobs with no due date sort after every dated job in both directions.
    case "dueDate":
      return [sql`${jobs.dueDate} is null`, dir(jobs.dueDate), desc(jobs.number)];
    case "customer":
      return [dir(customers.name), desc(jobs.number)];
    case "status":
      return [dir(jobs.status), desc(jobs.number)];
    case "createdAt":
      return [dir(jobs.createdAt), desc(jobs.number)];
    default:
      return [dir(jobs.number)];
  }
}

export type JobListRow = Awaited<ReturnType<typeof listJobs>>["rows"][number];

/** One page of the shop's jobs: search, filters, sort and paging all happen in the database. */
export async function listJobs({ actor, query }: { actor: Actor; query: unknown }) {
  assertCan(actor, "jobs.view");
  const q = jobListSchema.parse(query);
  const where = listFilters(actor.shopId, q);
  const rows = await db
    .select(listColumns)
    .from(jobs)
    .leftJoin(customers, eq(customers.id, jobs.customerId))
    .where(where)
    .orderBy(...listOrder(q))
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  const [total] = await db.select({ n: count() }).from(jobs).leftJoin(customers, eq(customers.id, jobs.customerId)).where(where);
  return {
    rows: rows.map(({ archivedAt, ...r }) => ({ ...r, archived: archivedAt !== null })),
    total: total?.n ?? 0,
    page: q.page,
    pageSize: q.pageSize,
  };
}

/** The job's own fields for the detail page, without internal columns. */
export async function getJob({ actor, jobId }: { actor: Actor; jobId: string }) {
  const job = await loadJob({ actor, jobId });
  const [customer] = job.customerId
    ? await db.select({ id: customers.id, name: customers.name }).from(customers).where(and(eq(customers.id, job.customerId), eq(customers.shopId, actor.shopId)))
    : [];
  return {
    id: job.id, number: job.number, customerId: job.customerId, engineDescription: job.engineDescription, boreMaterial: job.boreMaterial,
    cylinderCount: job.cylinderCount, standardBoreUm: job.standardBoreUm, boreLengthUm: job.boreLengthUm, bottomClearanceUm: job.bottomClearanceUm,
    wallThicknessUm: job.wallThicknessUm, minWallUm: job.minWallUm, torquePlate: job.torquePlate, dueDate: job.dueDate, notes: job.notes,
    status: job.status, assignedUserId: job.assignedUserId, customer: customer ?? null, archived: job.archivedAt !== null,
    createdAt: job.createdAt.toISOString(), updatedAt: job.updatedAt.toISOString(),
  };
}
export type JobView = Awaited<ReturnType<typeof getJob>>;

export async function listCylinders({ shopId, jobId }: { shopId: string; jobId: string }) {
  return db
    .select({ id: cylinders.id, number: cylinders.number, assignedUserId: cylinders.assignedUserId })
    .from(cylinders)
    .where(and(eq(cylinders.jobId, jobId), eq(cylinders.shopId, shopId)))
    .orderBy(asc(cylinders.number));
}

/** Members of the shop by name, for "assigned to" pickers. */
export async function listShopMembers({ actor }: { actor: Actor }) {
  assertCan(actor, "jobs.view");
  return db
    .select({ userId: users.id, name: users.name, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.shopId, actor.shopId))
    .orderBy(asc(users.name));
}

/** The user's unit system (metric → mm, inch → in) for parsing bare numbers and for display. */
export async function getUnitSystem({ userId }: { userId: string }): Promise<"metric" | "inch"> {
  const [row] = await db.select({ unitSystem: users.unitSystem }).from(users).where(eq(users.id, userId)).limit(1);
  return row?.unitSystem ?? "metric";
}

/** Jobs in work and jobs due within `days` of the shop's today (its time zone), for the dashboard. */
export async function listDashboardJobs({ actor, days = 7, today = new Date() }: { actor: Actor; days?: number; today?: Date }) {
  assertCan(actor, "jobs.view");
  const until = addDays(todayIn(await getShopTimeZone({ shopId: actor.shopId }), today), days);
  const base = and(eq(jobs.shopId, actor.shopId), isNull(jobs.archivedAt), ne(jobs.status, "delivered"));
  const select = () => db.select(listColumns).from(jobs).leftJoin(customers, eq(customers.id, jobs.customerId));
  const inWork = await select().where(and(base, eq(jobs.status, "in_work"))).orderBy(sql`${jobs.dueDate} is null`, asc(jobs.dueDate)).limit(20);
  const dueSoon = await select().where(and(base, isNotNull(jobs.dueDate), lte(jobs.dueDate, until))).orderBy(asc(jobs.dueDate)).limit(20);
  return { inWork, dueSoon, until };
}
