import { execFile } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import net from "node:net";
import { afterAll, describe, expect, it } from "vitest";

const run = promisify(execFile);

// A second, throwaway instance of scripts/db.sh in its own folder and port, so the shared test
// database is never disturbed.
const dataDir = mkdtempSync(path.join(tmpdir(), "borewise-dbtest-"));
const port = String(3420 + Math.floor(Math.random() * 70)); // clear of the main instance on 3407
const env = { ...process.env, DB_DATA_DIR: dataDir, DB_PORT: port };
const script = path.resolve("scripts/db.sh");

async function db(command: string) {
  try {
    const { stdout, stderr } = await run("bash", [script, command], { env, timeout: 120_000 });
    return { code: 0, out: stdout + stderr };
  } catch (error) {
    const e = error as { code: number; stdout: string; stderr: string };
    return { code: e.code, out: e.stdout + e.stderr };
  }
}

afterAll(async () => {
  await db("stop");
  rmSync(dataDir, { recursive: true, force: true });
});

describe("scripts/db.sh", () => {
  it("starts, and a second start is a no-op", async () => {
    const first = await db("start");
    expect(first.code, first.out).toBe(0);
    expect(first.out).toMatch(/running on 127\.0\.0\.1:/);
    const second = await db("start");
    expect(second.code).toBe(0);
    expect(second.out).toMatch(/already running/);
  }, 120_000);

  it("reports status, stops, and reports it stopped", async () => {
    expect((await db("status")).code).toBe(0);
    expect((await db("stop")).out).toMatch(/stopped/);
    expect((await db("status")).code).toBe(3);
  }, 120_000);

  it("starts again after the server was killed with SIGKILL (stale pid and socket)", async () => {
    expect((await db("start")).code).toBe(0);
    const pid = Number(readFileSync(path.join(dataDir, "mariadbd.pid"), "utf8"));
    process.kill(pid, "SIGKILL");
    await new Promise((r) => setTimeout(r, 500));
    const restarted = await db("start");
    expect(restarted.code, restarted.out).toBe(0);
    expect(restarted.out).toMatch(/running on/);
  }, 120_000);

  it("fails with a clear message when its port is taken by another server", async () => {
    await db("stop");
    const squatter = net.createServer().listen(Number(port), "127.0.0.1");
    await new Promise((r) => squatter.once("listening", r));
    try {
      const result = await db("start");
      expect(result.code).not.toBe(0);
      expect(result.out).toMatch(new RegExp(`port ${port} .*taken`));
    } finally {
      squatter.close();
    }
  }, 120_000);
});
