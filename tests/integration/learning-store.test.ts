import { beforeAll, describe, expect, it } from "vitest";
import { emptyLearnedState, multiplierFromState, updateLearnedState } from "@/lib/honing";
import { POST as postRun } from "@/app/api/floor/runs/route";
import { rebuildShopLearning } from "@/server/learning/rebuild";
import { readPlanningVersion } from "@/server/plans/planning-version";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { asUser, makeRequest } from "../support/session";
import { learnedRows, logCoarseStage, observations } from "./learning-fixtures";

// Storage of the learned rate (issue 13): the state per stone × material × machine moves on in the
// transaction that logs a run, and a rebuild from the run log gives identical numbers.

let shop: TestShop;
beforeAll(async () => {
  shop = await createShopWithMembers("learning store");
});

const viaRoute = async (body: Record<string, unknown>) => {
  await asUser(shop.actors.apprentice);
  const response = await postRun(makeRequest("/api/floor/runs", { method: "POST", body }), { params: Promise.resolve({}) });
  expect(response.status).toBe(200);
  return response.json();
};

describe("the learned state follows the logged runs", () => {
  it("a run logged through the route stores its observation and moves the state of its stone × material × machine", async () => {
    const version = await readPlanningVersion(shop.shopId);
    const { coarse, planShop } = await logCoarseStage(shop, 1.2, viaRoute);
    expect(await readPlanningVersion(shop.shopId)).toBeGreaterThan(version);
    const seen = await observations(shop.shopId, coarse.stoneId);
    // The checkpoint block had no reading before it; the rest of the stage did.
    expect(seen).toHaveLength(1);
    expect(seen[0]!.stockRemovedUm / seen[0]!.strokes / seen[0]!.modelRatePerStrokeUm).toBeCloseTo(1.2, 6);
    const row = (await learnedRows(shop.shopId)).find((r) => r.stoneId === coarse.stoneId)!;
    expect(row).toMatchObject({ machineId: planShop.machineId, boreMaterial: "grey_iron", sequence: 1, rateVersion: 1 });
    const learned = multiplierFromState(row.state);
    expect(learned.runsUsed).toBe(1);
    // One run moves the multiplier toward 1.2 but the table still pulls (shrinkage).
    expect(learned.multiplier).toBeGreaterThan(1);
    expect(learned.multiplier).toBeLessThan(1.2);
  });

  it("more runs: the stored state is the O(1) fold of the stored observations, and the rebuild gives identical numbers", async () => {
    await logCoarseStage(shop, 1.18);
    const { coarse } = await logCoarseStage(shop, 1.22);
    const seen = await observations(shop.shopId, coarse.stoneId);
    expect(seen.map((s) => s.sequence)).toEqual([1, 2, 3]);
    const row = (await learnedRows(shop.shopId)).find((r) => r.stoneId === coarse.stoneId)!;
    const replay = seen.reduce(updateLearnedState, emptyLearnedState({ tableUncertainty: row.state.options.tableUncertainty }));
    expect(row.state).toEqual(replay);
    const before = await learnedRows(shop.shopId);
    const done = await rebuildShopLearning(shop.shopId);
    expect(done.runs).toBe(3);
    expect(await learnedRows(shop.shopId)).toEqual(before);
    expect(multiplierFromState(row.state).multiplier).toBeGreaterThan(1.1);
  });
});
