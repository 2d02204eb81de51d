import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { jobs, plans } from "@/server/db/schema";
import { releasePlanAction, savePlanDraftAction, saveQuickPlanAction, withdrawPlanAction } from "@/app/(shop)/plan/actions";
import { savePlanDraft, releasePlan } from "@/server/plans/mutations";
import { getPlan, isStoneInReleasedPlan, listPlansForJob } from "@/server/plans/queries";
import { previewPlan } from "@/server/plans/preview";
import { asUser } from "../support/session";
import { actionOutcome } from "../support/matrix";
import { BORE_LENGTH_UM, CLEARANCE, PISTON_UM, baseRequest, changeRateRow, createPlanJob, createPlanShop, type PlanShop } from "./plans-fixtures";

let shop: PlanShop;
// The plan screens' server actions, called as the signed-in user (asUser) the way the wizard calls them.
const release = (planId: string) => releasePlanAction(null, { planId });
const withdraw = (planId: string, input: unknown) => withdrawPlanAction(null, { planId, input });

async function savedDraft(cylinders = 2, base: (n: number) => number | null = () => 93_958) {
  const job = await createPlanJob(shop.actors.machinist, cylinders, base);
  const { planId } = await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) });
  return { job, planId };
}

beforeAll(async () => {
  shop = await createPlanShop("save");
});

describe("saving a plan", () => {
  it("stores the numbers of the preview and reads them back unchanged", async () => {
    const job = await createPlanJob(shop.actors.machinist, 3);
    await asUser(shop.actors.machinist);
    const result = await savePlanDraftAction(null, { input: baseRequest(shop, job.jobId) });
    expect(result.ok).toBe(true);
    const { planId } = result.ok ? result.data! : { planId: "" };
    const preview = await previewPlan({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) });
    const saved = await getPlan({ actor: shop.actors.machinist, jobId: job.jobId, planId });
    expect(saved.status).toBe("draft");
    expect(saved.cylinders.map((c) => c.plan)).toEqual(JSON.parse(JSON.stringify(preview.cylinders.map((c) => c.plan))));
    expect((await listPlansForJob({ actor: shop.actors.apprentice, jobId: job.jobId })).map((p) => p.id)).toEqual([planId]);
  });

  it("keeps its numbers after the rate table changes, and says the table changed since", async () => {
    const { job, planId } = await savedDraft();
    const before = await getPlan({ actor: shop.actors.machinist, jobId: job.jobId, planId });
    expect(before.tableChanges).toEqual([]);
    await changeRateRow(shop.actors.lead, shop.rateRowIds.finish);
    const after = await getPlan({ actor: shop.actors.machinist, jobId: job.jobId, planId });
    expect(after.cylinders).toEqual(before.cylinders);
    expect(after.tableChanges).toEqual([expect.objectContaining({ rateRowId: shop.rateRowIds.finish, usedVersion: before.rateVersions.find((v) => v.rateRowId === shop.rateRowIds.finish)!.rateRowVersion })]);
    const fresh = await previewPlan({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) });
    const finish = (p: typeof fresh.cylinders[number]["plan"]) => p!.stages.find((s) => s.kind === "finish");
    expect(finish(fresh.cylinders[0]!.plan)).not.toEqual(finish(after.cylinders[0]!.plan));
  });

  it("refuses to save a cylinder with neither readings nor a typed figure", async () => {
    const job = await createPlanJob(shop.actors.machinist, 2, (n) => (n === 2 ? null : 93_958));
    await expect(savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) })).rejects.toMatchObject({ code: "bad_request", fieldErrors: { "cylinders.1.bore": [expect.any(String)] } });
  });
});

