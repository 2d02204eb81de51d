import "server-only";
import { and, desc, eq, gte, inArray, isNotNull, lt, or, sql, type SQL } from "drizzle-orm";
import { db } from "@/server/db";
import { jobs, machines, memberships, planStages, plans, runs, stones, users } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import type { RunLearning } from "@/shared/learning/types";
import { RUN_CURSOR_PATTERN, RUN_LOG_PAGE_SIZE, type RunLogQuery } from "@/shared/runs/log-schema";
import { addDays, DEFAULT_TIME_ZONE, dayStart } from "@/shared/time";
import { getShopTimeZone } from "@/server/shop-settings/time-zone";

// The shop's run log (/runs, issue 13): newest first, one page at a time after a cursor (time, id),
// never OFFSET nor COUNT, so a page reads about one page of rows through an index whose leading
// columns are the shop and the chosen filter (runs_shop_{done,machine_done,stone,person_done}_idx).
// The apprentice is refused (permission runs.view): the log shows the whole shop's work and figures.

/** Runs drawn on the predicted-vs-actual chart: the newest observations under the filters. */
export const CHART_RUNS_MAX = 200;

/** The filters; From and To are the shop's calendar days (its time zone), as the table shows them. */
async function filters(actor: Actor, q: RunLogQuery): Promise<SQL[]> {
  const zone = q.from || q.to ? await getShopTimeZone({ shopId: actor.shopId }) : DEFAULT_TIME_ZONE;
  const where: SQL[] = [eq(runs.shopId, actor.shopId)];
  if (q.stone) where.push(eq(runs.stoneId, q.stone));
  if (q.machine) where.push(eq(runs.machineId, q.machine));
  if (q.person) where.push(eq(runs.loggedBy, q.person));
  // A correlated look-up, so the read walks the runs index newest first and stops after a page: a join
  // or an IN (semi-join) made MariaDB start from plans and sort every run (1.5–2.5 s at 100 000 runs;
  // 20 ms this way). A material no run has still walks every run of the shop (1.1 s at 100 000).
  if (q.material) where.push(sql`(select ${plans.boreMaterial} from ${plans} where ${plans.id} = ${runs.planId}) = ${q.material}`);
  if (q.from) where.push(gte(runs.doneAt, dayStart(q.from, zone)));
  if (q.to) where.push(lt(runs.doneAt, dayStart(addDays(q.to), zone)));
  return where;
}

/**
 * The index the page walks newest first: the one led by the shop and the narrowest filter given. Named,
 * because with many runs MariaDB picked the stone index and sorted every run (400 ms at 100 000).
 */
function pageIndex(q: RunLogQuery): string {
  if (q.stone) return "runs_shop_stone_idx";
  if (q.machine) return "runs_shop_machine_done_idx";
  if (q.person) return "runs_shop_person_done_idx";
  return "runs_shop_done_idx";
}

function afterCursor(cursor: string | undefined): SQL | null {
  const m = cursor ? RUN_CURSOR_PATTERN.exec(cursor) : null;
  if (!m) return null;
  const at = new Date(Number(m[1]));
  return or(lt(runs.doneAt, at), and(eq(runs.doneAt, at), lt(runs.id, m[2]!)))!;
}

export type RunLogRow = {
  id: string; doneAt: string; jobId: string; jobNumber: number; cylinder: number; stagePosition: number; stageKind: string | null;
  block: string; stoneCode: string | null; machineName: string; strokesPlanned: number | null; strokesDone: number;
  stockRemovedUm: number | null; who: string;
};
export type RunLogPage = { rows: RunLogRow[]; next: string | null };

export async function listRunLog({ actor, query }: { actor: Actor; query: RunLogQuery }): Promise<RunLogPage> {
  assertCan(actor, "runs.view");
  const where = await filters(actor, query);
  const cursor = afterCursor(query.after);
  if (cursor) where.push(cursor);
  // The page's ids from the runs index alone, then their details: the joins never decide the plan.
  const page = await db.select({ id: runs.id }).from(runs, { useIndex: pageIndex(query) }).where(and(...where)).orderBy(desc(runs.doneAt), desc(runs.id)).limit(RUN_LOG_PAGE_SIZE + 1);
  if (page.length === 0) return { rows: [], next: null };
  const found = await db
    .select({
      id: runs.id, doneAt: runs.doneAt, jobId: runs.jobId, jobNumber: jobs.number, cylinder: runs.cylinderNumber, stagePosition: runs.stagePosition,
      stageKind: planStages.kind, block: runs.block, stoneCode: stones.code, machineName: machines.name, strokesPlanned: planStages.strokesNominal,
      strokesDone: runs.strokesDone, learning: runs.learning, who: users.name,
    })
    .from(runs)
    .innerJoin(jobs, eq(jobs.id, runs.jobId))
    .innerJoin(machines, eq(machines.id, runs.machineId))
    .innerJoin(users, eq(users.id, runs.loggedBy))
    .leftJoin(planStages, eq(planStages.id, runs.planStageId))
    .leftJoin(stones, eq(stones.id, runs.stoneId))
    .where(and(eq(runs.shopId, actor.shopId), inArray(runs.id, page.map((r) => r.id))))
    .orderBy(desc(runs.doneAt), desc(runs.id));
  const rows = found.slice(0, RUN_LOG_PAGE_SIZE).map(({ learning, doneAt, ...r }) => ({
    ...r, doneAt: doneAt.toISOString(), stockRemovedUm: (learning as RunLearning | null)?.stockRemovedUm ?? null,
  }));
  const last = found.length > RUN_LOG_PAGE_SIZE ? rows[rows.length - 1] : undefined;
  return { rows, next: last ? `${Date.parse(last.doneAt)}.${last.id}` : null };
}

/** One observed run on the chart: strokes done, and the strokes the table alone and the learned rate at the time would have asked for. */
export type PredictionPoint = { id: string; doneAt: string; actual: number; table: number; learned: number | null };

export async function listPredictions({ actor, query }: { actor: Actor; query: RunLogQuery }): Promise<PredictionPoint[]> {
  assertCan(actor, "runs.view");
  const found = await db
    .select({ id: runs.id, doneAt: runs.doneAt, strokes: runs.strokesDone, learning: runs.learning })
    .from(runs, { useIndex: pageIndex(query) })
    .where(and(...(await filters(actor, query)), isNotNull(runs.learning)))
    .orderBy(desc(runs.doneAt), desc(runs.id))
    .limit(CHART_RUNS_MAX);
  return found.reverse().map((r) => {
    const l = r.learning as RunLearning;
    const table = l.stockRemovedUm / l.modelRatePerStrokeUm;
    return { id: r.id, doneAt: r.doneAt.toISOString(), actual: r.strokes, table, learned: l.multiplierBefore ? table / l.multiplierBefore : null };
  });
}

/** The filter form's choices: the shop's stones, machines and members. */
export async function runLogChoices({ actor }: { actor: Actor }) {
  assertCan(actor, "runs.view");
  const [stoneRows, machineRows, people] = await Promise.all([
    db.select({ id: stones.id, label: stones.code }).from(stones).where(eq(stones.shopId, actor.shopId)).orderBy(stones.code),
    db.select({ id: machines.id, label: machines.name }).from(machines).where(eq(machines.shopId, actor.shopId)).orderBy(machines.name),
    db.select({ id: users.id, label: users.name }).from(memberships).innerJoin(users, eq(users.id, memberships.userId)).where(eq(memberships.shopId, actor.shopId)).orderBy(users.name),
  ]);
  return { stones: stoneRows, machines: machineRows, people };
}
