import { beforeAll, describe, expect, it } from "vitest";
import { planHone, planHoneJob, type PlanJobInput } from "@/lib/honing";
import { planView } from "@/server/plans/preview-view";
import { POST } from "@/app/api/plans/preview/route";
import type { PlanPreview } from "@/server/plans/preview";
import { asUser, makeRequest, signOutTestUser } from "../support/session";
import {
  BORE_LENGTH_UM, CLEARANCE, MACHINE, PISTON_UM, baseRequest, createPlanJob, createPlanShop, expectedStones, levelsFor, type PlanShop,
} from "./plans-fixtures";

const call = (body: unknown) => POST(makeRequest("/api/plans/preview", { method: "POST", body }), { params: Promise.resolve({}) });
const json = <T = PlanPreview>(r: Response) => r.json() as Promise<T>;

let shop: PlanShop;
let other: PlanShop;
let job: Awaited<ReturnType<typeof createPlanJob>>;

beforeAll(async () => {
  [shop, other] = await Promise.all([createPlanShop("preview"), createPlanShop("preview other")]);
  // Cylinder 3 has a reading above the 94 021.6 µm target (piston 93 920 + 4 thou).
  job = await createPlanJob(shop.actors.machinist, 4, (n) => (n === 3 ? 94_025 : 93_955 + n));
});

/** planHoneJob's input built by hand from the fixture's figures, not through the server layer. */
function expectedInput(bases: number[]): PlanJobInput {
  const piston = { pistonDiameterUm: PISTON_UM, clearanceMinUm: CLEARANCE.minUm, clearanceMaxUm: CLEARANCE.maxUm, clearanceTargetUm: CLEARANCE.targetUm, performanceAllowanceUm: 0 };
  return {
    piston, stones: expectedStones(shop), machine: MACHINE, boreLengthUm: BORE_LENGTH_UM, pressures: {}, checkpointFraction: 0.75, targetCrosshatchDeg: 45,
    taperToleranceUm: 10, outOfRoundToleranceUm: 5,
    cylinders: bases.map((b, i) => ({ cylinder: i + 1, bore: { kind: "readings", levels: levelsFor(b) }, piston })),
  };
}

describe("POST /api/plans/preview", () => {
  it("gives the same plan as planHoneJob with the same inputs", async () => {
    await asUser(shop.actors.machinist);
    const response = await call(baseRequest(shop, job.jobId));
    expect(response.status).toBe(200);
    const preview = await json(response);
    const expected = planHoneJob(expectedInput([93_956, 93_957, 94_025, 93_959]));
    // The route sends what the wizard shows of each plan (preview-view.ts).
    expect(preview.cylinders.map((c) => c.plan)).toEqual(JSON.parse(JSON.stringify(expected.cylinders.map((c) => c.plan && planView(c.plan)))));
    expect(preview.cylinders[0]!.plan!.stages.length).toBeGreaterThan(0);
    expect(preview.rateVersions.map((v) => v.rateRowVersion)).toEqual([1, 1, 1]);
  });

  it("flags the over-size bore with the level, the amount and the way out", async () => {
    await asUser(shop.actors.machinist);
    const preview = await json(await call(baseRequest(shop, job.jobId)));
    const third = preview.cylinders.find((c) => c.cylinder === 3)!;
    const over = third.plan!.errors.find((e) => e.code === "BORE_OVER_TARGET");
    expect(over).toMatchObject({ level: "top", direction: "A", readingUm: 94_031 });
    expect(over && "choices" in over ? over.choices.map((c) => c.kind) : []).toContain("NEXT_OVERSIZE");
    expect(preview.canRelease).toBe(false);
  });

  it("plans a typed bore size or stock when a cylinder has no readings, and says it rests on that figure", async () => {
    const sparse = await createPlanJob(shop.actors.machinist, 2, (n) => (n === 1 ? 93_960 : null));
    await asUser(shop.actors.machinist);
    const missing = await json(await call(baseRequest(shop, sparse.jobId)));
    expect(missing.cylinders[1]!.needs[0]).toMatchObject({ field: "bore" });
    expect(missing.cylinders[1]!.plan).toBeNull();
    const typed = await json(await call({ ...baseRequest(shop, sparse.jobId), cylinders: [{ cylinder: 1 }, { cylinder: 2, bore: { kind: "stock", stockUm: 70 } }] }));
    expect(typed.cylinders[1]!.bore!.basis).toBe("stock");
    const piston = { pistonDiameterUm: PISTON_UM, clearanceMinUm: CLEARANCE.minUm, clearanceMaxUm: CLEARANCE.maxUm, clearanceTargetUm: CLEARANCE.targetUm, performanceAllowanceUm: 0 };
    // Cylinder 2 is planned second, so its stones start at the heights cylinder 1 left them at.
    const expected = planHoneJob({ ...expectedInput([]), cylinders: [{ cylinder: 1, bore: { kind: "readings", levels: levelsFor(93_960) }, piston }, { cylinder: 2, bore: { kind: "stock", stockUm: 70 }, piston }] });
    expect(typed.cylinders[1]!.plan).toEqual(JSON.parse(JSON.stringify(planView(expected.cylinders[1]!.plan!))));
  });

  it("answers a quick plan like planHone for one bore", async () => {
    await asUser(shop.actors.machinist);
    const body = { mode: "quick", boreMaterial: "grey_iron", boreLengthUm: BORE_LENGTH_UM, pistonDiameterUm: PISTON_UM, bore: { kind: "diameter", diameterUm: 93_950 }, machineId: shop.machineId, clearance: CLEARANCE };
    const preview = await json(await call(body));
    const piston = { pistonDiameterUm: PISTON_UM, clearanceMinUm: CLEARANCE.minUm, clearanceMaxUm: CLEARANCE.maxUm, clearanceTargetUm: CLEARANCE.targetUm, performanceAllowanceUm: 0 };
    const expected = planHone({ ...expectedInput([]), piston, bore: { kind: "diameter", diameterUm: 93_950 } });
    expect(preview.cylinders[0]!.plan).toEqual(JSON.parse(JSON.stringify(planView(expected))));
  });
});

