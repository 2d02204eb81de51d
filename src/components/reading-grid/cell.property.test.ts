import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { readCell } from "./cell";
import { readingLevelSchema, readingOutOfRange } from "@/shared/readings/schema";

// Issue 17 §4: a live figure never comes from a value the server would refuse.
const units = ["mm", "in", "thou", "um"] as const;
const lengthish = fc.oneof(
  fc.string(),
  fc.tuple(fc.double({ min: -1e7, max: 1e7, noNaN: true }), fc.constantFrom("", " mm", "mm", " in", " thou", " µm", "um", " m")).map(([n, u]) => `${n}${u}`),
  fc.tuple(fc.integer({ min: 0, max: 500 }), fc.integer({ min: 0, max: 9999 })).map(([a, b]) => `${a}.${b}`),
);

describe("readCell", () => {
  it("gives a value only when the server's schema (and range check) accepts it", () => {
    fc.assert(
      fc.property(lengthish, fc.constantFrom(...units), fc.constantFrom("A" as const, "B" as const), fc.option(fc.integer({ min: 20_000, max: 400_000 }), { nil: undefined }), (text, unit, d, bore) => {
        const { um, error } = readCell(text, d, unit, bore);
        if (um === null) return;
        expect(error).toBeNull();
        expect(readingLevelSchema.shape[d === "A" ? "aUm" : "bUm"].safeParse(um).success).toBe(true);
        if (bore !== undefined) expect(readingOutOfRange(um, bore)).toBeNull();
      }),
      { numRuns: 2000, seed: 17 },
    );
  });

  it("refuses the slips the issue names, with the server's words", () => {
    expect(readCell("2.8 thou", "A", "mm")).toEqual({ um: null, error: "The reading in direction A must be between 20 mm and 400 mm." });
    expect(readCell("2000", "B", "mm").error).toBe("The reading in direction B must be between 20 mm and 400 mm.");
    expect(readCell("96.5", "A", "mm", 92_000).error).toMatch(/more than 3 mm from the/);
    expect(readCell("92.031", "A", "mm", 92_000).um).toBeCloseTo(92_031, 6);
    expect(readCell("  ", "A", "mm")).toEqual({ um: null, error: null });
  });
});
