// Edge behaviour of the jobs-domain JSON routes (origin check, bad bodies) and of the job actions
// the forms call. The role × action rows live in tests/support/matrix-cases/jobs.ts and run in
// tests/integration/role-matrix.test.ts.

import { describe, expect, it } from "vitest";
import { createShopWithMembers } from "../support/fixtures";
import { asUser, makeRequest } from "../support/session";
import * as readingsRoute from "@/app/api/jobs/[jobId]/readings/route";
import { createJobAction } from "@/app/(shop)/jobs/actions";
import { jobInput, levels, makeJob, routeContext } from "./jobs-support";

describe("jobs-domain routes at the edge", () => {
  it("refuses a cross-site mutation and a body that is not JSON", async () => {
    const shop = await createShopWithMembers("routes-origin");
    await asUser(shop.actors.machinist);
    const { jobId, cylinderIds } = await makeJob(shop.actors.machinist);
    const post = (body: unknown, origin?: string | null) => readingsRoute.POST(makeRequest(`/api/jobs/${jobId}/readings`, { method: "POST", body, origin }), routeContext({ jobId }));
    const good = { cylinderId: cylinderIds[0], kind: "as_received", levels: levels(92_010) };
    expect((await post(good, "https://elsewhere.example")).status).toBe(403);
    expect((await post(good, null)).status).toBe(403);
    expect((await post("{not json")).status).toBe(400);
    const bad = await post({ ...good, levels: levels(5) });
    expect(bad.status).toBe(400);
    expect((await bad.json()).fieldErrors["levels.0.aUm"][0]).toMatch(/between 20 mm and 400 mm/);
  });

  it("answers a job action's bad input with field errors and writes nothing", async () => {
    const shop = await createShopWithMembers("actions-edge");
    await asUser(shop.actors.machinist);
    const bad = await createJobAction(null, { input: jobInput({ standardBoreUm: -5 }) });
    expect(bad).toMatchObject({ ok: false, fieldErrors: { standardBoreUm: [expect.stringMatching(/between 20 mm and 400 mm/)] } });
    const good = await createJobAction(null, { input: jobInput() });
    expect(good).toMatchObject({ ok: true, data: { id: expect.any(String), number: 1 } });
  });
});
