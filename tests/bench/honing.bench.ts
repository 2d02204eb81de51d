import { bench, describe } from "vitest";
import { matchPistons, planHone, planHoneJob } from "@/lib/honing";
import { demoInput } from "@/lib/honing/testing/fixtures";

// Demo inputs (invented). A worn, tapered bore exercises the dwell path as well as the stages.
const oneCylinder = demoInput({
  bore: { kind: "readings", levels: [{ name: "top", aUm: 93_990, bUm: 93_992 }, { name: "middle", aUm: 93_975, bUm: 93_976 }, { name: "bottom", aUm: 93_960, bUm: 93_961 }] },
});
const eightCylinders = {
  ...demoInput(),
  cylinders: Array.from({ length: 8 }, (_, i) => ({
    cylinder: i + 1,
    bore: { kind: "readings" as const, levels: [{ name: "top", aUm: 93_950 + i, bUm: 93_952 }, { name: "middle", aUm: 93_948, bUm: 93_949 + i }, { name: "bottom", aUm: 93_945, bUm: 93_946 }] },
  })),
};

/** Deterministic pseudo-random diameters so every run benchmarks the same sets. */
function sets(n: number) {
  let seed = 12_345 + n;
  const next = () => ((seed = (seed * 1_103_515_245 + 12_345) % 2 ** 31) / 2 ** 31);
  return {
    pistons: Array.from({ length: n }, (_, i) => ({ id: `p${i + 1}`, diameterUm: 84_760 + Math.round(next() * 20) })),
    bores: Array.from({ length: n }, (_, i) => ({ id: `b${i + 1}`, diameterUm: 84_795 + Math.round(next() * 20) })),
    clearanceMinUm: 20,
    clearanceMaxUm: 60,
  };
}
const match8 = sets(8);
const match12 = sets(12);

describe("honing computation", () => {
  bench("planHone, one cylinder", () => {
    planHone(oneCylinder);
  });
  bench("planHoneJob, eight cylinders", () => {
    planHoneJob(eightCylinders);
  });
  bench("matchPistons, 8 cylinders", () => {
    matchPistons(match8);
  });
  bench("matchPistons, 12 cylinders", () => {
    matchPistons(match12);
  });
});
