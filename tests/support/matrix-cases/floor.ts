// Matrix rows for issue 12 (the floor): logging a run and a final check on a released plan whose
// cylinder is assigned to the caller (an apprentice may log only there; see floor-runs.test.ts).
import { randomUUID } from "node:crypto";
import { POST as postRun } from "@/app/api/floor/runs/route";
import { POST as postInspection } from "@/app/api/floor/inspections/route";
import { POST as postSurfaceReport } from "@/app/api/floor/surface-reports/route";
import { readFileSync } from "node:fs";
import { formRequest } from "../../integration/jobs-support";
import { submitRun } from "@/server/runs/submit-run";
import type { MatrixCase, MatrixContext } from "../matrix";
import { routeOutcome } from "../matrix";
import { makeRequest } from "../session";
import { createFloorPlan, honeStages, runBody } from "../../integration/floor-fixtures";

const noParams = { params: Promise.resolve({}) };
const post = (path: string, body: unknown) => makeRequest(path, { method: "POST", body });
const reportPdf = () => new Uint8Array(readFileSync(new URL("../../fixtures/uploads/surface-report.pdf", import.meta.url)));

/** A released one-cylinder plan of the target shop, its cylinder assigned to the caller when they are a member. */
async function floorPlan({ shop, callerUserId }: MatrixContext) {
  const caller = Object.values(shop.actors).find((a) => a.userId === callerUserId) ?? shop.actors.apprentice;
  return createFloorPlan(shop, 1, caller);
}

export const floorMatrixCases: MatrixCase[] = [
  {
    name: "POST /api/floor/runs",
    allowed: ["owner", "lead", "machinist", "apprentice"],
    otherShop: 404,
    call: async (c) => {
      const { planId, plan } = await floorPlan(c);
      const { position } = honeStages(plan.cylinders[0]!.plan.stages)[0]!;
      return routeOutcome(await postRun(post("/api/floor/runs", runBody(planId, { stagePosition: position })), noParams));
    },
  },
  {
    name: "POST /api/floor/inspections",
    allowed: ["owner", "lead", "machinist", "apprentice"],
    otherShop: 404,
    call: async (c) => {
      const { planId, plan } = await floorPlan(c);
      for (const { position } of honeStages(plan.cylinders[0]!.plan.stages)) await submitRun({ actor: c.shop.actors.machinist, input: runBody(planId, { stagePosition: position }) });
      const t = plan.cylinders[0]!.plan.sizing!.targetUm;
      const body = { id: randomUUID(), planId, cylinder: 1, temperatures: null, surface: null, inspectedAt: new Date().toISOString(), readings: ["top", "middle", "bottom"].map((name) => ({ name, aUm: t, bUm: t })) };
      return routeOutcome(await postInspection(post("/api/floor/inspections", body), noParams));
    },
  },
  {
    name: "POST /api/floor/surface-reports",
    allowed: ["owner", "lead", "machinist", "apprentice"],
    otherShop: 404,
    call: async (c) => {
      const { planId } = await floorPlan(c);
      const cookie = makeRequest("/").headers.get("cookie") ?? "";
      return routeOutcome(await postSurfaceReport(formRequest(`/api/floor/surface-reports?planId=${planId}&cylinder=1`, cookie, { file: new File([reportPdf()], "finish.pdf") }), noParams));
    },
  },
];
