// The route figure of issue 13 (and issue 18 §5): logging a run costs the same with 10 or 100 000
// earlier runs for its stone. In DB_NAME's database (bench.sh: the bench database, never the dev one)
// it makes a shop of its own, gives its stone 10, then 100 000 earlier runs (bulk INSERT), and times the
// real submit path (submitRun, in process: session-free, the same server function the route calls) for
// the block that learns. Prints medians and their ratio, the run log's first page at 100 000 runs, and
// the EXPLAIN of that page. Run: npx tsx --import ./scripts/server-only-allowed.mjs scripts/bench-run-history.ts
import { performance } from "node:perf_hooks";
import { sql } from "drizzle-orm";
import { db, pool } from "@/server/db";
import { submitRun } from "@/server/runs/submit-run";
import { listRunLog } from "@/server/run-log/queries";
import { runLogSchema } from "@/shared/runs/log-schema";
import { createShopWithMembers } from "../tests/support/fixtures";
import { createFloorPlan, honeStages, runBody } from "../tests/integration/floor-fixtures";
import { checkpointLevels, restLevels } from "../tests/integration/learning-fixtures";
import { insertRuns } from "../tests/integration/run-log-fixtures";

const SAMPLES = Number(process.env.BENCH_SAMPLES ?? 15);
const median = (xs: number[]) => { const s = [...xs].sort((a, b) => a - b); const m = s.length >> 1; return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2; };

async function timeSubmits(shop: Awaited<ReturnType<typeof createShopWithMembers>>): Promise<number[]> {
  const times: number[] = [];
  for (let i = 0; i < SAMPLES; i++) {
    const floor = await createFloorPlan(shop);
    const { s: coarse, position } = honeStages(floor.plan.cylinders[0]!.plan.stages)[0]!;
    const at = coarse.checkpoint!.afterStrokes;
    await submitRun({ actor: shop.actors.apprentice, input: runBody(floor.planId, { stagePosition: position, strokesDone: at, readings: checkpointLevels(coarse) }) });
    const rest = Math.max(1, coarse.strokes.nominal - at);
    const body = runBody(floor.planId, { stagePosition: position, strokesDone: rest, readings: restLevels(coarse, rest, 1.1) });
    const t0 = performance.now();
    await submitRun({ actor: shop.actors.apprentice, input: body });
    times.push(performance.now() - t0);
  }
  return times;
}

function history(shopId: string, loggedBy: string, count: number, from: number) {
  return Array.from({ length: count }, (_, i) => ({ loggedBy, doneAt: new Date(from + i * 60_000) }));
}

async function main() {
  const shop = await createShopWithMembers("bench-run-history");
  const holder = await createFloorPlan(shop);
  const start = Date.parse("2024-01-01T00:00:00Z");
  await insertRuns(shop.shopId, holder, history(shop.shopId, shop.actors.machinist.userId, 10, start));
  await timeSubmits(shop); // warm-up: first queries, JIT, pool
  const ten = await timeSubmits(shop);
  const t0 = performance.now();
  const more = 100_000 - 10 - SAMPLES * 4;
  await insertRuns(shop.shopId, holder, history(shop.shopId, shop.actors.machinist.userId, more, start + 10 * 60_000));
  const seeded = performance.now() - t0;
  const [count] = (await db.execute(sql`select count(*) as n from runs where shop_id = ${shop.shopId}`))[0] as unknown as Array<{ n: number }>;
  const hundredK = await timeSubmits(shop);
  const page: number[] = [];
  for (let i = 0; i < SAMPLES; i++) {
    const t = performance.now();
    await listRunLog({ actor: shop.actors.lead, query: runLogSchema.parse({}) });
    page.push(performance.now() - t);
  }
  const [plan] = (await db.execute(sql`explain select id from runs where shop_id = ${shop.shopId} order by done_at desc, id desc limit 51`)) as unknown as [Array<Record<string, unknown>>];
  const a = median(ten);
  const b = median(hundredK);
  console.log(`\nLogging the block that learns (submitRun, in process), ${SAMPLES} samples each:\n`);
  console.log("| earlier runs for the stone | median | min | max |");
  console.log("|---:|---:|---:|---:|");
  console.log(`| 10 | ${a.toFixed(1)} ms | ${Math.min(...ten).toFixed(1)} ms | ${Math.max(...ten).toFixed(1)} ms |`);
  console.log(`| ${Number(count?.n ?? 0).toLocaleString("en-US")} | ${b.toFixed(1)} ms | ${Math.min(...hundredK).toFixed(1)} ms | ${Math.max(...hundredK).toFixed(1)} ms |`);
  console.log(`\nRatio (100 000 / 10): ${(b / a).toFixed(2)}. Bulk INSERT of ${more.toLocaleString("en-US")} runs: ${(seeded / 1000).toFixed(1)} s.`);
  console.log(`Run log first page (/runs, ${SAMPLES} samples) at ~100 000 runs: median ${median(page).toFixed(1)} ms.`);
  console.log("\nEXPLAIN of the run log's first page:\n");
  for (const row of plan) console.log(`- ${row.table}: type ${row.type}, key ${row.key}, rows ${row.rows}${row.Extra ? `, ${row.Extra}` : ""}`);
}

main().then(() => pool.end(), async (e) => { console.error(e); await pool.end(); process.exit(1); });
