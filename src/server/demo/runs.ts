import "server-only";
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import type { HoneStage, PlanStage, ReadingLevel } from "@/lib/honing";
import { db } from "@/server/db";
import { machines } from "@/server/db/schema";
import type { Actor } from "@/shared/auth/policy";
import { createJob } from "@/server/jobs/mutations";
import { listCylinders } from "@/server/jobs/queries";
import { createPiston } from "@/server/pistons/mutations";
import { releasePlan, savePlanDraft } from "@/server/plans/mutations";
import { getPlan } from "@/server/plans/queries";
import { createReadingSet } from "@/server/readings/mutations";
import { submitInspection } from "@/server/runs/inspect";
import { submitRun } from "@/server/runs/submit-run";
import type { DemoContext } from "./seed";

// A demo run history (issue 13), INVENTED: a few finished four-cylinder jobs on each demo machine, logged
// through the real floor path so the learned rates, the stone page's chart, Adopt, /runs and the
// capability figures have something to show. The "true" stone behaviour below is made up: on Bay 1 the
// coarse stone cuts about 18 % above its table figure and the finish stone 8 % below; on Bay 2 the
// coarse stone is near the table. Each run's readings follow from that with a few per cent of noise.

const NOTE = "Demo data: invented run history for the learning demo.";
const THOU = 25.4;
const JOBS_PER_MACHINE = 3;
const CYLINDERS = 4;
/** Invented true multipliers per machine drive and stone role (demo). */
const TRUTH: Record<"constant" | "crank", Record<HoneStage["kind"], number>> = {
  constant: { coarse: 1.18, finish: 0.92, plateau: 1 },
  crank: { coarse: 1.03, finish: 1.05, plateau: 1 },
};

/** A small deterministic generator, so every seeded demo shop shows the same history. */
function noise(seed: number) {
  let s = seed >>> 0;
  const next = () => ((s = (s * 1_664_525 + 1_013_904_223) >>> 0) / 2 ** 32);
  return () => Math.sqrt(-2 * Math.log(next() || 1e-9)) * Math.cos(2 * Math.PI * next());
}

const grown = (levels: readonly ReadingLevel[], byLevelUm: readonly number[], strokes: number, factor: number): ReadingLevel[] =>
  levels.map((l, i) => {
    const d = strokes * (byLevelUm[i] ?? 0) * factor;
    return { name: l.name, aUm: Math.round((l.aUm + d) * 10) / 10, bUm: Math.round((l.bUm + d) * 10) / 10 };
  });

const isHone = (s: PlanStage): s is HoneStage => s.kind !== "bore";

