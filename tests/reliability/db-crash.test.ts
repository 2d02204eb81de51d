// Issue 18 §1: kill -9 of MariaDB while the floor submits runs (with retries under one device id) and
// pages are read; restart it with the project's script; every acknowledged run is stored exactly once,
// every failure was a clean 503 within a bound, and the same app process serves again.
import { randomUUID } from "node:crypto";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createSessionFor } from "@/server/auth/session";
import { SESSION_COOKIE_NAME } from "@/server/auth/cookie";
import { createShopWithMembers } from "../support/fixtures";
import { createFloorPlan, honeStages, runBody } from "../integration/floor-fixtures";
import { startApp, type AppServer } from "./support/app-server";
import { PRIVATE_DB, crashPrivateServer, dbScript } from "./support/private-db";
import { attempt, submitAll, uncleanFailures, uncleanPageFailures, REQUEST_BOUND_MS, type Attempt, type Submission } from "./support/load";

const SUBMISSIONS = 90;
const CONCURRENCY = 6;
const CYLINDERS = 4;
const APP_PORT = Number(process.env.RELIABILITY_APP_PORT ?? 3128);

let app: AppServer;
let planId: string;
let stagePosition: number;
let cookie: string;

beforeAll(async () => {
  const shop = await createShopWithMembers("crash");
  const floor = await createFloorPlan(shop, CYLINDERS);
  planId = floor.planId;
  stagePosition = honeStages(floor.plan.cylinders[0]!.plan.stages)[0]!.position;
  const { token } = await createSessionFor(shop.actors.machinist.userId, { activeShopId: shop.shopId, userAgent: "reliability" });
  cookie = `${SESSION_COOKIE_NAME}=${token}`;
  app = await startApp(APP_PORT);
});

afterAll(async () => {
  await app?.stop();
  const { pool } = await import("@/server/db");
  await pool.end().catch(() => undefined);
});

async function storedRuns(ids: string[]): Promise<Map<string, number>> {
  const connection = await mysql.createConnection({ host: "127.0.0.1", port: PRIVATE_DB.port, user: "borewise", password: "borewise-dev", database: PRIVATE_DB.name });
  try {
    const [rows] = await connection.query("SELECT id, COUNT(*) AS n FROM runs WHERE plan_id = ? GROUP BY id", [planId]);
    const counts = new Map<string, number>();
    for (const row of rows as Array<{ id: string; n: number }>) counts.set(row.id, Number(row.n));
    for (const id of ids) if (!counts.has(id)) counts.set(id, 0);
    return counts;
  } finally {
    await connection.end();
  }
}

describe("database crash under load", () => {
  it("keeps every acknowledged run exactly once, fails cleanly while down and serves again", async () => {
    const submissions: Submission[] = Array.from({ length: SUBMISSIONS }, (_, i) => {
      const body = runBody(planId, { id: randomUUID(), cylinder: (i % CYLINDERS) + 1, stagePosition, block: "dwell", strokesDone: 1 });
      return { id: body.id as string, body, acknowledged: null, attempts: [] };
    });
    const pages: Attempt[] = [];
    let acknowledged = 0;
    let crashed: Promise<void> | null = null;
    const crashAndRestart = async () => {
      await crashPrivateServer();
      await new Promise((r) => setTimeout(r, 1500));
      dbScript("start");
    };
    const deadline = Date.now() + 90_000;
    let loadDone = false;
    const pageLoad = (async () => {
      for (let i = 0; !loadDone && Date.now() < deadline; i++) {
        pages.push(await attempt(app.url, i % 2 ? "/jobs" : "/api/jobs", { cookie }));
        await new Promise((r) => setTimeout(r, 150));
      }
    })();
    await submitAll({
      urls: [app.url], submissions, cookie, concurrency: CONCURRENCY, deadline,
      onAck: () => {
        acknowledged++;
        if (acknowledged === Math.floor(SUBMISSIONS / 3)) crashed = crashAndRestart();
      },
    });
    loadDone = true;
    await pageLoad;
    await crashed;

    const all = submissions.flatMap((s) => s.attempts);
    const statuses = all.reduce<Record<string, number>>((acc, a) => ({ ...acc, [String(a.status)]: (acc[String(a.status)] ?? 0) + 1 }), {});
    const reads = pages.reduce<Record<string, number>>((acc, a) => ({ ...acc, [String(a.status)]: (acc[String(a.status)] ?? 0) + 1 }), {});
    console.info(`crash test: ${SUBMISSIONS} submissions, ${all.length} attempts ${JSON.stringify(statuses)}; ${pages.length} reads ${JSON.stringify(reads)}`);
    // The outage really was seen by the load.
    expect(all.some((a) => a.status === 503)).toBe(true);
    expect(uncleanFailures(all)).toEqual([]);
    const apiReads = pages.filter((_, i) => i % 2 === 0);
    expect(uncleanFailures(apiReads)).toEqual([]);
    expect(uncleanPageFailures(pages.filter((_, i) => i % 2 === 1))).toEqual([]);
    for (const a of [...all, ...pages]) expect(a.ms).toBeLessThanOrEqual(REQUEST_BOUND_MS);
    expect(submissions.filter((s) => s.acknowledged === null).map((s) => s.id)).toEqual([]);
    for (const s of submissions) expect((s.acknowledged as { id: string }).id).toBe(s.id);
    const counts = await storedRuns(submissions.map((s) => s.id));
    expect([...counts.values()].every((n) => n === 1)).toBe(true);
    expect(counts.size).toBe(SUBMISSIONS);

    // The same process serves again: health, an API read and a page.
    expect((await attempt(app.url, "/api/health", { cookie })).status).toBe(200);
    expect((await attempt(app.url, "/api/jobs", { cookie })).status).toBe(200);
    expect((await attempt(app.url, "/jobs", { cookie })).status).toBe(200);
  });
});
