import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { cylinderMinutes, jobMinutes, minutesToHourMilli, stageMinutes } from "./time";

// Spindle time is double strokes ÷ double strokes per minute (the definition of a rate; common practice).
describe("spindle time", () => {
  it("divides double strokes by their rate", () => {
    expect(stageMinutes({ doubleStrokes: 120, doubleStrokesPerMin: 60 })).toBe(2);
    expect(stageMinutes({ doubleStrokes: 0, doubleStrokesPerMin: 45 })).toBe(0);
    expect(() => stageMinutes({ doubleStrokes: 10, doubleStrokesPerMin: 0 })).toThrow(/doubleStrokesPerMin/);
    expect(() => stageMinutes({ doubleStrokes: Number.NaN, doubleStrokesPerMin: 10 })).toThrow(/doubleStrokes/);
  });

  it("adds the set-up per cylinder and a change before each new stone", () => {
    const stages = [
      { doubleStrokes: 90, doubleStrokesPerMin: 45, stoneId: "a" },
      { doubleStrokes: 30, doubleStrokesPerMin: 60, stoneId: "b" },
      { doubleStrokes: 8, doubleStrokesPerMin: 40, stoneId: "c" },
    ];
    const c = cylinderMinutes(stages, { cylinderSetUpMin: 3, stoneChangeMin: 2 });
    expect(c.stoneChanges).toBe(2);
    expect(c.spindleMin).toBeCloseTo(2 + 0.5 + 0.2, 12);
    expect(c.totalMin).toBeCloseTo(2.7 + 3 + 4, 12);
  });

  it("a bore stage (no stone) neither counts nor breaks the run of one stone", () => {
    const c = cylinderMinutes(
      [{ doubleStrokes: 0, doubleStrokesPerMin: 1, stoneId: null }, { doubleStrokes: 10, doubleStrokesPerMin: 10, stoneId: "a" }, { doubleStrokes: 10, doubleStrokesPerMin: 10, stoneId: "a" }],
      { cylinderSetUpMin: 0, stoneChangeMin: 5 },
    );
    expect(c.stoneChanges).toBe(0);
    expect(c.totalMin).toBe(2);
  });

  it("a job is its set-up plus its cylinders", () => {
    fc.assert(
      fc.property(
        fc.array(fc.array(fc.record({ doubleStrokes: fc.integer({ min: 0, max: 2000 }), doubleStrokesPerMin: fc.integer({ min: 1, max: 300 }), stoneId: fc.constantFrom("a", "b", null) }), { maxLength: 6 }), { maxLength: 16 }),
        fc.integer({ min: 0, max: 60 }),
        (cylinders, jobSetUpMin) => {
          const j = jobMinutes(cylinders, { cylinderSetUpMin: 2, stoneChangeMin: 1, jobSetUpMin });
          expect(j.totalMin).toBeCloseTo(jobSetUpMin + j.cylinders.reduce((s, c) => s + c.totalMin, 0), 9);
          for (const c of j.cylinders) expect(c.totalMin).toBeGreaterThanOrEqual(c.spindleMin);
        },
      ),
    );
  });

  it("bills minutes as thousandths of an hour", () => {
    expect(minutesToHourMilli(90)).toBe(1500);
    expect(minutesToHourMilli(1)).toBe(17); // 16.67 → 17
  });
});
