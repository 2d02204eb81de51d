// `next start` of the production build as a child process on a loopback port, against the private
// database. Stopped with SIGTERM to its process group (then SIGKILL after a bound).
import { spawn, type ChildProcess } from "node:child_process";
import { createWriteStream, mkdirSync } from "node:fs";
import path from "node:path";
import { ROOT, privateDbEnv } from "./private-db";

export type AppServer = { port: number; url: string; child: ChildProcess; stop: () => Promise<void> };

export async function startApp(port: number, extraEnv: Record<string, string> = {}): Promise<AppServer> {
  const url = `http://127.0.0.1:${port}`;
  mkdirSync(path.join(ROOT, "test-results"), { recursive: true });
  const log = createWriteStream(path.join(ROOT, `test-results/reliability-app-${port}.log`));
  const child = spawn(process.execPath, [path.join(ROOT, "node_modules/next/dist/bin/next"), "start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: ROOT,
    detached: true,
    stdio: ["ignore", "pipe", "pipe"],
    env: { ...process.env, ...privateDbEnv(), NODE_ENV: "production", APP_URL: url, DB_CONNECT_TIMEOUT_MS: "2000", ...extraEnv },
  });
  child.stdout?.pipe(log);
  child.stderr?.pipe(log);
  const stop = async () => {
    if (child.exitCode !== null || child.signalCode !== null) return;
    const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
    process.kill(-child.pid!, "SIGTERM");
    const timer = setTimeout(() => process.kill(-child.pid!, "SIGKILL"), 10_000);
    await exited;
    clearTimeout(timer);
  };
  for (let i = 0; i < 240; i++) {
    if (child.exitCode !== null) throw new Error(`next start on ${port} exited with ${child.exitCode}; see test-results/reliability-app-${port}.log`);
    try {
      const response = await fetch(`${url}/api/health`, { signal: AbortSignal.timeout(2000) });
      if (response.ok) return { port, url, child, stop };
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  await stop();
  throw new Error(`next start on ${port} did not answer /api/health within 60 s`);
}

/** A request as a browser on the app's own origin would send it, with the session cookie. */
export function appFetch(app: { url: string }, pathname: string, init: { method?: string; body?: unknown; cookie?: string; timeoutMs?: number } = {}): Promise<Response> {
  const headers: Record<string, string> = { origin: app.url };
  if (init.cookie) headers.cookie = init.cookie;
  if (init.body !== undefined) headers["content-type"] = "application/json";
  return fetch(`${app.url}${pathname}`, {
    method: init.method ?? "GET",
    headers,
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
    redirect: "manual",
    signal: AbortSignal.timeout(init.timeoutMs ?? 10_000),
  });
}
