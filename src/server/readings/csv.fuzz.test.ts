import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parseGaugeCsv, CSV_HEADER } from "./csv";

const ctx = { cylinderCount: 6, levels: ["top", "middle", "bottom"], defaultUnit: "mm" as const, standardBoreUm: 92_000 };

const goodRow = fc.record({
  cylinder: fc.integer({ min: 1, max: 6 }),
  level: fc.constantFrom("top", "middle", "bottom"),
  direction: fc.constantFrom("A", "B"),
  value: fc.integer({ min: 91_000, max: 93_000 }),
});

describe("gauge CSV parser (fast-check)", () => {
  it("never throws on arbitrary text", () => {
    fc.assert(fc.property(fc.string({ maxLength: 400 }), (text) => {
      const result = parseGaugeCsv(text, ctx);
      expect(typeof result.ok).toBe("boolean");
    }), { numRuns: 500 });
  });

  it("never throws on arbitrary rows under a valid header, and never returns readings with problems", () => {
    const field = fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom("1", "top", "A", "92.01", "mm", "µm", "in", "", "-1", "1e400"));
    const row = fc.array(field, { minLength: 0, maxLength: 7 }).map((fs) => fs.join(","));
    fc.assert(fc.property(fc.array(row, { maxLength: 30 }), (rows) => {
      const result = parseGaugeCsv([CSV_HEADER.join(","), ...rows].join("\n"), ctx);
      if (!result.ok) {
        expect(result.problems.length).toBeGreaterThan(0);
        for (const p of result.problems) expect(p.line).toBeGreaterThanOrEqual(0);
      } else {
        for (const set of result.sets) for (const l of set.levels) expect(l.aUm * l.bUm).toBeGreaterThan(0);
      }
    }), { numRuns: 500 });
  });

  it("one bad row anywhere fails the whole file and names its line", () => {
    fc.assert(fc.property(fc.array(goodRow, { minLength: 1, maxLength: 20 }), fc.nat(), (rows, at) => {
      const lines = rows.map((r) => `${r.cylinder},${r.level},${r.direction},${(r.value / 1000).toFixed(3)},mm`);
      const badIndex = at % (lines.length + 1);
      lines.splice(badIndex, 0, "1,top,A,not-a-number,mm");
      const result = parseGaugeCsv([CSV_HEADER.join(","), ...lines].join("\n"), ctx);
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.problems.some((p) => p.line === badIndex + 2)).toBe(true);
    }), { numRuns: 300 });
  });

  it("a complete file round-trips every value", () => {
    const full = fc.array(fc.integer({ min: 91_000, max: 93_000 }), { minLength: 6, maxLength: 6 });
    fc.assert(fc.property(fc.integer({ min: 1, max: 6 }), full, (cylinder, values) => {
      const names = ["top", "middle", "bottom"];
      const lines = names.flatMap((n, i) => [`${cylinder},${n},A,${values[i * 2]! / 1000},mm`, `${cylinder},${n},B,${values[i * 2 + 1]!},um`]);
      const result = parseGaugeCsv([CSV_HEADER.join(","), ...lines].join("\r\n"), ctx);
      expect(result.ok).toBe(true);
      if (result.ok) expect(result.sets[0]!.levels.flatMap((l) => [l.aUm, l.bUm])).toEqual(values);
    }), { numRuns: 300 });
  });
});
