// The preview route remembers planning records and answers per shop planning counter, raised by
// database triggers on every write the records come from (src/server/plans/records-cache.ts,
// preview-memo.ts). These tests pin down that it never answers with numbers the records no longer
// support: every edit between two identical requests shows in the second answer. Each kind of write:
// plans-preview-version.test.ts.
import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { POST } from "@/app/api/plans/preview/route";
import { db } from "@/server/db";
import { pistons } from "@/server/db/schema";
import { createReadingSet } from "@/server/readings/mutations";
import type { PlanPreview } from "@/server/plans/preview";
import { asUser, makeRequest } from "../support/session";
import { baseRequest, changeRateRow, createPlanJob, createPlanShop, levelsFor, type PlanShop } from "./plans-fixtures";

const preview = async (body: unknown) => {
  const response = await POST(makeRequest("/api/plans/preview", { method: "POST", body }), { params: Promise.resolve({}) });
  expect(response.status).toBe(200);
  return (await response.json()) as PlanPreview;
};
const finishStage = (p: PlanPreview) => p.cylinders[0]!.plan!.stages.find((s) => s.kind === "finish");

let shop: PlanShop;
beforeAll(async () => {
  shop = await createPlanShop("preview fresh");
});

describe("POST /api/plans/preview answers from current records only", () => {
  it("shows a rate-table edit in the very next identical request", async () => {
    const job = await createPlanJob(shop.actors.machinist, 2);
    await asUser(shop.actors.machinist);
    const before = await preview(baseRequest(shop, job.jobId));
    expect(await preview(baseRequest(shop, job.jobId))).toEqual(before);
    await changeRateRow(shop.actors.lead, shop.rateRowIds.finish);
    const after = await preview(baseRequest(shop, job.jobId));
    expect(finishStage(after)).not.toEqual(finishStage(before));
    expect(after.rateVersions.find((v) => v.rateRowId === shop.rateRowIds.finish)!.rateRowVersion).toBeGreaterThan(
      before.rateVersions.find((v) => v.rateRowId === shop.rateRowIds.finish)!.rateRowVersion,
    );
  });

  it("shows a new reading set and a piston edit in the next identical request", async () => {
    const job = await createPlanJob(shop.actors.machinist, 1, () => 93_960);
    await asUser(shop.actors.machinist);
    const first = await preview(baseRequest(shop, job.jobId));
    await createReadingSet({ actor: shop.actors.machinist, jobId: job.jobId, input: { cylinderId: first.cylinders[0]!.cylinderId, kind: "as_received", levels: levelsFor(93_970) } });
    const second = await preview(baseRequest(shop, job.jobId));
    expect(second.cylinders[0]!.bore!.readingSetId).not.toBe(first.cylinders[0]!.bore!.readingSetId);
    expect(second.cylinders[0]!.plan!.stock).not.toEqual(first.cylinders[0]!.plan!.stock);
    await db.update(pistons).set({ diameterUm: 93_930 }).where(eq(pistons.id, second.cylinders[0]!.piston!.pistonId!));
    const third = await preview(baseRequest(shop, job.jobId));
    expect(third.cylinders[0]!.piston!.diameterUm).toBe(93_930);
    expect(third.cylinders[0]!.plan!.sizing).not.toEqual(second.cylinders[0]!.plan!.sizing);
  });
});
