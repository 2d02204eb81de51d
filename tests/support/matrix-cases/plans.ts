// Matrix rows for issue 7 (plan wizard): preview, save, release, withdraw, quick plan into a new job.
import { POST as preview } from "@/app/api/plans/preview/route";
import { POST as save } from "@/app/api/plans/route";
import { POST as quick } from "@/app/api/plans/quick/route";
import { POST as release } from "@/app/api/plans/[planId]/release/route";
import { POST as withdraw } from "@/app/api/plans/[planId]/withdraw/route";
import { savePlanDraft } from "@/server/plans/mutations";
import type { MatrixCase, MatrixContext } from "../matrix";
import { routeOutcome } from "../matrix";
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

export const plansMatrixCases: MatrixCase[] = [
  {
    name: "POST /api/plans/preview",
    allowed: ["owner", "lead", "machinist"],
    otherShop: 404,
    call: async (c) => routeOutcome(await preview(post("/api/plans/preview", await planRequest(c)), noParams)),
  },
  {
    name: "POST /api/plans (save draft)",
    allowed: ["owner", "lead", "machinist"],
    otherShop: 404,
    call: async (c) => routeOutcome(await save(post("/api/plans", await planRequest(c)), noParams)),
  },
  {
    name: "POST /api/plans/quick",
    allowed: ["owner", "lead", "machinist"],
    otherShop: 404,
    call: async (c) => {
      const { machineId } = await withLibrary(c.shop);
      const plan = { mode: "quick", boreMaterial: "grey_iron", boreLengthUm: BORE_LENGTH_UM, pistonDiameterUm: PISTON_UM, bore: { kind: "stock", stockUm: 70 }, machineId, clearance: CLEARANCE };
      const body = { plan, job: { engineDescription: "Matrix quick plan (invented)", cylinderCount: 1, standardBoreUm: 94_000 } };
      return routeOutcome(await quick(post("/api/plans/quick", body), noParams));
    },
  },
  {
    name: "POST /api/plans/[planId]/release",
    allowed: ["owner", "lead"],
    otherShop: 404,
    call: async (c) => {
      const planId = await draftPlanId(c);
      return routeOutcome(await release(post(`/api/plans/${planId}/release`, {}), { params: Promise.resolve({ planId }) }));
    },
  },
  {
    name: "POST /api/plans/[planId]/withdraw",
    allowed: ["owner", "lead"],
    otherShop: 404,
    call: async (c) => {
      const planId = await draftPlanId(c);
      return routeOutcome(await withdraw(post(`/api/plans/${planId}/withdraw`, { reason: "Matrix check" }), { params: Promise.resolve({ planId }) }));
    },
  },
];
