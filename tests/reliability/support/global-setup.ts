// Starts the suite's private MariaDB (its own port and data directory) and its own mail catcher,
// migrates the database, and stops both at the end. The app build must exist (scripts/test.sh runs
// this suite after `next build`).
import { spawn, type ChildProcess } from "node:child_process";
import { createWriteStream, existsSync, mkdirSync } from "node:fs";
import path from "node:path";
import { PRIVATE_DB, PRIVATE_MAIL, ROOT, dbScript, migratePrivate, privateDbEnv } from "./private-db";

let catcher: ChildProcess | null = null;

async function startMailCatcher(): Promise<void> {
  mkdirSync(path.join(ROOT, "test-results"), { recursive: true });
  const log = createWriteStream(path.join(ROOT, "test-results/reliability-mail-catcher.log"));
  catcher = spawn(process.execPath, [path.join(ROOT, "node_modules/tsx/dist/cli.mjs"), "scripts/mail-catcher.ts"], {
    cwd: ROOT, detached: true, stdio: ["ignore", "pipe", "pipe"], env: { ...process.env, ...privateDbEnv() },
  });
  catcher.stdout?.pipe(log);
  catcher.stderr?.pipe(log);
  for (let i = 0; i < 120; i++) {
    try {
      if ((await fetch(`http://127.0.0.1:${PRIVATE_MAIL.httpPort}/messages`, { signal: AbortSignal.timeout(1000) })).ok) return;
    } catch {
      // not yet listening
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error("the reliability mail catcher did not start; see test-results/reliability-mail-catcher.log");
}

export async function setup(): Promise<void> {
  const dist = process.env.NEXT_DIST_DIR ?? ".next";
  if (!existsSync(path.join(ROOT, dist, "BUILD_ID"))) throw new Error(`No build in ${dist}: run \`NEXT_DIST_DIR=${dist} npx next build\` first`);
  dbScript("start");
  migratePrivate(PRIVATE_DB.name);
  await startMailCatcher();
}

export async function teardown(): Promise<void> {
  if (catcher?.pid && catcher.exitCode === null) process.kill(-catcher.pid, "SIGTERM");
  if (process.env.RELIABILITY_KEEP_DB !== "1") dbScript("stop");
}
