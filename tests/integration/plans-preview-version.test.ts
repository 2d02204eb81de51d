// The preview keeps planning records and answers per shop planning counter (src/server/plans/
// records-cache.ts, preview-memo.ts); database triggers raise the counter on every write the records
// come from. These tests write each kind of planning data (through server functions and straight SQL,
// as any future path might) and check the counter rises and the next identical preview shows the write.
import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { POST } from "@/app/api/plans/preview/route";
import { db } from "@/server/db";
import { jobs, machines, pistons, readingSets, stones } from "@/server/db/schema";
import { updateShopSettings } from "@/server/shop-settings/mutations";
import { createReadingSet } from "@/server/readings/mutations";
import { readPlanningVersion } from "@/server/plans/planning-version";
import { currentPlanningRecords, planningRecordsAt } from "@/server/plans/records-cache";
import type { PlanPreview } from "@/server/plans/preview";
import { validateSessionToken } from "@/server/auth/session";
import { asUser, makeRequest } from "../support/session";
import { baseRequest, changeRateRow, createPlanJob, createPlanShop, levelsFor, type PlanShop } from "./plans-fixtures";

const post = (body: unknown) => POST(makeRequest("/api/plans/preview", { method: "POST", body }), { params: Promise.resolve({}) });
const preview = async (body: unknown) => {
  const response = await post(body);
  expect(response.status).toBe(200);
  return (await response.json()) as PlanPreview;
};
const cyl = (p: PlanPreview) => p.cylinders[0]!;
const SETTINGS = { outOfRoundToleranceUm: 5, boringMarginUm: 10, boringRzUm: 6, asReceivedCleanupUm: 10, boreAboveStockUm: 100, oversizeStepsUm: [0, 250, 500], readingLevels: ["top", "middle", "bottom"] };

type Write = { name: string; write: (shop: PlanShop, jobId: string, before: PlanPreview) => Promise<unknown>; shows: (after: PlanPreview, before: PlanPreview) => void };
const WRITES: Write[] = [
  {
    name: "rate row edit (server function)",
    write: (shop) => changeRateRow(shop.actors.lead, shop.rateRowIds.finish),
    shows: (after, before) => expect(JSON.stringify(after.rateVersions)).not.toBe(JSON.stringify(before.rateVersions)),
  },
  {
    name: "stone edit (SQL)",
    write: (shop) => db.update(stones).set({ currentHeightUm: 5_500 }).where(eq(stones.id, shop.stoneIds.finish)),
    shows: (after) => expect(after.stones.find((s) => s.role === "finish")!.currentHeightUm).toBe(5_500),
  },
  {
    name: "machine edit (SQL)",
    write: (shop) => db.update(machines).set({ doubleStrokesPerMinMax: 150 }).where(eq(machines.id, shop.machineId)),
    shows: (after) => expect(after.machine.doubleStrokesPerMinMax).toBe(150),
  },
  {
    name: "new reading set (server function)",
    write: (shop, jobId, before) =>
      createReadingSet({ actor: shop.actors.machinist, jobId, input: { cylinderId: cyl(before).cylinderId, kind: "as_received", levels: levelsFor(93_970) } }),
    shows: (after, before) => expect(cyl(after).bore!.readingSetId).not.toBe(cyl(before).bore!.readingSetId),
  },
  {
    name: "piston edit (SQL)",
    write: (_shop, _jobId, before) => db.update(pistons).set({ diameterUm: 93_930 }).where(eq(pistons.id, cyl(before).piston!.pistonId!)),
    shows: (after) => expect(cyl(after).piston!.diameterUm).toBe(93_930),
  },
  {
    name: "shop tolerance edit (server function)",
    write: (shop) => updateShopSettings({ actor: shop.actors.owner, input: { ...SETTINGS, taperToleranceUm: 17 } }),
    shows: (after) => expect(cyl(after).plan!.finalCheck!.taperToleranceUm).toBe(17),
  },
  {
    name: "job bore length edit (SQL)",
    write: (_shop, jobId) => db.update(jobs).set({ boreLengthUm: 120_000 }).where(eq(jobs.id, jobId)),
    shows: (after) => expect(after.job!.boreLengthUm).toBe(120_000),
  },
  {
    name: "reading set deleted (its readings go by cascade)",
    write: (_shop, _jobId, before) => db.delete(readingSets).where(eq(readingSets.id, cyl(before).bore!.readingSetId!)),
    shows: (after, before) => expect(cyl(after).bore?.readingSetId ?? null).not.toBe(cyl(before).bore!.readingSetId),
  },
];

