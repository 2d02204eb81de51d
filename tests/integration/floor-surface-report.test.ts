// A surface-finish report from the profilometer, uploaded from the final card through the uploads
// machinery and named by the final check; the typed figures are checked as before.
import { randomUUID } from "node:crypto";
import { readFileSync } from "node:fs";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/server/db";
import { attachments, finalInspections } from "@/server/db/schema";
import { submitInspection } from "@/server/runs/inspect";
import { submitRun } from "@/server/runs/submit-run";
import { admitSurfaceReport, uploadSurfaceReport } from "@/server/runs/surface-report";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { createFloorPlan, honeStages, runBody, type FloorPlan } from "./floor-fixtures";

const fixture = (name: string) => new Uint8Array(readFileSync(new URL(`../fixtures/uploads/${name}`, import.meta.url)));
let shop: TestShop;
beforeAll(async () => {
  shop = await createShopWithMembers("floor surface report");
});

async function ready(): Promise<FloorPlan> {
  const floor = await createFloorPlan(shop);
  for (const { position } of honeStages(floor.plan.cylinders[0]!.plan.stages)) await submitRun({ actor: shop.actors.apprentice, input: runBody(floor.planId, { stagePosition: position }) });
  return floor;
}
const upload = async (floor: FloorPlan, name: string, bytes: Uint8Array, actor = shop.actors.apprentice) => {
  const loaded = await admitSurfaceReport({ actor, planId: floor.planId, cylinder: 1 });
  return uploadSurfaceReport({ actor, loaded, file: { name, bytes }, clientId: randomUUID() });
};
const inspection = (floor: FloorPlan, surfaceReportId: string | null, surface: Record<string, number> | null = null) => {
  const t = floor.plan.cylinders[0]!.plan.sizing!.targetUm;
  return { id: randomUUID(), planId: floor.planId, cylinder: 1, temperatures: null, surface, surfaceReportId, inspectedAt: new Date().toISOString(), readings: ["top", "middle", "bottom"].map((name) => ({ name, aUm: t, bUm: t })) };
};

describe("surface-finish report on the final check", () => {
  it("is stored as the cylinder's attachment and linked to the final check, whose typed figures are still checked", async () => {
    const floor = await ready();
    const report = await upload(floor, "finish report.pdf", fixture("surface-report.pdf"));
    expect(report.kind).toBe("report");
    const [row] = await db.select({ cylinderId: attachments.cylinderId, jobId: attachments.jobId }).from(attachments).where(eq(attachments.id, report.id));
    expect(row!.jobId).toBe(floor.job.jobId);
    expect(row!.cylinderId).not.toBeNull();
    // A typed figure past any honed surface is refused with the report attached, as without it.
    await expect(submitInspection({ actor: shop.actors.apprentice, input: inspection(floor, report.id, { raUm: 150 }) })).rejects.toThrow();
    const checked = await submitInspection({ actor: shop.actors.apprentice, input: inspection(floor, report.id, { raUm: 0.4 }) });
    const [stored] = await db.select({ surfaceReportId: finalInspections.surfaceReportId, surface: finalInspections.surface }).from(finalInspections).where(eq(finalInspections.id, checked.id));
    expect(stored!.surfaceReportId).toBe(report.id);
    // Judged on its typed figures against the plateau stone's targets, the report beside them.
    expect(checked.verdict.failures.filter((f) => f.check !== "surface")).toEqual([]);
  });

  it("refuses a file of the wrong type or content, and a report that is not this cylinder's; nothing is written", async () => {
    const floor = await ready();
    await expect(upload(floor, "drawing.svg", fixture("drawing-with-script.svg"))).rejects.toMatchObject({ code: "bad_request" });
    await expect(upload(floor, "report.pdf", fixture("bore-photo.png"))).rejects.toThrow(/content is a PNG image/);
    const other = await ready();
    const elsewhere = await upload(other, "other.pdf", fixture("surface-report.pdf"));
    const before = await db.select({ id: finalInspections.id }).from(finalInspections).where(eq(finalInspections.planId, floor.planId));
    await expect(submitInspection({ actor: shop.actors.apprentice, input: inspection(floor, elsewhere.id) })).rejects.toMatchObject({ code: "bad_request" });
    expect(await db.select({ id: finalInspections.id }).from(finalInspections).where(eq(finalInspections.planId, floor.planId))).toEqual(before);
  });

  it("is refused to someone who may not log on the cylinder", async () => {
    const floor = await createFloorPlan(shop, 1, shop.actors.machinist);
    await expect(admitSurfaceReport({ actor: shop.actors.apprentice, planId: floor.planId, cylinder: 1 })).rejects.toMatchObject({ code: "forbidden" });
  });
});
