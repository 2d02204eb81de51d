import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { afterStrokes, profileTaperUm, type Profile } from "./profile";
import { finalTaperUm, runSequence, type StageSpec } from "./sequence";
import { demoStones } from "./testing/fixtures";

// The dwell search plays the sequence tens of times per cylinder through finalTaperUm, on plain numbers.
// It must answer exactly what playing the profiles answers, to the last bit, or the search could pick
// another stroke count than the plan's own runSequence would justify. Demo numbers (invented).

const playedOnProfiles = (start: Profile, byLevelUm: number[], strokes: number, specs: StageSpec[]) =>
  profileTaperUm(runSequence(afterStrokes(start, byLevelUm, strokes), specs).at(-1)?.after ?? start);

// Any double, or quarter micrometres: exact in binary, so ties, whole-stroke needs and goals met exactly occur too.
const micrometres = (min: number, max: number) =>
  fc.oneof(fc.double({ min, max, noNaN: true, noDefaultInfinity: true }), fc.integer({ min: min * 4, max: max * 4 }).map((q) => q / 4));

const arbCase = fc.integer({ min: 2, max: 6 }).chain((levels) => {
  const perLevel = <T>(arb: fc.Arbitrary<T>) => fc.array(arb, { minLength: levels, maxLength: levels });
  // Some levels untouched (0), as a short dwell stroke leaves them.
  const removal = perLevel(fc.oneof(micrometres(0, 3), fc.constant(0)));
  const stage = fc.record({
    byLevelUm: removal,
    stockUm: micrometres(-5, 120),
    stopShort: fc.boolean(),
    minStrokes: fc.oneof(fc.constant(0), fc.integer({ min: 1, max: 40 })),
    owedUm: fc.oneof(fc.constant(0), micrometres(0, 25)),
  });
  return fc.record({
    base: micrometres(50_000, 150_000),
    offsets: perLevel(fc.tuple(micrometres(-40, 40), micrometres(-40, 40))),
    dwellByLevelUm: removal,
    strokes: fc.oneof(fc.constant(0), fc.integer({ min: 0, max: 400 })),
    stages: fc.array(stage, { minLength: 0, maxLength: 4 }),
  });
});

function specsOf(base: number, stages: Array<{ byLevelUm: number[]; stockUm: number; stopShort: boolean; minStrokes: number; owedUm: number }>): StageSpec[] {
  const stone = demoStones()[0]!;
  let goalUm = base;
  return stages.map((s) => {
    goalUm += s.stockUm;
    const settings = { byLevelUm: s.byLevelUm } as StageSpec["settings"];
    return { kind: "coarse", stone, settings, goalUm, stopShort: s.stopShort, minStrokes: s.minStrokes, owedUm: s.owedUm };
  });
}

describe("finalTaperUm, the dwell search's play of the sequence", () => {
  it("answers exactly what runSequence over profiles answers", () => {
    fc.assert(
      fc.property(arbCase, ({ base, offsets, dwellByLevelUm, strokes, stages }) => {
        const start: Profile = offsets.map(([a, b], i) => ({ level: `L${i}`, aUm: base + a, bUm: base + b, diameterUm: base + (a + b) / 2 }));
        const specs = specsOf(base + 40, stages);
        expect(Object.is(finalTaperUm(start, dwellByLevelUm, strokes, specs), playedOnProfiles(start, dwellByLevelUm, strokes, specs))).toBe(true);
      }),
      { numRuns: 3_000 },
    );
  });

  it("a goal no stroke reaches (a level below it left untouched) plays the stage's least strokes, as runStage does", () => {
    const start: Profile = [
      { level: "top", aUm: 90_010, bUm: 90_012, diameterUm: 90_011 },
      { level: "bottom", aUm: 90_000, bUm: 90_001, diameterUm: 90_000.5 },
    ];
    const specs = specsOf(90_000, [{ byLevelUm: [1, 0], stockUm: 30, stopShort: true, minStrokes: 3, owedUm: 0 }]);
    expect(finalTaperUm(start, [0, 1], 2, specs)).toBe(playedOnProfiles(start, [0, 1], 2, specs));
  });
});
