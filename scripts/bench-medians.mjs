// Prints the median of every vitest benchmark from its JSON output (vitest's table shows the mean).
import { readFileSync } from "node:fs";

const report = JSON.parse(readFileSync(process.argv[2], "utf8"));
const rows = [["benchmark", "median", "samples"]];
for (const file of report.files) {
  for (const group of file.groups) {
    for (const b of group.benchmarks) {
      rows.push([b.name, b.median < 1 ? `${(b.median * 1000).toFixed(1)} µs` : `${b.median.toFixed(3)} ms`, String(b.sampleCount)]);
    }
  }
}
const widths = rows[0].map((_, i) => Math.max(...rows.map((r) => r[i].length)));
const line = (r) => `| ${r.map((cell, i) => (i === 0 ? cell.padEnd(widths[i]) : cell.padStart(widths[i]))).join(" | ")} |`;
console.log();
console.log(line(rows[0]));
console.log(`|${widths.map((w, i) => `${"-".repeat(w + 1)}${i === 0 ? "-" : ":"}`).join("|")}|`);
for (const r of rows.slice(1)) console.log(line(r));
