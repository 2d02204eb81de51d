// Reports first-load JavaScript per route from the build's route bundle stats, raw and gzipped, and
// whether the heavy client libraries (recharts, mathjs) reached a route that should not carry them.
import { readFileSync } from "node:fs";
import { gzipSync } from "node:zlib";

const dist = process.env.NEXT_DIST_DIR || ".next";
// The floor runs on a tablet over shop Wi-Fi: its pages carry at most 1.3× the smallest page's first-load JS (issue 12).
const FLOOR_ROUTES = ["/floor", "/floor/[planId]/[cylinder]"];
const FLOOR_GOAL = 1.3;
const stats = JSON.parse(readFileSync(`${dist}/diagnostics/route-bundle-stats.json`, "utf8"));
const routes = (process.argv.slice(2).length ? process.argv.slice(2) : ["/", "/jobs/[jobId]", "/jobs/[jobId]/plan", "/plan", ...FLOOR_ROUTES]);
const kb = (n) => `${(n / 1024).toFixed(0)} KB`;

console.log("\nroute".padEnd(28), "first-load JS".padStart(14), "gzipped".padStart(9), " heavy libraries");
for (const route of routes) {
  const entry = stats.find((s) => s.route === route);
  if (!entry) continue;
  const code = entry.firstLoadChunkPaths.map((p) => readFileSync(p));
  const gz = code.reduce((sum, c) => sum + gzipSync(c).length, 0);
  const text = code.map((c) => c.toString("latin1")).join("\n");
  const heavy = [["recharts", /recharts/], ["mathjs", /mathjs|typed-function/]].filter(([, re]) => re.test(text)).map(([n]) => n);
  console.log(route.padEnd(27), kb(entry.firstLoadUncompressedJsBytes).padStart(14), kb(gz).padStart(9), ` ${heavy.join(", ") || "none"}`);
}

// The smallest real page: framework pages (not-found, the dev mail viewer) carry no app code to compare with.
const pages = stats.filter((s) => s.route !== "/_not-found" && !s.route.startsWith("/dev/") && !s.route.startsWith("/api/"));
const smallest = pages.reduce((a, b) => (b.firstLoadUncompressedJsBytes < a.firstLoadUncompressedJsBytes ? b : a));
console.log(`\nfloor pages against the smallest page (${smallest.route}, ${kb(smallest.firstLoadUncompressedJsBytes)}), goal <= ${FLOOR_GOAL}x`);
for (const route of FLOOR_ROUTES) {
  const entry = stats.find((s) => s.route === route);
  if (!entry) { console.log(`${route.padEnd(27)} not in this build`); continue; }
  const ratio = entry.firstLoadUncompressedJsBytes / smallest.firstLoadUncompressedJsBytes;
  console.log(`${route.padEnd(27)} ${kb(entry.firstLoadUncompressedJsBytes).padStart(14)} ${`${ratio.toFixed(2)}x`.padStart(9)}  ${ratio <= FLOOR_GOAL ? "within the goal" : "OVER THE GOAL"}`);
}
