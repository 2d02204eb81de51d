import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import type { CylinderVerdict, SurfaceReading } from "@/lib/honing";
import { db, type Db, type Tx } from "@/server/db";
import { customers, finalInspections, jobs, planStages, plans, recordSettings, shops, users } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import { can, type Actor } from "@/shared/auth/policy";
import { AppError, notFound } from "@/server/errors";
import { fromJson, type PlanSummary } from "@/server/plans/store";
import { getShopSettings } from "@/server/shop-settings/queries";
import { DEFAULT_RECORD_REMARKS } from "@/shared/records/constants";
import type { RecordSource } from "@/shared/records/view";
import type { StoneRoleName } from "@/shared/stones/constants";
import type { UnitSystem } from "@/shared/units";
import { viewerUnits } from "@/server/units";
import { knownTimeZone } from "@/shared/time";

// What the machining record is made of, loaded in one place and scoped by the actor's shop: the job,
// its done plan, every cylinder's latest final check (all passed, or no record), the stones of each
// stage and the shop's record settings.

export const notPassed = (number: number) =>
  new AppError("conflict", `Job #${number} has not passed its final inspection, so it has no machining record yet.`);

/** The shop's record settings, or the defaults. */
export async function recordSettingsFor(shopId: string, tx: Db | Tx = db) {
  const [row] = await tx.select().from(recordSettings).where(eq(recordSettings.shopId, shopId)).limit(1);
  return { address: row?.address ?? "", contact: row?.contact ?? "", remarks: row?.remarks ?? DEFAULT_RECORD_REMARKS, logoStoredName: row?.logoStoredName ?? null };
}

export async function loadRecordSource({ actor, jobId, tx = db }: { actor: Actor; jobId: string; tx?: Db | Tx }): Promise<RecordSource> {
  assertCan(actor, "jobs.view");
  const [job] = await tx.select().from(jobs).where(and(eq(jobs.id, jobId), eq(jobs.shopId, actor.shopId))).limit(1);
  if (!job) throw notFound("That job");
  if (job.status !== "inspected" && job.status !== "delivered") throw notPassed(job.number);
  const [plan] = await tx.select().from(plans).where(and(eq(plans.jobId, job.id), eq(plans.shopId, actor.shopId), eq(plans.status, "done"))).orderBy(desc(plans.createdAt)).limit(1);
  if (!plan) throw notPassed(job.number);
  const summary = fromJson<PlanSummary>(plan.summary);
  const checks = await tx.select().from(finalInspections)
    .where(and(eq(finalInspections.shopId, actor.shopId), eq(finalInspections.planId, plan.id)))
    .orderBy(desc(finalInspections.createdAt));
  const latest = new Map<number, (typeof checks)[number]>();
  for (const c of checks) if (!latest.has(c.cylinderNumber)) latest.set(c.cylinderNumber, c);
  if (summary.cylinders.length === 0 || summary.cylinders.some((c) => latest.get(c.cylinder)?.status !== "pass")) throw notPassed(job.number);
  const stages = await tx.select({ cylinder: planStages.cylinderNumber, kind: planStages.kind, stoneId: planStages.stoneId })
    .from(planStages).where(and(eq(planStages.planId, plan.id), eq(planStages.shopId, actor.shopId))).orderBy(asc(planStages.cylinderNumber), asc(planStages.position));
  const inspectorIds = [...new Set([...latest.values()].map((c) => c.inspectedBy))];
  const people = inspectorIds.length === 0 ? [] : await tx.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, inspectorIds));
  const [shop] = await tx.select({ name: shops.name, timeZone: shops.timeZone }).from(shops).where(eq(shops.id, actor.shopId)).limit(1);
  const [customer] = job.customerId ? await tx.select({ name: customers.name }).from(customers).where(and(eq(customers.id, job.customerId), eq(customers.shopId, actor.shopId))).limit(1) : [];
  const settings = await recordSettingsFor(actor.shopId, tx);
  const intake = await getShopSettings({ shopId: actor.shopId, tx });
  const stoneOf = (id: string | null) => summary.stones.find((s) => s.id === id);
  return {
    shop: { name: shop?.name ?? "", address: settings.address, contact: settings.contact, hasLogo: settings.logoStoredName !== null, remarks: settings.remarks, oversizeStepsUm: intake.oversizeStepsUm, timeZone: knownTimeZone(shop?.timeZone) },
    job: { id: job.id, number: job.number, customer: customer?.name ?? null, engineDescription: job.engineDescription, boreMaterial: job.boreMaterial, standardBoreUm: job.standardBoreUm, torquePlate: job.torquePlate, notes: job.notes },
    cylinders: summary.cylinders.map((c) => {
      const check = latest.get(c.cylinder)!;
      const verdict = fromJson<CylinderVerdict>(check.verdict);
      const sizing = c.plan.sizing;
      return {
        number: c.cylinder,
        piston: { label: c.piston?.label ?? "—", diameterUm: sizing?.pistonDiameterUm ?? c.piston?.diameterUm ?? 0, sizingHeightUm: c.piston?.sizingHeightUm ?? null },
        levels: fromJson<{ name: string; aUm: number; bUm: number }[]>(check.readings),
        verdict: { minUm: verdict.minUm, maxUm: verdict.maxUm, taperUm: verdict.taperUm, outOfRoundUm: verdict.outOfRoundUm },
        surface: fromJson<SurfaceReading | null>(check.surface),
        stages: stages.filter((s) => s.cylinder === c.cylinder && s.kind !== "bore").map((s) => {
          const stone = stoneOf(s.stoneId);
          return { role: s.kind as StoneRoleName, code: stone?.code ?? "—", grit: stone?.gritLabel ?? "—" };
        }),
        inspectedBy: people.find((p) => p.id === check.inspectedBy)?.name ?? "a former member",
        inspectedAt: check.inspectedAt,
      };
    }),
    madeAt: new Date(),
  };
}

/** The job's customer's e-mail, the send form's first guess (customers.viewContact). */
export async function recordCustomerEmail(actor: Actor, jobId: string): Promise<string | null> {
  if (!can(actor, "customers.viewContact")) return null;
  const [row] = await db.select({ email: customers.email }).from(jobs).innerJoin(customers, eq(customers.id, jobs.customerId))
    .where(and(eq(jobs.id, jobId), eq(jobs.shopId, actor.shopId), eq(customers.shopId, actor.shopId))).limit(1);
  return row?.email ?? null;
}

/**
 * The unit a job's record opens in when the sender has not chosen: the customer's own unit, then the
 * unit of the last record sent, then the viewer's.
 */
export async function defaultRecordUnit(actor: Actor, jobId: string, lastSent: UnitSystem | null): Promise<UnitSystem> {
  const [row] = await db.select({ unitSystem: customers.unitSystem }).from(jobs).innerJoin(customers, eq(customers.id, jobs.customerId))
    .where(and(eq(jobs.id, jobId), eq(jobs.shopId, actor.shopId), eq(customers.shopId, actor.shopId))).limit(1);
  return row?.unitSystem ?? lastSent ?? (await viewerUnits(actor)).system;
}
