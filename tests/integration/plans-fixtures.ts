// Rows for the plans integration tests: a shop with a machine, a stone per role with grey-iron rate
// rows, and a job with readings and pistons made through the jobs engineer's server functions.
// All numbers are INVENTED test inputs (the stone rows mirror src/lib/honing/testing/fixtures.ts).
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { machines, rateRows, stones } from "@/server/db/schema";
import { createJob } from "@/server/jobs/mutations";
import { listCylinders } from "@/server/jobs/queries";
import { createReadingSet } from "@/server/readings/mutations";
import { createPiston } from "@/server/pistons/mutations";
import { updateRateRow } from "@/server/stones/rate-mutations";
import type { MachineInput, StoneInput } from "@/lib/honing";
import type { Actor } from "@/shared/auth/policy";
import { createShopWithMembers, type TestShop } from "../support/fixtures";

const THOU = 25.4;
export const PISTON_UM = 93_920;
/** Demo-style band 3.5–4.5 thou around 4 thou (invented for tests). */
export const CLEARANCE = { minUm: 3.5 * THOU, maxUm: 4.5 * THOU, targetUm: 4 * THOU, performanceAllowanceUm: 0 };
export const BORE_LENGTH_UM = 140_000;

export const MACHINE: MachineInput = { spindleRpmMin: 80, spindleRpmMax: 400, doubleStrokesPerMinMin: 20, doubleStrokesPerMinMax: 200, maxStrokeLengthUm: 250_000, drive: "constant" };

const STONE_ROWS = [
  { role: "coarse", grit: 150, removal: 1.2, ra: 1.6, rz: 7, wear: 0.5, unc: 0.25 },
  { role: "finish", grit: 400, removal: 0.5, ra: 0.5, rz: 3, wear: 0.3, unc: 0.25 },
  { role: "plateau", grit: 800, removal: 0.2, ra: 0.3, rz: 1.5, wear: 0.2, unc: 0.3 },
] as const;

export type PlanShop = TestShop & { machineId: string; stoneIds: Record<"coarse" | "finish" | "plateau", string>; rateRowIds: Record<"coarse" | "finish" | "plateau", string> };

async function addLibrary(shopId: string, tag: string) {
  const machineId = randomUUID();
  await db.insert(machines).values({
    id: machineId, shopId, name: `Test hone ${tag}`, ...MACHINE, pressureUnit: "bar", pressureMin: 0.5, pressureMax: 10, headStoneLengthUm: 75_000, isDemo: true,
  });
  const stoneIds = {} as PlanShop["stoneIds"];
  const rateRowIds = {} as PlanShop["rateRowIds"];
  for (const s of STONE_ROWS) {
    const id = randomUUID();
    const rateId = randomUUID();
    await db.insert(stones).values({
      id, shopId, code: `T-${s.role}-${tag}`, role: s.role, abrasive: "aluminium_oxide", gritScale: "FEPA-F", gritNumber: s.grit, bond: "vitrified",
      stoneLengthUm: 75_000, stoneWidthUm: 6_000, stonesPerHead: 4, startHeightUm: 8_000, wearLimitHeightUm: 1_000, currentHeightUm: 6_000,
    });
    await db.insert(rateRows).values({
      id: rateId, shopId, stoneId: id, boreMaterial: "grey_iron", removalPerDoubleStrokeUm: s.removal, referencePressure: 1, referencePressureUnit: "bar",
      referenceBoreLengthUm: 140_000, raUm: s.ra, rzUm: s.rz, cleanupMode: "from_rz", cleanupRzMultiple: 3, wearUmPerUmStock: s.wear, uncertaintyFraction: s.unc, source: "demo",
    });
    stoneIds[s.role] = id;
    rateRowIds[s.role] = rateId;
  }
  return { machineId, stoneIds, rateRowIds };
}

