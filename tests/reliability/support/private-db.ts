// The reliability suite's own MariaDB: started with the project's script (scripts/db.sh) on its own port
// and data directory, so killing it never touches the server the other tests use.
import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";

export const ROOT = path.resolve(import.meta.dirname, "../../..");
export const PRIVATE_DB = {
  port: Number(process.env.RELIABILITY_DB_PORT ?? 3418),
  dataDir: process.env.RELIABILITY_DB_DATA_DIR ?? path.join(ROOT, ".data/reliability-mariadb"),
  name: process.env.RELIABILITY_DB_NAME ?? "borewise_reliability",
};

/** The suite's own mail catcher (scripts/mail-catcher.ts), away from the one development uses. */
export const PRIVATE_MAIL = {
  smtpPort: Number(process.env.RELIABILITY_SMTP_PORT ?? 2538),
  httpPort: Number(process.env.RELIABILITY_MAIL_HTTP_PORT ?? 2598),
};

/** The environment that points a script, a server or a pool at the private instance. */
export function privateDbEnv(): Record<string, string> {
  return {
    DB_PORT: String(PRIVATE_DB.port),
    DB_DATA_DIR: PRIVATE_DB.dataDir,
    DB_NAME: PRIVATE_DB.name,
    DB_TEST_NAME: PRIVATE_DB.name,
    SMTP_PORT: String(PRIVATE_MAIL.smtpPort),
    MAIL_CATCHER_HTTP_PORT: String(PRIVATE_MAIL.httpPort),
    TZ: "UTC",
  };
}

/** Runs `scripts/db.sh <args>` against the private instance; returns its output. */
export function dbScript(...args: string[]): string {
  return execFileSync("bash", ["scripts/db.sh", ...args], {
    cwd: ROOT,
    env: { ...process.env, ...privateDbEnv() },
    encoding: "utf8",
    timeout: 180_000,
  });
}

export function migratePrivate(name = PRIVATE_DB.name): void {
  execFileSync("npx", ["tsx", "scripts/migrate.ts"], { cwd: ROOT, env: { ...process.env, ...privateDbEnv(), DB_NAME: name }, stdio: "pipe", timeout: 120_000 });
}

/** The pid of the private mariadbd, checked to be that program (never a reused pid). */
export function privateServerPid(): number {
  const pid = Number(readFileSync(path.join(PRIVATE_DB.dataDir, "mariadbd.pid"), "utf8").trim());
  const comm = readFileSync(`/proc/${pid}/comm`, "utf8").trim();
  if (comm !== "mariadbd" && comm !== "mysqld") throw new Error(`pid ${pid} is ${comm}, not the private MariaDB`);
  const cmdline = readFileSync(`/proc/${pid}/cmdline`, "utf8");
  if (!cmdline.includes(`--port=${PRIVATE_DB.port}`)) throw new Error(`pid ${pid} is not the MariaDB on port ${PRIVATE_DB.port}`);
  return pid;
}

/** kill -9 of the private instance only; waits until the process is gone. */
export async function crashPrivateServer(): Promise<void> {
  const pid = privateServerPid();
  process.kill(pid, "SIGKILL");
  for (let i = 0; i < 100; i++) {
    try {
      const state = readFileSync(`/proc/${pid}/status`, "utf8");
      if (/^State:\s+Z/m.test(state)) return;
    } catch {
      return;
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`MariaDB pid ${pid} did not die`);
}
