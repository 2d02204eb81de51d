// Issue 15 §1: per-parent bounds, piston matching bounded with 1 000 loose pistons, no truncated planning reads.
import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import { db } from "@/server/db";
import { pistons, readingSets, readings } from "@/server/db/schema";
import { POST as previewRoute } from "@/app/api/plans/preview/route";
import { MAX_CHILDREN } from "@/server/db/bounds";
import { createPiston } from "@/server/pistons/mutations";
import { loadJobPlanningRecords } from "@/server/plans/records";
import { newClientId } from "@/shared/client-id";
import { asUser, makeRequest } from "../support/session";
import { CLEARANCE, PISTON_UM, baseRequest, createPlanJob, createPlanShop } from "./plans-fixtures";
import { expectAppError } from "./jobs-support";

const pistonInput = (label: string, extra: Record<string, unknown> = {}) => ({
  label, diameterUm: PISTON_UM, sizingHeightUm: 15_000, type: "forged", clearanceMinUm: CLEARANCE.minUm, clearanceMaxUm: CLEARANCE.maxUm, ...extra,
});

/** Rows written straight to the table, as a shop could have before the bounds existed. */
async function insertLoosePistons(shopId: string, jobId: string, n: number) {
  for (let i = 0; i < n; i += 500) {
    await db.insert(pistons).values(Array.from({ length: Math.min(500, n - i) }, (_, k) => ({
      id: randomUUID(), shopId, jobId, label: `L${i + k}`, diameterUm: PISTON_UM - ((i + k) % 17), sizingHeightUm: 15_000, type: "forged" as const,
      clearanceMinUm: CLEARANCE.minUm, clearanceMaxUm: CLEARANCE.maxUm,
    })));
  }
}

describe("bounded work", () => {
  it("refuses the piston past the per-job bound with a clear message, and answers a retried create once", async () => {
    const shop = await createPlanShop("bound-pistons");
    const job = await createPlanJob(shop.actors.machinist, 2);
    const actor = shop.actors.machinist;
    const clientId = newClientId();
    const [a, b] = await Promise.all([createPiston({ actor, jobId: job.jobId, input: pistonInput("S1", { clientId }) }), createPiston({ actor, jobId: job.jobId, input: pistonInput("S1", { clientId }) })]);
    expect([a.id, b.id]).toEqual([clientId, clientId]);
    await insertLoosePistons(shop.shopId, job.jobId, MAX_CHILDREN.pistonsPerJob - 3);
    const refused = await expectAppError(createPiston({ actor, jobId: job.jobId, input: pistonInput("one too many") }), "conflict");
    expect(refused.message).toBe(`At most ${MAX_CHILDREN.pistonsPerJob} pistons per job. Remove one you no longer need first. Nothing was saved.`);
  });

  it("plans a job with 1 000 loose pistons (label order, no unbounded matching)", async () => {
    const shop = await createPlanShop("bound-match");
    const job = await createPlanJob(shop.actors.machinist, 4);
    await db.delete(pistons).where((await import("drizzle-orm")).eq(pistons.jobId, job.jobId));
    await insertLoosePistons(shop.shopId, job.jobId, 1000);
    await asUser(shop.actors.machinist);
    const res = await previewRoute(makeRequest("/api/plans/preview", { method: "POST", body: baseRequest(shop, job.jobId) }), { params: Promise.resolve({}) });
    expect(res.status).toBe(200);
    const preview = await res.json();
    expect(preview.cylinders).toHaveLength(4);
  });

  it("reads planning data over 1 MiB whole (group_concat_max_len raised for the statement)", async () => {
    const shop = await createPlanShop("bound-mib");
    const job = await createPlanJob(shop.actors.machinist, 1);
    const setId = randomUUID();
    await db.insert(readingSets).values({ id: setId, shopId: shop.shopId, jobId: job.jobId, cylinderId: job.cylinders[0]!.id, kind: "as_received", source: "manual", takenBy: shop.actors.machinist.userId, takenAt: new Date(Date.UTC(2020, 0, 1)) });
    const count = 10_000; // ~130 bytes of JSON each: ~1.3 MiB in the points column
    for (let i = 0; i < count / 2; i += 1000) {
      await db.insert(readings).values(Array.from({ length: 1000 }, (_, k) => k).flatMap((k) => (["A", "B"] as const).map((direction) => ({
        id: randomUUID(), shopId: shop.shopId, readingSetId: setId, levelIndex: i + k, level: `level ${i + k}`, direction, diameterUm: 93_960,
      }))));
    }
    const records = await loadJobPlanningRecords({ actor: shop.actors.machinist, jobId: job.jobId, machineId: shop.machineId });
    const big = records.sets.find((s) => s.id === setId)!;
    expect(big.levels).toHaveLength(count / 2);
  });
});
