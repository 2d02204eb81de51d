import { describe, expect, it } from "vitest";
import { inspectCylinder, inspectJob } from "./inspection";

// Band and piston as the demo fixture: piston 93.92 mm, clearance 3.5–4.5 thou (invented demo band).
const THOU = 25.4;
const piston = { diameterUm: 93_920, clearanceMinUm: 3.5 * THOU, clearanceMaxUm: 4.5 * THOU };
const band = { minUm: 93_920 + 3.5 * THOU, maxUm: 93_920 + 4.5 * THOU };
// Finished tolerances 10 µm taper, 5 µm out-of-round: DESIGN §5.2 defaults [common practice].
const tolerances = { taperUm: 10, outOfRoundUm: 5 };
const at = (top: [number, number], mid: [number, number], bottom: [number, number]) => [
  { name: "top", aUm: top[0], bUm: top[1] }, { name: "middle", aUm: mid[0], bUm: mid[1] }, { name: "bottom", aUm: bottom[0], bUm: bottom[1] },
];
const T = 93_920 + 4 * THOU; // 94.0216 mm, the target

describe("final inspection of a cylinder", () => {
  it("passes a bore at one size in the band", () => {
    const v = inspectCylinder({ levels: at([T, T + 1], [T, T], [T - 1, T]), band, tolerances, piston });
    expect(v.status).toBe("pass");
    expect(v.clearanceUm).toBeCloseTo(T - 1 - 93_920, 6);
  });
  it("fails a bore over the band and says where and by how much", () => {
    const v = inspectCylinder({ levels: at([band.maxUm + 3, T], [T, T], [T, T]), band, tolerances, piston });
    expect(v.status).toBe("fail");
    expect(v.failures.find((f) => f.check === "size_large")).toMatchObject({ where: "top A", by: 3 });
    expect(v.failures.some((f) => f.check === "clearance_loose")).toBe(true);
  });
  it("fails taper past the tolerance", () => {
    const v = inspectCylinder({ levels: at([T - 5, T - 5], [T, T], [T + 7, T + 7]), band: { minUm: T - 20, maxUm: T + 20 }, tolerances, piston: null });
    expect(v.failures).toEqual([expect.objectContaining({ check: "taper", value: 12, by: 2 })]);
  });
  it("fails out-of-round past the tolerance", () => {
    const v = inspectCylinder({ levels: at([T, T], [T - 4, T + 3], [T, T]), band: { minUm: T - 20, maxUm: T + 20 }, tolerances });
    expect(v.failures).toEqual([expect.objectContaining({ check: "out_of_round", where: "middle", value: 7, by: 2 })]);
  });
  it("fails a clearance tighter than the piston's band even when the bore is in its own band", () => {
    const v = inspectCylinder({ levels: at([T, T], [T, T], [T, T]), band: { minUm: T - 20, maxUm: T + 20 }, tolerances, piston: { ...piston, clearanceMinUm: 4.2 * THOU } });
    expect(v.failures).toEqual([expect.objectContaining({ check: "clearance_tight" })]);
  });
  it("holds the verdict while the block is warmer than the gauge by more than the set difference", () => {
    const v = inspectCylinder({ levels: at([T, T], [T, T], [T, T]), band, tolerances, temperatures: { blockC: 27, gaugeC: 21 }, maxTemperatureDifferenceK: 2 });
    expect(v.status).toBe("held");
    expect(v.temperatureDifferenceK).toBe(6);
  });
  it("checks a typed surface against the plateau stone's targets", () => {
    const v = inspectCylinder({ levels: at([T, T], [T, T], [T, T]), band, tolerances, surface: { raUm: 0.45, rkUm: 0.4 }, surfaceTargets: { raUm: { max: 0.3 }, rkUm: { max: 0.6 } } });
    expect(v.failures).toEqual([expect.objectContaining({ check: "surface", where: "Ra" })]);
    expect(v.failures[0]!.by).toBeCloseTo(0.15, 9);
  });
});

describe("final inspection of a job", () => {
  it("passes only when every cylinder passed", () => {
    expect(inspectJob([{ cylinder: 1, verdict: "pass" }, { cylinder: 2, verdict: "pass" }]).status).toBe("pass");
    expect(inspectJob([{ cylinder: 1, verdict: "pass" }, { cylinder: 2, verdict: null }])).toEqual({ status: "open", failed: [], open: [2] });
    expect(inspectJob([{ cylinder: 1, verdict: "fail" }, { cylinder: 2, verdict: "held" }])).toEqual({ status: "fail", failed: [1], open: [2] });
  });
});
