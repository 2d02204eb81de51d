// Prints "<passed> <failed>" from a vitest or playwright JSON report, for scripts/test.sh's total.
import { readFileSync } from "node:fs";

const [kind, file] = process.argv.slice(2);
const report = JSON.parse(readFileSync(file, "utf8"));

if (kind === "vitest") {
  // A file that failed to load counts as a failure even though it ran no test.
  const brokenFiles = (report.testResults ?? []).filter((f) => f.status === "failed" && f.assertionResults.length === 0).length;
  console.log(`${report.numPassedTests ?? 0} ${(report.numFailedTests ?? 0) + brokenFiles}`);
} else if (kind === "playwright") {
  const s = report.stats ?? {};
  const errors = (report.errors ?? []).length;
  for (const title of flakyTitles(report.suites ?? [])) console.error(`flaky (passed on its retry): ${title}`);
  console.log(`${(s.expected ?? 0) + (s.flaky ?? 0)} ${(s.unexpected ?? 0) + errors}`);
} else {
  throw new Error(`unknown report kind ${kind}`);
}

function* flakyTitles(suites, path = []) {
  for (const suite of suites) {
    const here = suite.title ? [...path, suite.title] : path;
    for (const spec of suite.specs ?? []) {
      if (spec.tests?.some((t) => t.status === "flaky")) yield [...here, spec.title].join(" › ");
    }
    yield* flakyTitles(suite.suites ?? [], here);
  }
}
