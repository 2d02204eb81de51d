import { beforeAll, describe, expect, it } from "vitest";
import { emptyLearnedState, multiplierFromState, updateLearnedState } from "@/lib/honing";
import { POST as postRun } from "@/app/api/floor/runs/route";
import { rebuildShopLearning } from "@/server/learning/rebuild";
import { readPlanningVersion } from "@/server/plans/planning-version";
import { getPlanningLibrary } from "@/server/plans/library";
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

  it("a plan made after the runs uses the learned multiplier, and its stroke range follows the learned interval", async () => {
    const { coarse: fresh, planShop, plan } = await logCoarseStage(shop, 1.2);
    const library = await getPlanningLibrary({ actor: shop.actors.machinist, boreMaterial: "grey_iron", machineId: planShop.machineId });
    const stone = library.stones.find((s) => s.id === fresh.stoneId)!;
    // This plan was saved after the three runs above: its coarse stage already plans on what they learned.
    expect(stone.learned!.runsUsed).toBe(4);
    expect(fresh.removal.learnedMultiplier).toBeGreaterThan(1.1);
    expect(plan.stones.find((s) => s.id === fresh.stoneId)!.learned!.runsUsed).toBe(3);
    const next = await logCoarseStage(shop, 1.2);
    const m = stone.learned!;
    expect(next.coarse.removal.learnedMultiplier).toBeCloseTo(m.multiplier, 12);
    expect(stone.input.learnedMultiplier).toBe(m.multiplier);
    expect(stone.input.learnedUncertaintyFraction).toBeCloseTo(Math.max(m.high / m.multiplier - 1, 1 - m.low / m.multiplier), 12);
    // Consistent runs: the learned spread is narrower than the table's 25 %, so the stroke range is too.
    expect(stone.input.learnedUncertaintyFraction!).toBeLessThan(stone.input.rate.uncertaintyFraction);
  });
});