describe("POST /api/plans/preview refuses bad input with field errors, never a 500", () => {
  const cases: Array<[string, (s: PlanShop, jobId: string) => unknown, number, string]> = [
    ["a missing job", (s) => ({ ...baseRequest(s, "00000000-0000-0000-0000-000000000000") }), 404, ""],
    ["negative clearance", (s, j) => ({ ...baseRequest(s, j), clearance: { ...CLEARANCE, minUm: -10 } }), 400, "clearance.minUm"],
    ["an upside-down clearance band", (s, j) => ({ ...baseRequest(s, j), clearance: { minUm: 120, maxUm: 80 } }), 400, "clearance.maxUm"],
    ["a target outside the band", (s, j) => ({ ...baseRequest(s, j), clearance: { ...CLEARANCE, targetUm: 200 } }), 400, "clearance.targetUm"],
    ["an absurd spindle speed", (s, j) => ({ ...baseRequest(s, j), spindleRpm: 100_000 }), 400, "spindleRpm"],
    ["a spindle speed the machine cannot run", (s, j) => ({ ...baseRequest(s, j), spindleRpm: 900 }), 400, "spindleRpm"],
    ["an absurd crosshatch angle", (s, j) => ({ ...baseRequest(s, j), targetCrosshatchDeg: 170 }), 400, "targetCrosshatchDeg"],
    ["a pressure outside the machine", (s, j) => ({ ...baseRequest(s, j), pressures: { coarse: 50 } }), 400, "pressures.coarse"],
    ["a stone of the wrong role", (s, j) => ({ ...baseRequest(s, j), stoneIds: { coarse: s.stoneIds.finish } }), 400, "stoneIds.coarse"],
    ["another shop's machine", (s, j) => ({ ...baseRequest(s, j), machineId: other.machineId }), 404, ""],
    ["a cylinder the job does not have", (s, j) => ({ ...baseRequest(s, j), cylinders: [{ cylinder: 9 }] }), 400, "cylinders.0.cylinder"],
    ["a negative stock", (s, j) => ({ ...baseRequest(s, j), cylinders: [{ cylinder: 1, bore: { kind: "stock", stockUm: -5 } }] }), 400, "cylinders.0.bore.stockUm"],
    ["no mode", (s, j) => ({ jobId: j, machineId: s.machineId }), 400, "mode"],
  ];

  it.each(cases)("%s", async (_name, body, status, field) => {
    await asUser(shop.actors.machinist);
    const response = await call(body(shop, job.jobId));
    expect(response.status).toBe(status);
    const payload = await json<{ error: string; fieldErrors?: Record<string, string[]> }>(response);
    if (field) expect(Object.keys(payload.fieldErrors ?? {})).toContain(field);
  });

  it("answers another shop's job as not found", async () => {
    await asUser(other.actors.machinist);
    const response = await call({ ...baseRequest(other, job.jobId) });
    expect(response.status).toBe(404);
  });

  it("answers a body that is not JSON with 400", async () => {
    await asUser(shop.actors.machinist);
    const response = await POST(makeRequest("/api/plans/preview", { method: "POST", body: "{not json" }), { params: Promise.resolve({}) });
    expect(response.status).toBe(400);
  });

  it("refuses a cross-site request and a signed-out caller", async () => {
    await asUser(shop.actors.machinist);
    const cross = await POST(makeRequest("/api/plans/preview", { method: "POST", body: baseRequest(shop, job.jobId), origin: "https://elsewhere.example" }), { params: Promise.resolve({}) });
    expect(cross.status).toBe(403);
    signOutTestUser();
    expect((await call(baseRequest(shop, job.jobId))).status).toBe(401);
  });

  it("refuses an apprentice (plans.create)", async () => {
    await asUser(shop.actors.apprentice);
    expect((await call(baseRequest(shop, job.jobId))).status).toBe(403);
  });
});