/** The StoneInputs planHone should get for the fixture library, built by hand from the same figures. */
export function expectedStones(shop: PlanShop): StoneInput[] {
  return STONE_ROWS.map((s) => ({
    id: shop.stoneIds[s.role], role: s.role, stoneLengthUm: 75_000, currentHeightUm: 6_000, wearLimitHeightUm: 1_000,
    rate: { removalPerDoubleStrokeUm: s.removal, referencePressure: 1, referenceBoreLengthUm: 140_000, uncertaintyFraction: s.unc, raUm: s.ra, rzUm: s.rz, wearUmPerUmStock: s.wear, cleanupRzMultiple: 3 },
  }));
}

export async function createPlanShop(label: string): Promise<PlanShop> {
  const shop = await createShopWithMembers(`plans ${label}`);
  return { ...shop, ...(await addLibrary(shop.shopId, randomUUID().slice(0, 8))) };
}

const libraries = new Map<string, Promise<Awaited<ReturnType<typeof addLibrary>>>>();
/** Gives an existing test shop (e.g. the matrix's) a plan library once. */
export async function withLibrary(shop: TestShop): Promise<PlanShop> {
  if (!libraries.has(shop.shopId)) libraries.set(shop.shopId, addLibrary(shop.shopId, randomUUID().slice(0, 8)));
  return { ...shop, ...(await libraries.get(shop.shopId)!) };
}

/** Three levels, A/B; `offsetUm` shifts the whole bore (e.g. to push one over the target). */
export const levelsFor = (baseUm: number) => [
  { name: "top", aUm: baseUm + 6, bUm: baseUm + 4 },
  { name: "middle", aUm: baseUm + 2, bUm: baseUm + 1 },
  { name: "bottom", aUm: baseUm, bUm: baseUm + 1 },
];

/**
 * A job with readings and a piston for every cylinder; `boreBaseUm(n)` gives cylinder n's smallest reading.
 * Pistons are assigned to their cylinders, loose (on the job, no cylinder, sizes a little apart) or absent.
 */
export async function createPlanJob(actor: Actor, cylinderCount: number, boreBaseUm: (n: number) => number | null = () => 93_960, pistons: "assigned" | "loose" | "none" = "assigned") {
  const job = await createJob({
    actor,
    input: { engineDescription: "Test inline engine (invented)", boreMaterial: "grey_iron", cylinderCount, standardBoreUm: 94_000, boreLengthUm: BORE_LENGTH_UM, torquePlate: false },
  });
  const cylinders = await listCylinders({ shopId: actor.shopId, jobId: job.id });
  for (const c of cylinders) {
    const base = boreBaseUm(c.number);
    if (base !== null) await createReadingSet({ actor, jobId: job.id, input: { cylinderId: c.id, kind: "as_received", levels: levelsFor(base) } });
    if (pistons === "none") continue;
    const loose = pistons === "loose";
    await createPiston({
      actor, jobId: job.id,
      input: {
        cylinderId: loose ? null : c.id, label: loose ? `L${c.number}` : String(c.number), diameterUm: loose ? PISTON_UM + 2 * c.number : PISTON_UM,
        sizingHeightUm: 15_000, type: "forged", clearanceMinUm: CLEARANCE.minUm, clearanceMaxUm: CLEARANCE.maxUm,
      },
    });
  }
  return { jobId: job.id, number: job.number, cylinders };
}

/** The lead changes a rate row through the stones domain: twice the removal, with a reason. */
export async function changeRateRow(lead: Actor, rateRowId: string) {
  const [row] = await db.select().from(rateRows).where(eq(rateRows.id, rateRowId));
  const skip = new Set(["id", "shopId", "stoneId", "boreMaterial", "version", "createdAt", "updatedAt"]);
  const input = Object.fromEntries(Object.entries(row!).filter(([k]) => !skip.has(k)).map(([k, v]) => [k, v ?? undefined]));
  await updateRateRow({ actor: lead, input: { ...input, removalPerDoubleStrokeUm: row!.removalPerDoubleStrokeUm * 2, rateRowId, expectedVersion: row!.version, reason: "Re-measured on the shop's test bore" } });
}

export const baseRequest = (shop: PlanShop, jobId: string) => ({ mode: "job" as const, jobId, machineId: shop.machineId, clearance: { ...CLEARANCE } });
