import { beforeAll, describe, expect, it, vi } from "vitest";
import type * as Notices from "@/server/runs/notices";
import { eq } from "drizzle-orm";

// A switch to make the notice step throw, to prove a failure mid-transaction leaves nothing behind.
const failures = vi.hoisted(() => ({ notice: false }));
vi.mock("@/server/runs/notices", async (importOriginal) => {
  const real = await importOriginal<typeof Notices>();
  return { ...real, queueFloorNotice: async (...args: Parameters<typeof real.queueFloorNotice>) => {
    if (failures.notice) throw new Error("simulated failure inside the transaction");
    return real.queueFloorNotice(...args);
  } };
});

import { reestimateAtCheckpoint } from "@/lib/honing";
import { db } from "@/server/db";
import { jobs, runs } from "@/server/db/schema";
import { submitRun } from "@/server/runs/submit-run";
import { laterStockUm } from "@/shared/floor/outcome";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { createFloorPlan, honeStages, levelsOf, runBody, stoneHeightUm } from "./floor-fixtures";

let shop: TestShop;
let other: TestShop;
beforeAll(async () => {
  [shop, other] = await Promise.all([createShopWithMembers("floor runs"), createShopWithMembers("floor runs other")]);
});

const runCount = async (planId: string) => (await db.select({ id: runs.id }).from(runs).where(eq(runs.planId, planId))).length;

describe("a run is written exactly once", () => {
  it("a retried submission with the same id gets the same answer and is stored once; the stone wears once", async () => {
    const { planId, plan } = await createFloorPlan(shop);
    const { s: first, position } = honeStages(plan.cylinders[0]!.plan.stages)[0]!;
    const before = await stoneHeightUm(first!.stoneId);
    const body = runBody(planId, { stagePosition: position, strokesDone: first!.strokes.nominal });
    const a = await submitRun({ actor: shop.actors.apprentice, input: body });
    const b = await submitRun({ actor: shop.actors.apprentice, input: body });
    const c = await submitRun({ actor: shop.actors.apprentice, input: { ...body, strokesDone: 1 } });
    expect(b).toEqual(a);
    expect(c).toEqual(a);
    expect(await runCount(planId)).toBe(1);
    expect(before - (await stoneHeightUm(first!.stoneId))).toBeCloseTo(a.stoneWearUm, 6);
  });

  it("concurrent doubles of one submission are stored once and all get the first's answer", async () => {
    const { planId, plan } = await createFloorPlan(shop);
    const { s: first, position } = honeStages(plan.cylinders[0]!.plan.stages)[0]!;
    const before = await stoneHeightUm(first!.stoneId);
    const body = runBody(planId, { stagePosition: position, strokesDone: first!.strokes.nominal });
    const answers = await Promise.all(Array.from({ length: 6 }, () => submitRun({ actor: shop.actors.apprentice, input: body })));
    for (const answer of answers) expect(answer).toEqual(answers[0]);
    expect(await runCount(planId)).toBe(1);
    expect(before - (await stoneHeightUm(first!.stoneId))).toBeCloseTo(answers[0]!.stoneWearUm, 6);
  });

  it("a failure inside the transaction leaves no run, no wear and no status change", async () => {
    const { planId, plan, job } = await createFloorPlan(shop);
    const cyl = plan.cylinders[0]!;
    const { s: first, position } = honeStages(cyl.plan.stages)[0]!;
    const before = await stoneHeightUm(first!.stoneId);
    // A reading past the band stops the stage, which queues a notice: that step fails here.
    const past = cyl.plan.sizing!.maxUm + 5;
    failures.notice = true;
    try {
      await expect(submitRun({ actor: shop.actors.apprentice, input: runBody(planId, { stagePosition: position, readings: levelsOf([past, past, past]) }) })).rejects.toThrow(/simulated/);
    } finally {
      failures.notice = false;
    }
    expect(await runCount(planId)).toBe(0);
    expect(await stoneHeightUm(first!.stoneId)).toBe(before);
    const [row] = await db.select({ status: jobs.status }).from(jobs).where(eq(jobs.id, job.jobId));
    expect(row!.status).toBe("planned");
  });
});

