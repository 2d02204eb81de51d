// The run log (/runs) and process capability (issue 13): filters, keyset paging, the apprentice's
// refusal, and Cp/Cpk over prepared final checks (INVENTED test inputs).
import { beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { processCapability } from "@/lib/honing";
import { db } from "@/server/db";
import { machines } from "@/server/db/schema";
import { listPredictions, listRunLog } from "@/server/run-log/queries";
import { getCapability } from "@/server/run-log/capability";
import { runLogSchema, RUN_LOG_PAGE_SIZE } from "@/shared/runs/log-schema";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { createFloorPlan, type FloorPlan } from "./floor-fixtures";
import { insertFinals, insertRuns, planParts } from "./run-log-fixtures";
import { logCoarseStage } from "./learning-fixtures";

const q = (raw: Record<string, string> = {}) => runLogSchema.parse(raw);
const DAY = 86_400_000;
const T0 = Date.parse("2026-03-01T08:00:00Z");

let shop: TestShop;
let floor: FloorPlan;
let otherMachine: string;

beforeAll(async () => {
  shop = await createShopWithMembers("run-log");
  floor = await createFloorPlan(shop);
  otherMachine = randomUUID();
  const [first] = await db.select().from(machines).where(eq(machines.id, (await planParts(floor.planId)).machineId));
  await db.insert(machines).values({ ...first!, id: otherMachine, name: "Second bay (test)" });
  const { machinist, apprentice } = shop.actors;
  // 120 runs a day apart on the plan's machine by the machinist, 7 on the second bay by the apprentice.
  await insertRuns(shop.shopId, floor, Array.from({ length: 120 }, (_, i) => ({ loggedBy: machinist.userId, doneAt: new Date(T0 + i * DAY) })));
  await insertRuns(shop.shopId, floor, Array.from({ length: 7 }, (_, i) => ({ loggedBy: apprentice.userId, machineId: otherMachine, doneAt: new Date(T0 + i * DAY + 3_600_000) })));
}, 60_000);

describe("the run log", () => {
  it("pages newest first after a cursor, each row once, a page bounded", async () => {
    const seen: string[] = [];
    let after: string | undefined;
    for (let i = 0; i < 10; i++) {
      const page = await listRunLog({ actor: shop.actors.lead, query: q(after ? { after } : {}) });
      expect(page.rows.length).toBeLessThanOrEqual(RUN_LOG_PAGE_SIZE);
      seen.push(...page.rows.map((r) => r.id));
      if (!page.next) break;
      after = page.next;
    }
    expect(seen).toHaveLength(127);
    expect(new Set(seen).size).toBe(127);
    const first = await listRunLog({ actor: shop.actors.lead, query: q() });
    const times = first.rows.map((r) => Date.parse(r.doneAt));
    expect([...times].sort((a, b) => b - a)).toEqual(times);
  });

  it("filters by machine, person, stone, material and dates", async () => {
    const { lead, apprentice, machinist } = shop.actors;
    const parts = await planParts(floor.planId);
    expect((await listRunLog({ actor: lead, query: q({ machine: otherMachine }) })).rows.map((r) => r.machineName)).toEqual(Array(7).fill("Second bay (test)"));
    expect((await listRunLog({ actor: lead, query: q({ person: apprentice.userId }) })).rows).toHaveLength(7);
    expect((await listRunLog({ actor: lead, query: q({ person: machinist.userId, machine: otherMachine }) })).rows).toHaveLength(0);
    expect((await listRunLog({ actor: lead, query: q({ stone: parts.stoneId, machine: otherMachine }) })).rows).toHaveLength(7);
    expect((await listRunLog({ actor: lead, query: q({ material: "cgi" }) })).rows).toHaveLength(0);
    expect((await listRunLog({ actor: lead, query: q({ material: "grey_iron", from: "2026-03-01", to: "2026-03-03" }) })).rows).toHaveLength(6);
    expect((await listRunLog({ actor: lead, query: q({ from: "2026-03-02", to: "2026-03-02" }) })).rows.map((r) => r.doneAt.slice(0, 10))).toEqual(["2026-03-02", "2026-03-02"]);
  });

  it("refuses bad filters with a message, before any read", () => {
    const bad = runLogSchema.safeParse({ machine: "x'; drop", from: "2026-02-30", bores: "3", after: "nope", material: "cheese" });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues.map((i) => i.path.join(".")).sort()).toEqual(["after", "bores", "from", "machine", "material"]);
    expect(runLogSchema.safeParse({ from: "2026-03-05", to: "2026-03-01" }).error?.issues[0]?.message).toMatch(/before the start/);
    expect(runLogSchema.safeParse({ bores: "100000" }).success).toBe(false);
  });

  it("is refused to the apprentice and scoped to the shop", async () => {
    await expect(listRunLog({ actor: shop.actors.apprentice, query: q() })).rejects.toThrow();
    await expect(listPredictions({ actor: shop.actors.apprentice, query: q() })).rejects.toThrow();
    const other = await createShopWithMembers("run-log-other");
    expect((await listRunLog({ actor: other.actors.owner, query: q() })).rows).toHaveLength(0);
    expect((await listRunLog({ actor: other.actors.owner, query: q({ machine: otherMachine }) })).rows).toHaveLength(0);
  });

  it("charts a logged observation with the multiplier learned before it", async () => {
    const own = await createShopWithMembers("run-log-chart");
    await logCoarseStage(own, 1.2);
    await logCoarseStage(own, 1.2);
    const points = await listPredictions({ actor: own.actors.lead, query: q() });
    expect(points.length).toBeGreaterThanOrEqual(2);
    // The first observation had only the table behind it; the second the first run's learning (above 1).
    expect(points[0]!.learned).toBeCloseTo(points[0]!.table, 9);
    expect(points[1]!.learned!).toBeLessThan(points[1]!.table);
    for (const p of points) expect(p.actual).toBeGreaterThan(0);
  }, 60_000);
});