async function demoJob(ctx: { shopId: string; machineId: string; drive: "constant" | "crank"; machinist: Actor; lead: Actor; at: Date; gauss: () => number; n: number }) {
  const { machinist, lead, shopId } = ctx;
  const { id: jobId } = await createJob({
    actor: machinist,
    input: {
      customerName: "History demo customer (demo)", engineDescription: `inline four, 94 mm grey-iron bores (demo history job ${ctx.n})`, boreMaterial: "grey_iron",
      cylinderCount: CYLINDERS, standardBoreUm: 94_000, boreLengthUm: 140_000, bottomClearanceUm: 20_000, torquePlate: false, notes: NOTE,
    },
  });
  const cylinders = await listCylinders({ shopId, jobId });
  for (const c of cylinders) {
    const base = 93_958 + Math.round(ctx.gauss() * 3);
    const levels = [{ name: "top", aUm: base + 5, bUm: base + 4 }, { name: "middle", aUm: base + 3, bUm: base + 2 }, { name: "bottom", aUm: base, bUm: base + 1 }];
    await createReadingSet({ actor: machinist, jobId, input: { cylinderId: c.id, kind: "as_received", gauge: "dial bore gauge (demo)", temperatureC: 20, levels } });
    await createPiston({ actor: machinist, jobId, input: { cylinderId: c.id, label: String(c.number), diameterUm: 93_920, sizingHeightUm: 15_000, type: "forged", clearanceMinUm: 3.5 * THOU, clearanceMaxUm: 4.5 * THOU, notes: "Demo piston" } });
  }
  const { planId } = await savePlanDraft({ actor: machinist, input: { mode: "job", jobId, machineId: ctx.machineId, clearance: { minUm: 3.5 * THOU, maxUm: 4.5 * THOU, targetUm: 4 * THOU, performanceAllowanceUm: 0 } } });
  await releasePlan({ actor: lead, planId });
  const plan = await getPlan({ actor: lead, jobId, planId });
  let clock = ctx.at.getTime();
  const tick = () => new Date((clock += 7 * 60_000)).toISOString();
  for (const c of plan.cylinders) {
    if (!c.plan) continue;
    let reading: ReadingLevel[] | null = null;
    const log = (position: number, strokesDone: number, readings: ReadingLevel[] | null) =>
      submitRun({ actor: machinist, input: { id: randomUUID(), planId, cylinder: c.cylinder, stagePosition: position, block: "full", strokesDone, readings, temperatures: null, notes: "Demo run", doneAt: tick() } });
    for (const [position, stage] of c.plan.stages.entries()) {
      if (!isHone(stage)) continue;
      const factor = TRUTH[ctx.drive][stage.kind] * Math.exp(0.03 * ctx.gauss());
      // The card's rate already carries what was learned; the stone cuts `factor` × the table's.
      const perStroke = factor / stage.removal.learnedMultiplier;
      const needed = (n: number) => Math.max(1, Math.round(n / perStroke));
      if (stage.kind === "plateau") {
        await log(position, stage.strokes.nominal, null);
        reading = reading && grown(reading, stage.removalByLevelUm, stage.strokes.nominal, perStroke);
        continue;
      }
      let strokesLeft = stage.strokes.nominal;
      if (stage.checkpoint && reading === null) {
        const at = stage.checkpoint.afterStrokes;
        reading = stage.checkpoint.expectedByLevel.map((l) => ({ name: l.level, aUm: Math.round(l.aUm * 10) / 10, bUm: Math.round(l.bUm * 10) / 10 }));
        await log(position, at, reading);
        strokesLeft -= at;
      }
      // Run to the reading, then as many more blocks as the card's re-estimate asks for (at most a few).
      let strokes = needed(strokesLeft);
      for (let block = 0; block < 4 && strokes > 0; block++) {
        reading = reading ? grown(reading, stage.removalByLevelUm, strokes, perStroke) : stage.expectedByLevel.map((l) => ({ name: l.level, aUm: l.aUm, bUm: l.bUm }));
        const answer = await log(position, strokes, reading);
        if (answer.outcome === "stopped") throw new Error(`demo run history: cylinder ${c.cylinder} ${stage.kind} stopped: ${answer.reestimate?.reason ?? ""}`);
        if (answer.outcome !== "checkpoint") break;
        strokes = answer.reestimate?.strokesToRun ?? 0;
        if (strokes === 0) await log(position, 0, null);
      }
    }
    // The finished bore: the plan's expected final size with a little invented gauge-and-process scatter (demo).
    const d = Math.round(Math.max(-2.5, Math.min(2.5, ctx.gauss() * 1.2)) * 10) / 10;
    const final = (c.plan.expectedFinal ?? []).map((l) => {
      return { name: l.level, aUm: Math.round((l.aUm + d) * 10) / 10, bUm: Math.round((l.bUm + d) * 10) / 10 };
    });
    // The last cylinder of each job waits for its final check: a whole job passing queues a notice
    // e-mail, which the seed script (run under the react-server condition) cannot render.
    if (final.length > 0 && c.cylinder < CYLINDERS) await submitInspection({ actor: machinist, input: { id: randomUUID(), planId, cylinder: c.cylinder, readings: final, temperatures: null, surface: null, inspectedAt: tick() } });
  }
}

export async function seedDemoRunHistory(context: DemoContext): Promise<void> {
  const { shopId, userIdsByRole } = context;
  if (!shopId || !userIdsByRole.machinist || !userIdsByRole.lead) throw new Error("seedDemoRunHistory needs the demo shop, its machinist and its lead.");
  const actor = (role: "machinist" | "lead"): Actor => ({ userId: userIdsByRole[role]!, shopId, role });
  const bays = await db.select({ id: machines.id, drive: machines.drive }).from(machines).where(and(eq(machines.shopId, shopId), eq(machines.active, true)));
  const gauss = noise(13);
  const start = Date.now() - 45 * 86_400_000;
  let n = 0;
  for (let j = 0; j < JOBS_PER_MACHINE; j++) {
    for (const bay of bays) {
      n++;
      await demoJob({ shopId, machineId: bay.id, drive: bay.drive, machinist: actor("machinist"), lead: actor("lead"), at: new Date(start + n * 5 * 86_400_000), gauss, n });
    }
  }
}