describe("releasing and withdrawing", () => {
  it("refuses release by a machinist (403) and accepts it from a lead; the job becomes planned", async () => {
    const { job, planId } = await savedDraft();
    await asUser(shop.actors.machinist);
    expect(actionOutcome(await release(planId))).toBe(403);
    await asUser(shop.actors.lead);
    expect(actionOutcome(await release(planId))).toBe("allowed");
    const [row] = await db.select({ status: plans.status, releasedBy: plans.releasedBy }).from(plans).where(eq(plans.id, planId));
    expect(row).toEqual({ status: "released", releasedBy: shop.actors.lead.userId });
    const [jobRow] = await db.select({ status: jobs.status }).from(jobs).where(eq(jobs.id, job.jobId));
    expect(jobRow!.status).toBe("planned");
    expect(await isStoneInReleasedPlan(shop.shopId, shop.stoneIds.finish)).toBe(true);
  });

  it("keeps one released plan per job, even when two releases race", async () => {
    const { job, planId } = await savedDraft();
    const { planId: second } = await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) });
    const results = await Promise.allSettled([releasePlan({ actor: shop.actors.lead, planId }), releasePlan({ actor: shop.actors.owner, planId: second })]);
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    expect(results.find((r) => r.status === "rejected")).toMatchObject({ reason: { code: "conflict" } });
    const released = await db.select({ id: plans.id }).from(plans).where(eq(plans.releasedJobId, job.jobId));
    expect(released).toHaveLength(1);
  });

  it("refuses to release a plan with errors (the over-size bore)", async () => {
    const { planId } = await savedDraft(2, (n) => (n === 2 ? 94_030 : 93_958));
    await asUser(shop.actors.lead);
    const result = await release(planId);
    expect(result).toMatchObject({ ok: false, message: expect.stringContaining("errors") });
  });

  it("needs a reason to withdraw, then frees the job for another release", async () => {
    const { job, planId } = await savedDraft();
    await releasePlan({ actor: shop.actors.lead, planId });
    await asUser(shop.actors.lead);
    const noReason = await withdraw(planId, { reason: " " });
    expect(noReason.ok).toBe(false);
    expect(noReason.ok ? {} : noReason.fieldErrors).toHaveProperty("reason");
    await asUser(shop.actors.machinist);
    expect(actionOutcome(await withdraw(planId, { reason: "Pistons swapped for another set" }))).toBe(403);
    await asUser(shop.actors.lead);
    expect(actionOutcome(await withdraw(planId, { reason: "Pistons swapped for another set" }))).toBe("allowed");
    const saved = await getPlan({ actor: shop.actors.lead, jobId: job.jobId, planId });
    expect(saved).toMatchObject({ status: "withdrawn", withdrawnReason: "Pistons swapped for another set" });
    const { planId: next } = await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) });
    await expect(releasePlan({ actor: shop.actors.lead, planId: next })).resolves.toMatchObject({ status: "released" });
  });

  it("answers another shop's plan as not found", async () => {
    const { planId } = await savedDraft();
    const other = await createPlanShop("save other");
    await asUser(other.actors.lead);
    expect(actionOutcome(await release(planId))).toBe(404);
    expect(actionOutcome(await withdraw(planId, { reason: "not ours" }))).toBe(404);
  });
});

describe("quick plan saved into a new job", () => {
  it("books a job in with the plan's inputs on every cylinder", async () => {
    await asUser(shop.actors.machinist);
    const plan = { mode: "quick", boreMaterial: "grey_iron", boreLengthUm: BORE_LENGTH_UM, pistonDiameterUm: PISTON_UM, bore: { kind: "stock", stockUm: 70 }, machineId: shop.machineId, clearance: CLEARANCE };
    const body = { plan, job: { engineDescription: "Inline four, quick plan test (invented)", cylinderCount: 4, standardBoreUm: 94_000 } };
    const result = await saveQuickPlanAction(null, { input: body });
    expect(result.ok).toBe(true);
    const { jobId, planId } = result.ok ? result.data! : { jobId: "", planId: "" };
    const saved = await getPlan({ actor: shop.actors.machinist, jobId, planId });
    expect(saved.cylinders).toHaveLength(4);
    expect(saved.cylinders.every((c) => c.bore?.basis === "stock" && c.piston?.source === "typed")).toBe(true);
  });

  it("books nothing in when the machine is not the shop's", async () => {
    const other = await createPlanShop("quick other");
    await asUser(shop.actors.machinist);
    const plan = { mode: "quick", boreMaterial: "grey_iron", boreLengthUm: BORE_LENGTH_UM, pistonDiameterUm: PISTON_UM, bore: { kind: "stock", stockUm: 70 }, machineId: other.machineId, clearance: CLEARANCE };
    const before = await db.select({ id: jobs.id }).from(jobs).where(eq(jobs.shopId, shop.shopId));
    const result = await saveQuickPlanAction(null, { input: { plan, job: { engineDescription: "Nothing (invented)", cylinderCount: 1, standardBoreUm: 94_000 } } });
    expect(actionOutcome(result)).toBe(404);
    expect(await db.select({ id: jobs.id }).from(jobs).where(eq(jobs.shopId, shop.shopId))).toHaveLength(before.length);
  });
});
