// Issue 10, one sizing story: the intake summary, the job wizard's preview and the quick plan take the
// honing allowance and the bore-to size from the same function and the same shop settings; only
// readings before machining propose an oversize. Figures are INVENTED test inputs.
import { beforeAll, describe, expect, it } from "vitest";
import { getJobDetail } from "@/server/jobs/detail";
import { listCylinders } from "@/server/jobs/queries";
import { planRequestSchema } from "@/shared/plans/schema";
import { previewRequest } from "@/server/plans/preview";
import { createReadingSet } from "@/server/readings/mutations";
import { createPiston } from "@/server/pistons/mutations";
import { getWizardContext } from "@/server/plans/wizard";
import { BORE_LENGTH_UM, CLEARANCE, PISTON_UM, baseRequest, createPlanJob, createPlanShop, levelsFor, type PlanShop } from "./plans-fixtures";

let shop: PlanShop;
let job: Awaited<ReturnType<typeof createPlanJob>>;

beforeAll(async () => {
  shop = await createPlanShop("sizing story");
  // Worn bores about 0.24 mm under the target: more than the 0.10 mm bore-first default, so the plan bores.
  job = await createPlanJob(shop.actors.machinist, 2, () => 93_780);
});

const boreStage = (stages: Array<{ kind: string }>) => stages.find((s) => s.kind === "bore") as { kind: "bore"; boreToUm: number; honingAllowanceUm: number } | undefined;

describe("one sizing story", () => {
  it("the intake, the wizard and the quick plan give the same honing allowance, and the plans the same bore-to", async () => {
    const actor = shop.actors.machinist;
    const detail = await getJobDetail({ actor, jobId: job.jobId });
    const intakeAllowance = detail.summary.allowance!.allowanceUm;
    const wizard = await previewRequest({ actor, request: planRequestSchema.parse(baseRequest(shop, job.jobId)) });
    const quick = await previewRequest({ actor, request: planRequestSchema.parse({
      mode: "quick", boreMaterial: "grey_iron", boreLengthUm: BORE_LENGTH_UM, pistonDiameterUm: PISTON_UM, bore: { kind: "diameter", diameterUm: 93_780 },
      machineId: shop.machineId, clearance: CLEARANCE,
    }) });
    const wizardBore = boreStage(wizard.cylinders[0]!.plan!.stages)!;
    const quickBore = boreStage(quick.cylinders[0]!.plan!.stages)!;
    expect(wizardBore).toBeDefined(); // bore first is on by itself above the shop's threshold
    expect(wizardBore.honingAllowanceUm).toBeCloseTo(intakeAllowance, 6);
    expect(quickBore.honingAllowanceUm).toBeCloseTo(intakeAllowance, 6);
    expect(quickBore.boreToUm).toBeCloseTo(wizardBore.boreToUm, 6);
    // The intake's bore-to is its finished size less the same allowance.
    const oversize = detail.summary.oversize;
    if (!oversize?.ok) throw new Error("the intake proposed no oversize");
    expect(oversize.boreToUm).toBeCloseTo(oversize.finishedBoreUm - intakeAllowance, 6);
  });
  it("a final reading does not change the proposed oversize", async () => {
    const actor = shop.actors.machinist;
    const before = (await getJobDetail({ actor, jobId: job.jobId })).summary.oversize;
    const [first] = await listCylinders({ shopId: actor.shopId, jobId: job.jobId });
    await createReadingSet({ actor, jobId: job.jobId, input: { cylinderId: first!.id, kind: "final", levels: levelsFor(94_300) } });
    const after = (await getJobDetail({ actor, jobId: job.jobId })).summary.oversize;
    expect(after).toEqual(before);
  });

  for (const pistons of ["assigned", "loose"] as const) {
    it(`per cylinder, the intake sizes the finished bore and the bore-to as the wizard's first plan does (${pistons} pistons)`, async () => {
      const actor = shop.actors.machinist;
      const worn = await createPlanJob(actor, 4, (n) => 93_760 + 10 * n, pistons);
      // One more loose piston with a tighter band: the band every piston allows decides, not the first piston's.
      await createPiston({ actor, jobId: worn.jobId, input: { label: "spare", diameterUm: 93_930, sizingHeightUm: 15_000, type: "forged", clearanceMinUm: CLEARANCE.minUm + 5, clearanceMaxUm: CLEARANCE.maxUm } });
      const detail = await getJobDetail({ actor, jobId: worn.jobId });
      const wizard = await getWizardContext({ actor, jobId: worn.jobId });
      expect(wizard.initialDraft.clearance.minUm).toBeCloseTo(CLEARANCE.minUm + 5, 6);
      const answer = await previewRequest({ actor, request: planRequestSchema.parse({ ...wizard.initialDraft, machineId: shop.machineId }) });
      expect(answer.cylinders).toHaveLength(4);
      for (const cylinder of answer.cylinders) {
        const bore = boreStage(cylinder.plan!.stages)!;
        const row = detail.summary.cylinders.find((c) => c.number === cylinder.cylinder)!;
        expect(row.finishedFrom).toBe("piston");
        expect(row.boreToUm).toBeCloseTo(bore.boreToUm, 6);
        expect(row.finishedUm! - row.boreToUm!).toBeCloseTo(bore.honingAllowanceUm, 6);
      }
    });
  }

  it("without pistons the intake sizes every cylinder to the nominal oversize", async () => {
    const actor = shop.actors.machinist;
    const bare = await createPlanJob(actor, 2, () => 93_780, "none");
    const { summary } = await getJobDetail({ actor, jobId: bare.jobId });
    if (!summary.oversize?.ok) throw new Error("the intake proposed no oversize");
    for (const row of summary.cylinders) {
      expect(row.finishedFrom).toBe("oversize");
      expect(row.finishedUm).toBe(summary.oversize.finishedBoreUm);
      expect(row.boreToUm).toBeCloseTo(summary.oversize.boreToUm, 6);
    }
  });
});
