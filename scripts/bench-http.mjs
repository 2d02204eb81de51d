// Serves the production build on a loopback port and measures routes with autocannon: requests per
// second and latency percentiles of each, and their ratio to GET /api/health measured in the same run.
// Targets come from tests/bench/http-targets.mjs, which prepares whatever data they need.
import { spawn } from "node:child_process";
import { request as httpRequest } from "node:http";
import autocannon from "autocannon";
import { prepareTargets } from "../tests/bench/http-targets.mjs";

const port = Number(process.env.BENCH_PORT ?? 3390);
const base = `http://127.0.0.1:${port}`;
const connections = Number(process.env.BENCH_CONNECTIONS ?? 8);
const duration = Number(process.env.BENCH_SECONDS ?? 10);

async function waitForServer() {
  for (let i = 0; i < 240; i++) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {}
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error("server did not start");
}

function measure(target) {
  return new Promise((resolve, reject) => {
    const request = { method: target.method ?? "GET", path: target.path, headers: target.headers, body: target.body, ...(target.setupRequest && { setupRequest: target.setupRequest }) };
    autocannon({ url: base, requests: [request], connections: target.connections ?? connections, duration }, (error, result) =>
      error ? reject(error) : resolve(result),
    );
  });
}

/** Bytes of one answer as a browser receives it (Accept-Encoding: gzip), and its encoding. */
function wireSize(target) {
  return new Promise((resolve, reject) => {
    const body = target.setupRequest ? target.setupRequest({}).body : target.body;
    const req = httpRequest(base + target.path, { method: target.method ?? "GET", headers: { ...target.headers, "accept-encoding": "gzip" } }, (res) => {
      let bytes = 0;
      res.on("data", (chunk) => (bytes += chunk.length));
      res.on("end", () => resolve({ bytes, encoding: res.headers["content-encoding"] ?? "none" }));
    });
    req.on("error", reject);
    req.end(body);
  });
}

const server = spawn("npx", ["next", "start", "-H", "127.0.0.1", "-p", String(port)], {
  env: { ...process.env, NODE_ENV: "production", APP_URL: base },
  stdio: "ignore",
  detached: true,
});

try {
  await waitForServer();
  const targets = [{ name: "GET /api/health", path: "/api/health" }, ...(await prepareTargets(base))];
  const rows = [];
  for (const target of targets) {
    await measure({ ...target, duration: 2 }); // warm-up
    const r = await measure(target);
    const wire = await wireSize(target);
    rows.push({ name: target.name, rps: r.requests.average, p50: r.latency.p50, p99: r.latency.p99, errors: r.errors + r.non2xx, kb: r.throughput.average / Math.max(r.requests.average, 1) / 1024, wire });
  }
  const health = rows[0];
  console.log(`\n${connections} connections (unless the route says otherwise), ${duration} s each, loopback, this machine (${(await import("node:os")).cpus().length} cores)\n`);
  const table = [["route", "req/s", "p50 ms", "p99 ms", "errors", "KB/answer", "KB on wire", "vs health"]];
  for (const row of rows) {
    table.push([row.name, row.rps.toFixed(0), String(row.p50), String(row.p99), String(row.errors), row.kb.toFixed(1), `${(row.wire.bytes / 1024).toFixed(1)}${row.wire.encoding === "none" ? "" : ` ${row.wire.encoding}`}`, (row.rps / health.rps).toFixed(2)]);
  }
  const widths = table[0].map((_, i) => Math.max(...table.map((r) => r[i].length)));
  const line = (r) => `| ${r.map((cell, i) => (i === 0 ? cell.padEnd(widths[i]) : cell.padStart(widths[i]))).join(" | ")} |`;
  console.log(line(table[0]));
  console.log(`|${widths.map((w, i) => `${"-".repeat(w + 1)}${i === 0 ? "-" : ":"}`).join("|")}|`);
  for (const r of table.slice(1)) console.log(line(r));
  console.log("\nBudgets (issue 11, 12, 18): preview (varied) and run submission ≥ 0.50× health with p99 ≤ 100 ms; /jobs with 1 000 jobs p50 ≤ 100 ms.");
} finally {
  process.kill(-server.pid, "SIGTERM");
}
