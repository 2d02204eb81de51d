// Issue 18 §6: two app instances, each on its own Galera node, take the floor's run submissions (client
// retries under one device id) while node 2 is kill -9'd and rejoins. Reports acknowledged runs lost
// and doubled (goal 0 / 0), write conflicts retried and timings; fails on any loss or double.
import { execFile } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { promisify } from "node:util";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createSessionFor } from "@/server/auth/session";
import { SESSION_COOKIE_NAME } from "@/server/auth/cookie";
import { createShopWithMembers } from "../support/fixtures";
import { createFloorPlan, honeStages, runBody } from "../integration/floor-fixtures";
import { startApp, type AppServer } from "../reliability/support/app-server";
import { ROOT } from "../reliability/support/private-db";
import { submitAll, uncleanFailures, type Submission } from "../reliability/support/load";

const run = promisify(execFile);
const BASE = Number(process.env.CLUSTER_BASE_PORT ?? 3431);
const NODE_PORTS = [BASE, BASE + 1, BASE + 2];
const SUBMISSIONS = Number(process.env.CLUSTER_SUBMISSIONS ?? 400);
const CONCURRENCY = 8;
const CYLINDERS = 4;
const APP_PORTS = [3441, 3442];

let apps: AppServer[] = [];
let planId: string;
let stagePosition: number;
let cookie: string;

const cluster = (...args: string[]) => run("bash", ["scripts/cluster.sh", ...args], { cwd: ROOT, env: process.env, timeout: 180_000 });
const connect = (port: number) => mysql.createConnection({ host: "127.0.0.1", port, user: "borewise", password: "borewise-dev", database: "borewise_cluster" });

beforeAll(async () => {
  const shop = await createShopWithMembers("cluster");
  const floor = await createFloorPlan(shop, CYLINDERS);
  planId = floor.planId;
  stagePosition = honeStages(floor.plan.cylinders[0]!.plan.stages)[0]!.position;
  const { token } = await createSessionFor(shop.actors.machinist.userId, { activeShopId: shop.shopId, userAgent: "cluster" });
  cookie = `${SESSION_COOKIE_NAME}=${token}`;
  apps = await Promise.all(APP_PORTS.map((port, i) => startApp(port, { DB_PORT: String(NODE_PORTS[i]), DB_NAME: "borewise_cluster", DB_TEST_NAME: "borewise_cluster" })));
});

afterAll(async () => {
  await Promise.all(apps.map((app) => app.stop()));
  const { pool } = await import("@/server/db");
  await pool.end().catch(() => undefined);
});

async function conflictCounters(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const [i, port] of NODE_PORTS.entries()) {
    const c = await connect(port);
    try {
      const [rows] = await c.query("SHOW GLOBAL STATUS WHERE Variable_name IN ('wsrep_local_cert_failures','wsrep_local_bf_aborts','wsrep_cluster_size')");
      for (const row of rows as Array<{ Variable_name: string; Value: string }>) out[`node${i + 1}.${row.Variable_name.replace("wsrep_", "")}`] = Number(row.Value);
    } finally {
      await c.end();
    }
  }
  return out;
}

async function storedOn(port: number, ids: string[]): Promise<Map<string, number>> {
  const c = await connect(port);
  try {
    const [rows] = await c.query("SELECT id, COUNT(*) AS n FROM runs WHERE plan_id = ? GROUP BY id", [planId]);
    const counts = new Map<string, number>(ids.map((id) => [id, 0]));
    for (const row of rows as Array<{ id: string; n: number }>) counts.set(row.id, Number(row.n));
    return counts;
  } finally {
    await c.end();
  }
}

const retriedIn = (port: number) => (readFileSync(path.join(ROOT, `test-results/reliability-app-${port}.log`), "utf8").match(/"event":"transaction\.retried"/g) ?? []).length;

describe("Galera cluster under the floor's load", () => {
  it("keeps every acknowledged run exactly once while a node is killed and rejoins", async () => {
    const submissions: Submission[] = Array.from({ length: SUBMISSIONS }, (_, i) => {
      const body = runBody(planId, { id: randomUUID(), cylinder: (i % CYLINDERS) + 1, stagePosition, block: "dwell", strokesDone: 1 });
      return { id: body.id as string, body, acknowledged: null, attempts: [] };
    });
    const timings: Record<string, number> = {};
    const started = Date.now();
    let acknowledged = 0;
    let fault: Promise<void> | null = null;
    const killAndRejoin = async () => {
      const t0 = Date.now();
      await cluster("kill", "2");
      timings.killedAtMs = t0 - started;
      await new Promise((r) => setTimeout(r, 3000));
      const t1 = Date.now();
      const { stdout } = await cluster("rejoin", "2");
      timings.rejoinMs = Date.now() - t1;
      timings.rejoinHow = stdout.includes("by IST") ? 1 : 0;
      console.info(stdout.trim());
    };
    await submitAll({
      urls: apps.map((a) => a.url), submissions, cookie, concurrency: CONCURRENCY, deadline: Date.now() + 240_000,
      onAck: () => {
        acknowledged++;
        if (acknowledged === Math.floor(SUBMISSIONS / 5)) fault = killAndRejoin();
      },
    });
    timings.loadMs = Date.now() - started;
    await fault;

    const all = submissions.flatMap((s) => s.attempts);
    const statuses = all.reduce<Record<string, number>>((acc, a) => ({ ...acc, [String(a.status)]: (acc[String(a.status)] ?? 0) + 1 }), {});
    const latencies = all.filter((a) => a.status === 200).map((a) => a.ms).sort((a, b) => a - b);
    const pct = (p: number) => latencies[Math.min(latencies.length - 1, Math.floor((p / 100) * latencies.length))] ?? 0;
    const acked = submissions.filter((s) => s.acknowledged !== null).map((s) => s.id);
    const perNode = await Promise.all(NODE_PORTS.map((port) => storedOn(port, acked)));
    const lost = perNode.map((counts) => acked.filter((id) => counts.get(id) === 0).length);
    const doubled = perNode.map((counts) => [...counts.values()].filter((n) => n > 1).length);
    const report = {
      submissions: SUBMISSIONS, acknowledged: acked.length, attempts: all.length, statuses,
      lostPerNode: lost, doubledPerNode: doubled,
      transactionsRetried: APP_PORTS.map(retriedIn),
      counters: await conflictCounters(),
      p50Ms: pct(50), p99Ms: pct(99), maxMs: latencies.at(-1) ?? 0, ...timings,
      uncleanFailures: uncleanFailures(all).length,
      // While the cluster has not yet evicted the killed node (evs.suspect_timeout, 5 s) writes on the
      // other nodes wait for it: a request can outlast the 10 s bound then. Reported, not asserted.
      overBound: all.filter((a) => a.status === "timeout").length,
    };
    console.info(`cluster report ${JSON.stringify(report)}`);

    expect(report.counters["node2.local_cert_failures"]).toBeGreaterThanOrEqual(0); // node 2 answers again
    expect(acked.length).toBe(SUBMISSIONS);
    expect(lost).toEqual([0, 0, 0]);
    expect(doubled).toEqual([0, 0, 0]);
    expect(all.filter((a) => typeof a.status === "number" && a.status >= 500 && a.status !== 503)).toEqual([]);
  });
});
