// Matrix rows for issue 7 (plan wizard): preview, save, release, withdraw, quick plan into a new job.
import { POST as preview } from "@/app/api/plans/preview/route";
import { releasePlanAction, savePlanDraftAction, saveQuickPlanAction, withdrawPlanAction } from "@/app/(shop)/plan/actions";
import { savePlanDraft } from "@/server/plans/mutations";
import type { MatrixCase, MatrixContext } from "../matrix";
import { actionOutcome, routeOutcome, type Outcome } from "../matrix";
import { makeRequest } from "../session";
import { BORE_LENGTH_UM, CLEARANCE, PISTON_UM, baseRequest, createPlanJob, withLibrary } from "../../integration/plans-fixtures";

const noParams = { params: Promise.resolve({}) };

/** A fresh one-cylinder job of the target shop, and the request that plans it. */
async function planRequest({ shop }: MatrixContext) {
  const planShop = await withLibrary(shop);
  const job = await createPlanJob(shop.actors.owner, 1);
  return baseRequest(planShop, job.jobId);
}

async function draftPlanId(context: MatrixContext): Promise<string> {
  return (await savePlanDraft({ actor: context.shop.actors.owner, input: await planRequest(context) })).planId;
}

const post = (path: string, body: unknown) => makeRequest(path, { method: "POST", body });
const asActionOutcome = (result: { ok: boolean; message?: string }) => actionOutcome(result) as Outcome;

export const plansMatrixCases: MatrixCase[] = [
  {
    name: "POST /api/plans/preview",
    allowed: ["owner", "lead", "machinist"],
    otherShop: 404,
    call: async (c) => routeOutcome(await preview(post("/api/plans/preview", await planRequest(c)), noParams)),
  },
  {
    name: "action plans.saveDraft",
    allowed: ["owner", "lead", "machinist"],
    otherShop: 404,
    call: async (c) => asActionOutcome(await savePlanDraftAction(null, { input: await planRequest(c) })),
  },
  {
    name: "action plans.saveQuick",
    allowed: ["owner", "lead", "machinist"],
    otherShop: 404,
    call: async (c) => {
      const { machineId } = await withLibrary(c.shop);
      const plan = { mode: "quick", boreMaterial: "grey_iron", boreLengthUm: BORE_LENGTH_UM, pistonDiameterUm: PISTON_UM, bore: { kind: "stock", stockUm: 70 }, machineId, clearance: CLEARANCE };
      const body = { plan, job: { engineDescription: "Matrix quick plan (invented)", cylinderCount: 1, standardBoreUm: 94_000 } };
      return asActionOutcome(await saveQuickPlanAction(null, { input: body }));
    },
  },
  {
    name: "action plans.release",
    allowed: ["owner", "lead"],
    otherShop: 404,
    call: async (c) => {
      const planId = await draftPlanId(c);
      return asActionOutcome(await releasePlanAction(null, { planId }));
    },
  },
  {
    name: "action plans.withdraw",
    allowed: ["owner", "lead"],
    otherShop: 404,
    call: async (c) => {
      const planId = await draftPlanId(c);
      return asActionOutcome(await withdrawPlanAction(null, { planId, input: { reason: "Matrix check" } }));
    },
  },
];
