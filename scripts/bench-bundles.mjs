// Reports first-load JavaScript of every page route from the build's route bundle stats, raw and
// gzipped, each against the smallest page (the reference), and whether the heavy client libraries
// (recharts, mathjs) reached a route. Budget (issue 18): floor pages ≤ 1.3× the smallest page; no page
// ships mathjs's parser or recharts unless it draws a chart.
import { readFileSync } from "node:fs";
import { gzipSync } from "node:zlib";

const dist = process.env.NEXT_DIST_DIR || ".next";
const stats = JSON.parse(readFileSync(`${dist}/diagnostics/route-bundle-stats.json`, "utf8"));
const wanted = process.argv.slice(2);
const pages = stats
  .filter((s) => !s.route.startsWith("/api/") && !s.route.startsWith("/_") && !s.route.startsWith("/dev/") && (wanted.length === 0 || wanted.includes(s.route)))
  .map((entry) => {
    const code = entry.firstLoadChunkPaths.map((p) => readFileSync(p));
    const text = code.map((c) => c.toString("latin1")).join("\n");
    return {
      route: entry.route,
      raw: entry.firstLoadUncompressedJsBytes,
      gzip: code.reduce((sum, c) => sum + gzipSync(c).length, 0),
      heavy: [["recharts", /recharts/], ["mathjs", /mathjs|typed-function/]].filter(([, re]) => re.test(text)).map(([n]) => n),
    };
  })
  .sort((a, b) => a.route.localeCompare(b.route));
const smallest = pages.reduce((min, p) => (p.raw < min.raw ? p : min), pages[0]);
const kb = (n) => `${(n / 1024).toFixed(0)} KB`;

console.log(`\nfirst-load JavaScript per page; reference: the smallest page, ${smallest.route} (${kb(smallest.raw)}, ${kb(smallest.gzip)} gzipped)\n`);
const rows = [["route", "first-load JS", "gzipped", "vs smallest", "heavy libraries"], ...pages.map((p) => [p.route, kb(p.raw), kb(p.gzip), `${(p.raw / smallest.raw).toFixed(2)}×`, p.heavy.join(", ") || "none"])];
const widths = rows[0].map((_, i) => Math.max(...rows.map((r) => r[i].length)));
const line = (r) => `| ${r.map((cell, i) => (i === 0 || i === 4 ? cell.padEnd(widths[i]) : cell.padStart(widths[i]))).join(" | ")} |`;
console.log(line(rows[0]));
console.log(`|${widths.map((w, i) => (i === 0 || i === 4 ? `${"-".repeat(w + 1)}-` : `${"-".repeat(w + 1)}:`)).join("|")}|`);
for (const r of rows.slice(1)) console.log(line(r));

// The floor runs on a tablet over shop Wi-Fi: its pages carry at most 1.3× the smallest page's first-load JS (issue 12).
const FLOOR_ROUTES = ["/floor", "/floor/[planId]/[cylinder]"];
const FLOOR_GOAL = 1.3;
console.log(`\nfloor pages against the smallest page (goal ≤ ${FLOOR_GOAL}×):`);
for (const route of FLOOR_ROUTES) {
  const page = pages.find((p) => p.route === route);
  if (!page) { console.log(`- ${route}: not in this build`); continue; }
  const ratio = page.raw / smallest.raw;
  console.log(`- ${route}: ${kb(page.raw)}, ${ratio.toFixed(2)}× (${ratio <= FLOOR_GOAL ? "within the goal" : "OVER THE GOAL"})`);
}
