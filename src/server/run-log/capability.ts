import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { histogram, outsideShare, processCapability, type Capability, type FinishedBore, type ReadingLevel } from "@/lib/honing";
import type { BoreMaterial } from "@/lib/bore-materials";
import { db } from "@/server/db";
import { finalInspections, machines, plans } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { CAPABILITY_BORES } from "@/shared/runs/log-schema";

// Process capability per machine × bore material (issue 13): the last N finished bores' size, as the
// deviation of the mean corrected diameter from that bore's own target, against the band relative to
// each target. Bores of one machine and material can have different bands (pistons differ), so the
// indices use the narrowest band among them: a conservative reading. A cylinder inspected again counts
// once (its latest check); a check held for temperature is no finished size.

type Summary = { cylinders: Array<{ cylinder: number; plan?: { sizing?: FinishedBore } | null }> };

export type CapabilityView = {
  machineId: string; machineName: string; boreMaterial: BoreMaterial; asked: number;
  count: number; needed: number;
  capability: Capability | null; lowerUm: number | null; upperUm: number | null; outsideShare: number | null;
  bins: Array<{ fromUm: number; toUm: number; count: number }>;
};

const diameterUm = (levels: readonly ReadingLevel[]) => levels.reduce((a, l) => a + (l.aUm + l.bUm) / 2, 0) / levels.length;

/** The histogram's bin: half a micrometre, as fine as a bore gauge's reading is worth [common practice]. */
const BIN_UM = 0.5;

export async function getCapability({ actor, machineId, boreMaterial, bores }: { actor: Actor; machineId: string; boreMaterial: BoreMaterial; bores: number }): Promise<CapabilityView | null> {
  assertCan(actor, "runs.view");
  const [machine] = await db.select({ id: machines.id, name: machines.name }).from(machines).where(and(eq(machines.id, machineId), eq(machines.shopId, actor.shopId))).limit(1);
  if (!machine) return null;
  const n = Math.min(Math.max(bores, CAPABILITY_BORES.min), CAPABILITY_BORES.max);
  // Twice N rows leave room for re-inspected cylinders; still a bounded read.
  const found = await db
    .select({ cylinderId: finalInspections.cylinderId, cylinder: finalInspections.cylinderNumber, readings: finalInspections.readings, summary: plans.summary })
    .from(finalInspections)
    .innerJoin(plans, eq(plans.id, finalInspections.planId))
    .where(and(eq(finalInspections.shopId, actor.shopId), eq(plans.shopId, actor.shopId), eq(plans.machineId, machineId), eq(plans.boreMaterial, boreMaterial), inArray(finalInspections.status, ["pass", "fail"])))
    .orderBy(desc(finalInspections.inspectedAt), desc(finalInspections.createdAt))
    .limit(n * 2);
  const seen = new Set<string>();
  const deviations: Array<{ dev: number; lower: number; upper: number }> = [];
  for (const r of found) {
    if (seen.has(r.cylinderId) || deviations.length >= n) continue;
    seen.add(r.cylinderId);
    const sizing = (r.summary as Summary).cylinders.find((c) => c.cylinder === r.cylinder)?.plan?.sizing;
    const levels = r.readings as ReadingLevel[];
    if (!sizing || levels.length === 0) continue;
    deviations.push({ dev: diameterUm(levels) - sizing.targetUm, lower: sizing.minUm - sizing.targetUm, upper: sizing.maxUm - sizing.targetUm });
  }
  const base = { machineId, machineName: machine.name, boreMaterial, asked: n, count: deviations.length, needed: CAPABILITY_BORES.min };
  if (deviations.length < CAPABILITY_BORES.min) return { ...base, capability: null, lowerUm: null, upperUm: null, outsideShare: null, bins: [] };
  const lowerUm = Math.max(...deviations.map((d) => d.lower));
  const upperUm = Math.min(...deviations.map((d) => d.upper));
  const values = deviations.map((d) => d.dev);
  const capability = lowerUm < upperUm ? processCapability(values, lowerUm, upperUm) : null;
  return {
    ...base, capability, lowerUm, upperUm,
    outsideShare: capability && capability.sdUm > 0 ? outsideShare(capability.meanUm, capability.sdUm, lowerUm, upperUm) : null,
    bins: histogram(values, BIN_UM),
  };
}

/** The machine and material the capability card opens on: the filter's, else the latest finished bore's. */
export async function capabilityDefaults({ actor, machineId, boreMaterial }: { actor: Actor; machineId?: string; boreMaterial?: BoreMaterial }) {
  assertCan(actor, "runs.view");
  if (machineId && boreMaterial) return { machineId, boreMaterial };
  const [latest] = await db
    .select({ machineId: plans.machineId, boreMaterial: plans.boreMaterial })
    .from(finalInspections)
    .innerJoin(plans, eq(plans.id, finalInspections.planId))
    .where(and(eq(finalInspections.shopId, actor.shopId), ...(machineId ? [eq(plans.machineId, machineId)] : []), ...(boreMaterial ? [eq(plans.boreMaterial, boreMaterial)] : [])))
    .orderBy(desc(finalInspections.inspectedAt))
    .limit(1);
  const m = machineId ?? latest?.machineId;
  const b = boreMaterial ?? latest?.boreMaterial;
  return m && b ? { machineId: m, boreMaterial: b as BoreMaterial } : null;
}
