// Edge behaviour of the jobs routes (origin check, bad bodies). The role × action rows for every jobs
// route live in tests/support/matrix-cases/jobs.ts and run in tests/integration/role-matrix.test.ts.

import { describe, expect, it } from "vitest";
import { createShopWithMembers } from "../support/fixtures";
import { asUser, makeRequest } from "../support/session";
import * as jobsRoute from "@/app/api/jobs/route";
import { jobInput, routeContext } from "./jobs-support";

describe("jobs-domain routes at the edge", () => {
  it("refuses a cross-site mutation and a body that is not JSON", async () => {
    const shop = await createShopWithMembers("routes-origin");
    await asUser(shop.actors.machinist);
    const cross = await jobsRoute.POST(makeRequest("/api/jobs", { method: "POST", body: jobInput(), origin: "https://elsewhere.example" }), routeContext({}));
    expect(cross.status).toBe(403);
    const noOrigin = await jobsRoute.POST(makeRequest("/api/jobs", { method: "POST", body: jobInput(), origin: null }), routeContext({}));
    expect(noOrigin.status).toBe(403);
    const notJson = await jobsRoute.POST(makeRequest("/api/jobs", { method: "POST", body: "{not json" }), routeContext({}));
    expect(notJson.status).toBe(400);
    const bad = await jobsRoute.POST(makeRequest("/api/jobs", { method: "POST", body: jobInput({ standardBoreUm: -5 }) }), routeContext({}));
    expect(bad.status).toBe(400);
    expect((await bad.json()).fieldErrors.standardBoreUm[0]).toMatch(/between 20 mm and 400 mm/);
  });
});
