import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildRecordView, oversizeStep } from "./view";
import { sampleRecordSource } from "./fixture";
import { fromUm } from "@/lib/honing";

describe("buildRecordView", () => {
  it("writes every figure in mm and µm with its unit, cylinders in order", () => {
    const r = buildRecordView(sampleRecordSource(), "metric");
    expect(r.units).toEqual({ size: "mm", small: "µm" });
    expect(r.cylinders.map((c) => c.number)).toEqual([1, 2]);
    const c1 = r.cylinders[0]!;
    expect(c1.piston).toEqual({ label: "P1", diameter: { um: 93_920, text: "93.920 mm" }, sizingHeight: { um: 15_000, text: "15.000 mm" } });
    expect(c1.levels.map((l) => [l.name, l.a.text, l.b.text])).toEqual([
      ["top", "94.012 mm", "94.012 mm"], ["middle", "94.011 mm", "94.011 mm"], ["bottom", "94.010 mm", "94.010 mm"],
    ]);
    expect(c1.clearance.min).toEqual({ um: 90, text: "90.0 µm" });
    expect(c1.clearance.max.text).toBe("92.4 µm");
    expect(c1.taper.text).toBe("2.0 µm");
    expect(c1.outOfRound.text).toBe("0.8 µm");
    expect(c1.finish).toEqual([{ name: "Ra", text: "0.42 µm" }, { name: "Rk", text: "0.61 µm" }, { name: "Mr2", text: "84 %" }]);
    expect(c1.stones).toEqual([{ stage: "Coarse", code: "C-110 (test)", grit: "#120" }, { stage: "Plateau", code: "P-400 (test)", grit: "#400" }]);
    expect(r.cylinders[1]!.finish).toEqual([]);
    expect(r.job).toMatchObject({ number: 12, customer: "Test Customer", material: "Grey cast iron", torquePlate: true, notes: "Test note.", standardBore: { text: "94.000 mm" }, oversize: { um: 0, text: "standard" } });
    expect(r.inspection).toEqual({ by: "Test Inspector", at: "2026-11-02T09:32:00.000Z" });
    expect(r.remarks).toBe("Follow the makers' run-in instructions.");
    expect(r.shop).toEqual({ name: "Test Shop", address: "1 Test Lane", contact: "test@example.test", hasLogo: false, timeZone: "UTC" });
  });

  it("writes inches (4 decimals) and thou (2 decimals) for an inch customer", () => {
    const r = buildRecordView(sampleRecordSource(), "inch");
    expect(r.units).toEqual({ size: "in", small: "thou" });
    const c1 = r.cylinders[0]!;
    expect(c1.piston.diameter.text).toBe("3.6976 in");
    expect(c1.levels[2]!.a.text).toBe("3.7012 in");
    expect(c1.clearance.min.text).toBe("3.54 thou");
    expect(r.job.standardBore.text).toBe("3.7008 in");
  });

  it("rounds every length figure to its unit's resolution and keeps the µm it came from", () => {
    fc.assert(fc.property(fc.double({ min: 20_000, max: 200_000, noNaN: true }), fc.constantFrom("metric" as const, "inch" as const), (um, system) => {
      const source = sampleRecordSource();
      source.cylinders[0]!.levels[0]!.aUm = um;
      const r = buildRecordView(source, system);
      const fig = r.cylinders.find((c) => c.number === 2)!.levels[0]!.a;
      expect(fig.um).toBe(um);
      const unit = system === "inch" ? "in" : "mm";
      const [number, label] = fig.text.split(" ");
      expect(label).toBe(unit);
      expect(number!.split(".")[1]).toHaveLength(system === "inch" ? 4 : 3);
      expect(Math.abs(Number(number) - fromUm(um, unit))).toBeLessThanOrEqual((system === "inch" ? 0.00005 : 0.0005) + 1e-9);
    }));
  });

  it("names the shop's oversize step nearest the finished size", () => {
    expect(oversizeStep(94_012, 94_000, [0, 250, 500])).toBe(0);
    expect(oversizeStep(94_508, 94_000, [0, 250, 500])).toBe(500);
    expect(oversizeStep(94_260, 94_000, [])).toBe(0);
    const r = buildRecordView(sampleRecordSource({ job: { ...sampleRecordSource().job, standardBoreUm: 93_500 } }), "metric");
    expect(r.job.oversize).toEqual({ um: 500, text: "+0.50 mm" });
  });
});
