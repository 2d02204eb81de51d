// Prints the median of every vitest benchmark from its JSON output (vitest's table shows the mean).
import { readFileSync } from "node:fs";

const report = JSON.parse(readFileSync(process.argv[2], "utf8"));
console.log("\nbenchmark".padEnd(36), "median".padStart(12), "samples".padStart(9));
for (const file of report.files) {
  for (const group of file.groups) {
    for (const b of group.benchmarks) {
      const median = b.median < 1 ? `${(b.median * 1000).toFixed(1)} µs` : `${b.median.toFixed(3)} ms`;
      console.log(b.name.padEnd(35), median.padStart(12), String(b.sampleCount).padStart(9));
    }
  }
}