describe("what a run changes", () => {
  it("the stone's height goes down by the stage's planned wear over a checkpoint and the rest, and the job is in work", async () => {
    const { planId, plan, job } = await createFloorPlan(shop);
    const cyl = plan.cylinders[0]!;
    const { s: coarse, position } = honeStages(cyl.plan.stages)[0]!;
    const checkpoint = coarse!.checkpoint!;
    const before = await stoneHeightUm(coarse!.stoneId);
    const atCheckpoint = await submitRun({
      actor: shop.actors.apprentice,
      input: runBody(planId, { stagePosition: position, strokesDone: checkpoint.afterStrokes, readings: checkpoint.expectedByLevel.map((l: { level: string; aUm: number; bUm: number }) => ({ name: l.level, aUm: l.aUm, bUm: l.bUm })) }),
    });
    expect(atCheckpoint.outcome).toBe("checkpoint");
    const rest = coarse!.strokes.nominal - checkpoint.afterStrokes;
    const done = await submitRun({ actor: shop.actors.apprentice, input: runBody(planId, { stagePosition: position, strokesDone: rest }) });
    expect(done.outcome).toBe("done");
    // Planned wear of the stage (rounded to the 0.1 µm the column keeps, once per block).
    expect(before - (await stoneHeightUm(coarse!.stoneId))).toBeCloseTo(coarse!.stoneWear.wearUm, 0);
    expect(Math.abs(before - (await stoneHeightUm(coarse!.stoneId)) - coarse!.stoneWear.wearUm)).toBeLessThanOrEqual(0.1);
    const [row] = await db.select({ status: jobs.status }).from(jobs).where(eq(jobs.id, job.jobId));
    expect(row!.status).toBe("in_work");
  });

  it("the re-estimate the server stores is src/lib/honing's answer for the reading", async () => {
    const { planId, plan } = await createFloorPlan(shop);
    const cyl = plan.cylinders[0]!;
    const { s: coarse, position } = honeStages(cyl.plan.stages)[0]!;
    const checkpoint = coarse!.checkpoint!;
    const slow = checkpoint.expectedByLevel.map((l) => l.diameterUm - 4);
    const answer = await submitRun({ actor: shop.actors.apprentice, input: runBody(planId, { stagePosition: position, strokesDone: checkpoint.afterStrokes, readings: levelsOf(slow) }) });
    const lib = reestimateAtCheckpoint({
      stage: coarse!, levels: levelsOf(slow), strokesDone: checkpoint.afterStrokes, bandMaxUm: cyl.plan.finalCheck!.maxUm,
      laterStockUm: laterStockUm(cyl.plan.stages, position), taperToleranceUm: cyl.plan.finalCheck!.taperToleranceUm,
    });
    expect(answer.reestimate).toEqual(JSON.parse(JSON.stringify(lib)));
    expect(answer.reestimate!.strokesToRun).toBeGreaterThan(coarse!.strokes.nominal - checkpoint.afterStrokes);
  });

  it("a reading past what the band allows stops the stage, and the cylinder takes no more runs", async () => {
    const { planId, plan } = await createFloorPlan(shop);
    const cyl = plan.cylinders[0]!;
    const [firstStage, secondStage] = honeStages(cyl.plan.stages);
    const { position } = firstStage!;
    const next = secondStage!.position;
    const past = cyl.plan.sizing!.maxUm + 1;
    const stopped = await submitRun({ actor: shop.actors.apprentice, input: runBody(planId, { stagePosition: position, readings: levelsOf([past, past, past]) }) });
    expect(stopped.outcome).toBe("stopped");
    expect(stopped.reestimate!.action).toBe("stop_call_machinist");
    await expect(submitRun({ actor: shop.actors.apprentice, input: runBody(planId, { stagePosition: next }) })).rejects.toMatchObject({ code: "conflict" });
  });

  it("a stage logged as done refuses another 'done' with a different id", async () => {
    const { planId, plan } = await createFloorPlan(shop);
    const { position } = honeStages(plan.cylinders[0]!.plan.stages)[0]!;
    await submitRun({ actor: shop.actors.apprentice, input: runBody(planId, { stagePosition: position }) });
    await expect(submitRun({ actor: shop.actors.apprentice, input: runBody(planId, { stagePosition: position }) })).rejects.toMatchObject({ code: "conflict" });
    expect(await runCount(planId)).toBe(1);
  });
});

describe("who may log", () => {
  it("an apprentice cannot log on a cylinder not assigned to them; a machinist can", async () => {
    const { planId, plan } = await createFloorPlan(shop, 2);
    const { position } = honeStages(plan.cylinders[1]!.plan.stages)[0]!;
    await expect(submitRun({ actor: shop.actors.apprentice, input: runBody(planId, { cylinder: 2, stagePosition: position }) })).rejects.toMatchObject({ code: "forbidden" });
    expect((await submitRun({ actor: shop.actors.machinist, input: runBody(planId, { cylinder: 2, stagePosition: position }) })).outcome).toBe("done");
  });

  it("another shop's plan is not found, and bad input changes nothing", async () => {
    const { planId } = await createFloorPlan(shop);
    await expect(submitRun({ actor: other.actors.owner, input: runBody(planId) })).rejects.toMatchObject({ code: "not_found" });
    await expect(submitRun({ actor: shop.actors.apprentice, input: runBody(planId, { strokesDone: -3 }) })).rejects.toThrow(/negative/);
    await expect(submitRun({ actor: shop.actors.apprentice, input: runBody(planId, { id: "not-a-device-id" }) })).rejects.toThrow(/device id/);
    await expect(submitRun({ actor: shop.actors.apprentice, input: runBody(planId, { readings: levelsOf([9, 9, 9]) }) })).rejects.toThrow(/direction A/);
    expect(await runCount(planId)).toBe(0);
  });
});
