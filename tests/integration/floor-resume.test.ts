// Coming back to a cylinder on another device (or after the tablet's store was cleared): the cards open
// where the run log says, and a stopped cylinder shows why it was stopped.
import { beforeAll, describe, expect, it } from "vitest";
import { floorCylinderData } from "@/server/runs/cards-data";
import { listFloorQueue } from "@/server/runs/queue";
import { submitRun } from "@/server/runs/submit-run";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { createFloorPlan, honeStages, levelsOf, runBody } from "./floor-fixtures";

let shop: TestShop;
beforeAll(async () => {
  shop = await createShopWithMembers("floor resume");
});

const data = (planId: string) => floorCylinderData({ actor: shop.actors.apprentice, planId, cylinder: 1, unitSystem: "metric" });

describe("resuming a cylinder", () => {
  it("opens at the first stage not yet logged, and the queue says which stage of how many", async () => {
    const floor = await createFloorPlan(shop);
    const stages = honeStages(floor.plan.cylinders[0]!.plan.stages);
    expect(stages.length).toBeGreaterThan(1);
    const fresh = await data(floor.planId);
    expect(fresh.startIndex).toBe(0);
    await submitRun({ actor: shop.actors.apprentice, input: runBody(floor.planId, { stagePosition: stages[0]!.position }) });
    const resumed = await data(floor.planId);
    const card = resumed.cards[resumed.startIndex]!;
    expect(card.position).toBe(stages[1]!.position);
    expect(resumed.cards.findIndex((c) => c.position === stages[1]!.position)).toBe(resumed.startIndex);
    const queued = (await listFloorQueue({ actor: shop.actors.apprentice })).find((j) => j.planId === floor.planId)!;
    expect(queued.cylinders[0]!.progress).toMatchObject({ stageNumber: 2, stageCount: stages.length });
  });

  it("a cylinder stopped at a reading past the band opens on the stop, with the instruction it was stopped with", async () => {
    const floor = await createFloorPlan(shop);
    const cyl = floor.plan.cylinders[0]!;
    const past = cyl.plan.sizing!.maxUm + 2;
    await submitRun({ actor: shop.actors.apprentice, input: runBody(floor.planId, { stagePosition: honeStages(cyl.plan.stages)[0]!.position, readings: levelsOf([past, past, past]) }) });
    const stopped = await data(floor.planId);
    expect(stopped.stopped).toBe(true);
    expect(stopped.stopNote).toMatch(/past the band.*call the machinist/);
  });
});
