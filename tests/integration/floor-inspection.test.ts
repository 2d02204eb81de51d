import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";

// This file runs its own mail catcher on private ports (real SMTP), so it never meets a developer's catcher.
const ports = vi.hoisted(() => {
  const smtp = 28000 + Math.floor(Math.random() * 1000);
  process.env.SMTP_PORT = String(smtp);
  process.env.MAIL_CATCHER_HTTP_PORT = String(smtp + 1000);
  return { smtp, http: smtp + 1000 };
});

import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { finalInspections, jobs, plans } from "@/server/db/schema";
import { drainDueMail } from "@/server/mail/outbox";
import { submitInspection } from "@/server/runs/inspect";
import { submitRun } from "@/server/runs/submit-run";
import { startMailCatcher } from "../../scripts/mail-catcher";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { createFloorPlan, honeStages, levelsOf, runBody, type FloorPlan } from "./floor-fixtures";
import { randomUUID } from "node:crypto";

const catcher = startMailCatcher({ smtpPort: ports.smtp, httpPort: ports.http, quiet: true });
let shop: TestShop;
beforeAll(async () => {
  await catcher.ready;
  shop = await createShopWithMembers("floor inspection");
});
afterAll(() => catcher.close());

async function waitForMail(to: string, subject: RegExp) {
  for (let i = 0; i < 50; i++) {
    const found = catcher.messages.find((m) => m.to.includes(to) && subject.test(m.subject));
    if (found) return found;
    await drainDueMail();
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail for ${to} matching ${subject}`);
}

async function finishStages(floor: FloorPlan, cylinder: number) {
  const actor = cylinder === 1 ? shop.actors.apprentice : shop.actors.machinist;
  for (const { position } of honeStages(floor.plan.cylinders[cylinder - 1]!.plan.stages)) {
    await submitRun({ actor, input: runBody(floor.planId, { cylinder, stagePosition: position }) });
  }
}

const inspection = (planId: string, cylinder: number, values: [number, number][], temperatures: { blockC: number; gaugeC: number } | null = null) => ({
  id: randomUUID(), planId, cylinder, temperatures, surface: null, inspectedAt: new Date().toISOString(),
  readings: values.map(([a, b], i) => ({ name: ["top", "middle", "bottom"][i]!, aUm: a, bUm: b })),
});

describe("final inspection", () => {
  it("needs every stage done first", async () => {
    const floor = await createFloorPlan(shop);
    const t = floor.plan.cylinders[0]!.plan.sizing!.targetUm;
    await expect(submitInspection({ actor: shop.actors.apprentice, input: inspection(floor.planId, 1, [[t, t], [t, t], [t, t]]) })).rejects.toMatchObject({ code: "conflict" });
  });

  it("gives the verdict on prepared readings: over size, taper, out-of-round, clearance, a warm block held, then corrected to 20 °C and passed", async () => {
    const floor = await createFloorPlan(shop);
    await finishStages(floor, 1);
    const sizing = floor.plan.cylinders[0]!.plan.sizing!;
    const fc = floor.plan.cylinders[0]!.plan.finalCheck!;
    const t = sizing.targetUm;
    const check = async (values: [number, number][], temps: { blockC: number; gaugeC: number } | null = null) =>
      submitInspection({ actor: shop.actors.apprentice, input: inspection(floor.planId, 1, values, temps) });

    const m = sizing.maxUm;
    const over = await check([[m + 4, m + 1], [m - 3, m - 3], [m - 3, m - 3]]);
    expect(over.status).toBe("fail");
    expect(over.verdict.failures.map((f) => f.check)).toEqual(["size_large", "size_large", "clearance_loose"]);
    expect(over.verdict.failures[0]).toMatchObject({ where: "top A" });
    expect(over.verdict.failures[0]!.by).toBeCloseTo(4, 6);

    // Inside the band, but with more taper than the plan's tolerance: lowest at the top, highest at the bottom.
    const lo = sizing.minUm + 0.5;
    const taper = await check([[lo, lo], [lo, lo], [Math.min(sizing.maxUm, lo + fc.taperToleranceUm + 2), Math.min(sizing.maxUm, lo + fc.taperToleranceUm + 2)]]);
    if (sizing.maxUm - sizing.minUm > fc.taperToleranceUm + 2.5) expect(taper.verdict.failures.map((f) => f.check)).toEqual(["taper"]);
    else expect(taper.status).toBe("fail");

    const oor = await check([[t, t], [t - 4, t + 3], [t, t]]);
    expect(oor.verdict.failures.map((f) => f.check)).toEqual(["out_of_round"]);

    const u = sizing.minUm - 2;
    const small = await check([[u, u], [u, u], [u, u]]);
    expect(new Set(small.verdict.failures.map((f) => f.check))).toEqual(new Set(["size_small", "clearance_tight"]));
    expect(small.verdict.failures.find((f) => f.check === "clearance_tight")!.by).toBeCloseTo(2, 6);

    // A block 10 K above the gauge: the verdict waits.
    const held = await check([[t, t], [t, t], [t, t]], { blockC: 30, gaugeC: 20 });
    expect(held.status).toBe("held");

    // Settled within 2 K of the gauge but warm: read 0.5 µm over the band, at 20 °C it is inside
    // (grey iron 11 µm/m·K, gauge steel 11.5 µm/m·K [handbook range, from memory]).
    const warm = sizing.maxUm + 0.5;
    const corrected = await check([[warm, warm], [warm, warm], [warm, warm]], { blockC: 22, gaugeC: 20.5 });
    expect(corrected.status).toBe("pass");
    const [row] = await db.select({ readings: finalInspections.readings }).from(finalInspections).where(eq(finalInspections.id, corrected.id));
    const stored = (typeof row!.readings === "string" ? JSON.parse(row!.readings) : row!.readings) as { aUm: number }[];
    expect(warm - stored[0]!.aUm).toBeCloseTo(94 * (11 * 2 - 11.5 * 0.5) / 1000, 1);

    // The only cylinder passed: the plan is done, the job inspected, and the releaser told.
    const [plan] = await db.select({ status: plans.status }).from(plans).where(eq(plans.id, floor.planId));
    const [job] = await db.select({ status: jobs.status }).from(jobs).where(eq(jobs.id, floor.job.jobId));
    expect(plan!.status).toBe("done");
    expect(job!.status).toBe("inspected");
    const passed = await waitForMail(shop.emails.lead, /every cylinder passed/);
    expect(passed.text).toContain(`/floor/${floor.planId}/1`);
    await waitForMail(shop.emails.lead, /failed its final check/);
    const failedMails = catcher.messages.filter((mail) => mail.to.includes(shop.emails.lead) && mail.subject.includes(`Job #${floor.job.number}, cylinder 1 failed`));
    expect(failedMails.some((mail) => /over the band/.test(mail.text))).toBe(true);
  });

  it("a retried final check is stored once with the same answer", async () => {
    const floor = await createFloorPlan(shop, 2);
    await finishStages(floor, 1);
    const t = floor.plan.cylinders[0]!.plan.sizing!.targetUm;
    const body = inspection(floor.planId, 1, [[t, t], [t, t], [t, t]]);
    const answers = await Promise.all([1, 2, 3].map(() => submitInspection({ actor: shop.actors.apprentice, input: body })));
    for (const a of answers) expect(a).toEqual(answers[0]);
    const rows = await db.select({ id: finalInspections.id }).from(finalInspections).where(eq(finalInspections.planId, floor.planId));
    expect(rows).toHaveLength(1);
    // One of two cylinders passed: the plan stays released.
    const [plan] = await db.select({ status: plans.status }).from(plans).where(eq(plans.id, floor.planId));
    expect(plan!.status).toBe("released");
  });

  it("a stage stopped at a reading past the band tells the machinist who released the plan", async () => {
    const floor = await createFloorPlan(shop);
    const cyl = floor.plan.cylinders[0]!;
    const { position } = honeStages(cyl.plan.stages)[0]!;
    const past = cyl.plan.sizing!.maxUm + 2;
    await submitRun({ actor: shop.actors.apprentice, input: runBody(floor.planId, { stagePosition: position, readings: levelsOf([past, past, past]) }) });
    const mail = await waitForMail(shop.emails.lead, new RegExp(`Job #${floor.job.number}, cylinder 1: stage stopped`));
    expect(mail.text).toMatch(/call the machinist/);
  });
});
