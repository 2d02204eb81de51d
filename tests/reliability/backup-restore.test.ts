// Issue 18 §1: `npm run db -- backup` takes a consistent snapshot (mariadb-dump --single-transaction)
// and `npm run db -- restore FILE DB` loads it into a fresh database; every table comes back with the
// same rows (count and CHECKSUM TABLE) and the triggers come back too.
import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createShopWithMembers } from "../support/fixtures";
import { createFloorPlan } from "../integration/floor-fixtures";
import { submitRun } from "@/server/runs/submit-run";
import { runBody, honeStages } from "../integration/floor-fixtures";
import { PRIVATE_DB, ROOT, privateDbEnv } from "./support/private-db";

const restoredName = `${PRIVATE_DB.name}_restored_${process.pid}`;
const folder = mkdtempSync(path.join(tmpdir(), "borewise-backup-"));
const file = path.join(folder, "backup.sql.gz");
let root: mysql.Connection;

const npmDb = (...args: string[]) =>
  execFileSync("npm", ["run", "--silent", "db", "--", ...args], { cwd: ROOT, env: { ...process.env, ...privateDbEnv() }, encoding: "utf8", stdio: ["ignore", "pipe", "pipe"], timeout: 120_000 });

beforeAll(async () => {
  const shop = await createShopWithMembers("backup");
  const { planId, plan } = await createFloorPlan(shop, 2);
  const stagePosition = honeStages(plan.cylinders[0]!.plan.stages)[0]!.position;
  await submitRun({ actor: shop.actors.machinist, input: runBody(planId, { stagePosition, block: "dwell", strokesDone: 3, notes: "demo run, invented ✓ ü" }) });
  root = await mysql.createConnection({ host: "127.0.0.1", port: PRIVATE_DB.port, user: "borewise", password: "borewise-dev", multipleStatements: false });
});

afterAll(async () => {
  await root?.query(`DROP DATABASE IF EXISTS \`${restoredName}\``).catch(() => undefined);
  await root?.end();
  const { pool } = await import("@/server/db");
  await pool.end().catch(() => undefined);
  rmSync(folder, { recursive: true, force: true });
});

async function tables(database: string): Promise<string[]> {
  const [rows] = await root.query("SELECT table_name AS t FROM information_schema.tables WHERE table_schema = ? AND table_type = 'BASE TABLE' ORDER BY table_name", [database]);
  return (rows as Array<{ t: string }>).map((r) => r.t);
}

async function fingerprint(database: string): Promise<Record<string, { rows: number; checksum: string }>> {
  const out: Record<string, { rows: number; checksum: string }> = {};
  for (const table of await tables(database)) {
    const [[count]] = (await root.query(`SELECT COUNT(*) AS n FROM \`${database}\`.\`${table}\``)) as unknown as [[{ n: number }]];
    const [[sum]] = (await root.query(`CHECKSUM TABLE \`${database}\`.\`${table}\``)) as unknown as [[{ Checksum: number | string | null }]];
    out[table] = { rows: Number(count.n), checksum: String(sum.Checksum) };
  }
  return out;
}

async function triggers(database: string): Promise<string[]> {
  const [rows] = await root.query("SELECT trigger_name AS t FROM information_schema.triggers WHERE trigger_schema = ? ORDER BY trigger_name", [database]);
  return (rows as Array<{ t: string }>).map((r) => r.t);
}

describe("backup and restore", () => {
  it("restores every table with the same rows and checksums into a fresh database", async () => {
    npmDb("backup", file);
    expect(statSync(file).size).toBeGreaterThan(1000);
    npmDb("restore", file, restoredName);
    const before = await fingerprint(PRIVATE_DB.name);
    const after = await fingerprint(restoredName);
    expect(Object.keys(before).length).toBeGreaterThan(10);
    expect(before.runs!.rows).toBeGreaterThan(0);
    expect(after).toEqual(before);
    expect(await triggers(restoredName)).toEqual(await triggers(PRIVATE_DB.name));
  });

  it("refuses to restore over an existing database", () => {
    expect(() => npmDb("restore", file, PRIVATE_DB.name)).toThrow(/exists; restore goes into a fresh database/);
  });
});
