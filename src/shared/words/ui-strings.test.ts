// Scans the text a user can read (string literals and JSX text of the screens, the cards and the mails)
// for source tags and repository paths; comments are left out, they are for us (issue 17 §3).
import { readFileSync, readdirSync, statSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { INTERNAL_TEXT } from "./user-text";

const ROOTS = ["src/app", "src/components", "src/shared", "src/server/mail", "src/server/pdf", "src/server/records"];

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return files(path);
    return /\.tsx?$/.test(name) && !/\.test\.tsx?$/.test(name) ? [path] : [];
  });
}

/** The source without its comments (line, block and JSX comments). */
const withoutComments = (source: string) => source.replace(/\{\/\*[\s\S]*?\*\/\}/g, "").replace(/\/\*[\s\S]*?\*\//g, "").replace(/(^|[^:"'`])\/\/.*$/gm, "$1");

describe("words users read", () => {
  it("carry no source tags or repository paths", () => {
    const found = ROOTS.flatMap(files).flatMap((path) =>
      withoutComments(readFileSync(path, "utf8")).split("\n").filter((line) => INTERNAL_TEXT.test(line)).map((line) => `${path}: ${line.trim()}`),
    );
    expect(found).toEqual([]);
  });
  it("the pattern catches what it should", () => {
    for (const bad of ["See docs/gauge-csv.md.", "0.25 mm [V S17]", "overtravel [C]", "[D]", "per DESIGN §5.3"]) expect(bad).toMatch(INTERNAL_TEXT);
    for (const fine of ["[1, 2]", "Cylinder [3]", "docs"]) expect(fine).not.toMatch(INTERNAL_TEXT);
  });
});