let shop: PlanShop;
let other: PlanShop;
beforeAll(async () => {
  [shop, other] = await Promise.all([createPlanShop("version"), createPlanShop("version other")]);
});

describe("planning counter: every write that feeds planning shows in the next identical preview", () => {
  it.each(WRITES)("$name", async ({ write, shows }) => {
    const job = await createPlanJob(shop.actors.machinist, 1);
    await asUser(shop.actors.machinist);
    const before = await preview(baseRequest(shop, job.jobId));
    expect(await preview(baseRequest(shop, job.jobId))).toEqual(before);
    const version = await readPlanningVersion(shop.shopId);
    await write(shop, job.jobId, before);
    expect(await readPlanningVersion(shop.shopId)).toBeGreaterThan(version);
    const after = await preview(baseRequest(shop, job.jobId));
    shows(after, before);
  });

  it("answers 404 for a job deleted since the last preview (its cylinders and pistons go by cascade)", async () => {
    const job = await createPlanJob(shop.actors.machinist, 1);
    await asUser(shop.actors.machinist);
    await preview(baseRequest(shop, job.jobId));
    await db.delete(jobs).where(eq(jobs.id, job.jobId));
    expect((await post(baseRequest(shop, job.jobId))).status).toBe(404);
  });

  it("does not raise our counter for a write in another shop", async () => {
    const job = await createPlanJob(shop.actors.machinist, 1);
    const version = await readPlanningVersion(shop.shopId);
    const otherVersion = await readPlanningVersion(other.shopId);
    await db.update(machines).set({ doubleStrokesPerMinMax: 140 }).where(eq(machines.id, other.machineId));
    await changeRateRow(other.actors.lead, other.rateRowIds.finish);
    expect(await readPlanningVersion(other.shopId)).toBeGreaterThan(otherVersion);
    expect(await readPlanningVersion(shop.shopId)).toBe(version);
    const args = { actor: shop.actors.machinist, jobId: job.jobId, machineId: shop.machineId };
    const first = await currentPlanningRecords(args);
    expect((await currentPlanningRecords(args)).records).toBe(first.records); // kept, not reloaded
  });
});

describe("planning counter is read before the records", () => {
  it("the session query reads the active shop's counter, so the preview needs no query of its own for it", async () => {
    const job = await createPlanJob(shop.actors.machinist, 1);
    const { token } = await asUser(shop.actors.machinist);
    const read = async () => (await validateSessionToken(token))!.activePlanningVersion;
    expect(await read()).toBe(await readPlanningVersion(shop.shopId));
    const before = await preview(baseRequest(shop, job.jobId));
    await db.update(jobs).set({ boreLengthUm: 125_000 }).where(eq(jobs.id, job.jobId));
    expect(await read()).toBe(await readPlanningVersion(shop.shopId));
    const after = await preview(baseRequest(shop, job.jobId));
    expect(after.job!.boreLengthUm).toBe(125_000);
    expect(after).not.toEqual(before);
  });

  it("picks up a write landing between the counter read and the records load on the next request", async () => {
    const job = await createPlanJob(shop.actors.machinist, 1);
    const args = { actor: shop.actors.machinist, jobId: job.jobId, machineId: shop.machineId };
    const [piston] = await db.select({ id: pistons.id }).from(pistons).where(eq(pistons.jobId, job.jobId));
    const pistonId = piston!.id;
    const version = await readPlanningVersion(shop.shopId);
    await db.update(pistons).set({ diameterUm: 93_940 }).where(eq(pistons.id, pistonId)); // the concurrent write
    const loaded = await planningRecordsAt(args, version); // kept under the older counter, yet newer than it
    expect(loaded.pistons[0]!.diameterUm).toBe(93_940);
    await db.update(pistons).set({ diameterUm: 93_935 }).where(eq(pistons.id, pistonId));
    const next = await currentPlanningRecords(args);
    expect(next.version).toBeGreaterThan(version);
    expect(next.records.pistons[0]!.diameterUm).toBe(93_935);
    await asUser(shop.actors.machinist);
    expect(cyl(await preview(baseRequest(shop, job.jobId))).piston!.diameterUm).toBe(93_935);
  });

  it("freezes kept records so no caller can change them in place", async () => {
    const job = await createPlanJob(shop.actors.machinist, 1);
    const { records } = await currentPlanningRecords({ actor: shop.actors.machinist, jobId: job.jobId, machineId: shop.machineId });
    expect(Object.isFrozen(records.pistons[0])).toBe(true);
  });
});
