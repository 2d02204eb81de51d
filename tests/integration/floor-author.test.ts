import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { POST as postRun } from "@/app/api/floor/runs/route";
import { db } from "@/server/db";
import { runs } from "@/server/db/schema";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { asUser, makeRequest } from "../support/session";
import { createFloorPlan, honeStages, runBody } from "./floor-fixtures";

// A shared tablet: the run is the session's, whoever the body claims wrote it. The route's schema has no
// author field and drops unknown keys, so a claimed author is ignored and the session's user is stored.
let shop: TestShop;
beforeAll(async () => {
  shop = await createShopWithMembers("floor author");
});

describe("who logged a run", () => {
  it("is the signed-in person, never an author named in the body", async () => {
    const { planId, plan } = await createFloorPlan(shop);
    const { position } = honeStages(plan.cylinders[0]!.plan.stages)[0]!;
    const claimed = shop.actors.machinist.userId;
    const body = { ...runBody(planId, { stagePosition: position }), loggedBy: claimed, userId: claimed, owner: { userId: claimed, shopId: shop.shopId } };
    await asUser(shop.actors.apprentice);
    const response = await postRun(makeRequest("/api/floor/runs", { method: "POST", body }), { params: Promise.resolve({}) });
    expect(response.status).toBe(200);
    const [row] = await db.select({ loggedBy: runs.loggedBy }).from(runs).where(eq(runs.id, body.id));
    expect(row?.loggedBy).toBe(shop.actors.apprentice.userId);
  });
});