describe("process capability", () => {
  it("gives mean, σ, Cp and Cpk of the deviations against the band around target", async () => {
    const own = await createShopWithMembers("capability");
    const plan = await createFloorPlan(own);
    const sizing = plan.plan.cylinders[0]!.plan!.sizing!;
    const devs = [-2, -1, 0, 1, 2, -1, 1, 0, 0.5, -0.5];
    await insertFinals(own.shopId, plan, sizing.targetUm, devs);
    const { machineId } = await planParts(plan.planId);
    const view = (await getCapability({ actor: own.actors.lead, machineId, boreMaterial: "grey_iron", bores: 30 }))!;
    const expected = processCapability(devs, sizing.minUm - sizing.targetUm, sizing.maxUm - sizing.targetUm);
    expect(view.count).toBe(10);
    expect(view.capability!.meanUm).toBeCloseTo(0, 6);
    expect(view.capability!.sdUm).toBeCloseTo(Math.sqrt(12.5 / 9), 6);
    expect(view.capability!.cp).toBeCloseTo(expected.cp!, 6);
    expect(view.capability!.cpk).toBeCloseTo(expected.cpk!, 6);
    expect(view.bins.reduce((a, b) => a + b.count, 0)).toBe(10);
    expect(view.outsideShare).toBeGreaterThanOrEqual(0);
    // The last 8 only: the newest eight deviations.
    const eight = (await getCapability({ actor: own.actors.lead, machineId, boreMaterial: "grey_iron", bores: 8 }))!;
    expect(eight.capability!.meanUm).toBeCloseTo(devs.slice(0, 8).reduce((a, b) => a + b, 0) / 8, 6);
    // Another material has none: says how many are needed.
    const none = (await getCapability({ actor: own.actors.lead, machineId, boreMaterial: "cgi", bores: 30 }))!;
    expect(none.capability).toBeNull();
    expect(none.count).toBe(0);
    expect(none.needed).toBe(8);
    await expect(getCapability({ actor: own.actors.apprentice, machineId, boreMaterial: "grey_iron", bores: 30 })).rejects.toThrow();
  }, 60_000);
});
