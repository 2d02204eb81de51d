import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { machines, rateRows, stones } from "@/server/db/schema";
import { planHone, gritGrainSizeUm, type GritScale, type HoneStage } from "@/lib/honing";
import { getPlanningLibrary } from "@/server/plans/library";
import { setStoneActive } from "@/server/stones/mutations";
import { updateRateRow } from "@/server/stones/rate-mutations";
import { createStone } from "@/server/stones/mutations";
import { seedDemoStones } from "@/server/demo/stones";
import { createShopWithMembers } from "../support/fixtures";
import { machineFor, rateInput, stoneInput, stoneWithRate } from "./stones-fixtures";

// Piston 85.470 mm + clearance 0.020–0.040 mm → target 85.500 mm (trade-facts §11.16 [D, V S17]); the
// bore left 70 µm under by boring (rebuild practice 50–100 µm [C, §3.3]).
const PISTON = { pistonDiameterUm: 85_470, clearanceMinUm: 20, clearanceMaxUm: 40 };
const BORE = { kind: "diameter" as const, diameterUm: 85_430 };

describe("getPlanningLibrary", () => {
  it("maps the active stones' current rate rows and the machine to planHone's inputs", async () => {
    const shop = await createShopWithMembers("planning-map");
    const lead = shop.actors.lead;
    const { machineId } = await machineFor(lead, { spindleRpmMin: 90, spindleRpmMax: 350, doubleStrokesPerMinMin: 25, doubleStrokesPerMinMax: 110, maxStrokeLengthUm: 200_000, drive: "crank" });
    const coarse = await stoneWithRate(lead, { code: "A-coarse", role: "coarse" }, { removalPerDoubleStrokeUm: 1.5, cleanupStockUm: 20 });
    const finish = await stoneWithRate(lead, { code: "B-finish", role: "finish", grit: "JIS #400" }, { removalPerDoubleStrokeUm: 0.45, raUm: 0.6, rzUm: 4.5, cleanupStockUm: 3, referencePressure: 8 });
    const plateau = await stoneWithRate(lead, { code: "C-plateau", role: "plateau", grit: "JIS #800" }, { removalPerDoubleStrokeUm: 0.12, raUm: 0.35, rzUm: 3, cleanupMode: "from_rz", cleanupStockUm: undefined, referencePressure: 4 });
    await stoneWithRate(lead, { code: "D-dial" }, { referencePressureUnit: "dial", referencePressure: 5 });
    await createStone({ actor: lead, input: stoneInput({ code: "E-norate" }) });
    const retired = await stoneWithRate(lead, { code: "F-retired" });
    await setStoneActive({ actor: lead, input: { stoneId: retired.stoneId, active: false, reason: "Worn out" } });
    await updateRateRow({ actor: lead, input: { ...rateInput(finish.stoneId, { removalPerDoubleStrokeUm: 0.5, raUm: 0.6, rzUm: 4.5, cleanupStockUm: 3, referencePressure: 8 }), rateRowId: finish.rateRowId, expectedVersion: 1, reason: "Measured" } });

    const library = await getPlanningLibrary({ actor: shop.actors.machinist, boreMaterial: "grey_iron", machineId });
    expect(library.machineInput).toEqual({ spindleRpmMin: 90, spindleRpmMax: 350, doubleStrokesPerMinMin: 25, doubleStrokesPerMinMax: 110, maxStrokeLengthUm: 200_000, drive: "crank" });
    expect(library.machine).toMatchObject({ pressureUnit: "bar", pressureMin: 2, pressureMax: 25, headStoneLengthUm: 100_000 });
    expect(library.stones.map((s) => s.code)).toEqual(["A-coarse", "B-finish", "C-plateau"]);
    const stoneInputs = library.stones.map((s) => s.input);
    expect(stoneInputs[0]).toEqual({
      id: coarse.stoneId, role: "coarse", stoneLengthUm: 100_000, currentHeightUm: 7_000, wearLimitHeightUm: 2_000,
      rate: { removalPerDoubleStrokeUm: 1.5, referencePressure: 10, referenceBoreLengthUm: 140_000, uncertaintyFraction: 0.25, raUm: 1.6, rzUm: 11, wearUmPerUmStock: 0.5, cleanupStockUm: 20, referenceAngleDeg: 45 },
    });
    expect(stoneInputs[2]!.rate).toMatchObject({ cleanupRzMultiple: 3 });
    expect(stoneInputs[2]!.rate).not.toHaveProperty("cleanupStockUm");
    expect(library.stones.map((s) => ({ stoneId: s.id, rateRowId: s.rate.id, version: s.rate.version }))).toEqual([
      { stoneId: coarse.stoneId, rateRowId: coarse.rateRowId, version: 1 },
      { stoneId: finish.stoneId, rateRowId: finish.rateRowId, version: 2 },
      { stoneId: plateau.stoneId, rateRowId: plateau.rateRowId, version: 1 },
    ]);
    expect(library.skipped.map((s) => [s.code, s.reason])).toEqual([["D-dial", "pressure_unit_mismatch"], ["E-norate", "no_rate_row"]]);

    const plan = planHone({ piston: PISTON, bore: BORE, stones: library.stones.map((s) => s.input), machine: library.machineInput, boreLengthUm: 140_000 });
    expect(plan.errors).toEqual([]);
    const honeStages = plan.stages.filter((s): s is HoneStage => s.kind !== "bore");
    expect(honeStages.map((s) => s.stoneId)).toEqual([coarse.stoneId, finish.stoneId, plateau.stoneId]);
  });

  it("answers not found for another shop's machine and refuses a retired one", async () => {
    const shop = await createShopWithMembers("planning-machine");
    const other = await createShopWithMembers("planning-other");
    const { machineId } = await machineFor(shop.actors.lead);
    await expect(getPlanningLibrary({ actor: other.actors.lead, boreMaterial: "grey_iron", machineId })).rejects.toMatchObject({ code: "not_found" });
    await db.update(machines).set({ active: false }).where(eq(machines.id, machineId));
    await expect(getPlanningLibrary({ actor: shop.actors.lead, boreMaterial: "grey_iron", machineId })).rejects.toMatchObject({ code: "conflict" });
  });
});

describe("demo library", () => {
  it("seeds machines, coarse/finish/plateau stones and rate rows for grey iron and iron liners, labelled demo, that plan", async () => {
    const shop = await createShopWithMembers("demo-stones");
    await seedDemoStones({ shopId: shop.shopId, signIns: [], userIdsByRole: { lead: shop.actors.lead.userId, owner: shop.actors.owner.userId } });
    const demoMachines = await db.select().from(machines).where(eq(machines.shopId, shop.shopId));
    const demoStones = await db.select().from(stones).where(eq(stones.shopId, shop.shopId));
    const demoRates = await db.select().from(rateRows).where(eq(rateRows.shopId, shop.shopId));
    expect(demoMachines).toHaveLength(2);
    expect(demoMachines.every((m) => m.isDemo && m.name.includes("(demo)"))).toBe(true);
    expect(new Set(demoStones.map((s) => s.role))).toEqual(new Set(["coarse", "finish", "plateau"]));
    expect(demoStones.every((s) => s.isDemo && s.notes.startsWith("Demo data"))).toBe(true);
    expect(demoStones.every((s) => gritGrainSizeUm({ scale: s.gritScale as GritScale, number: s.gritNumber }) !== null)).toBe(true);
    expect(new Set(demoRates.map((r) => r.boreMaterial))).toEqual(new Set(["grey_iron", "al_iron_liner"]));
    expect(demoRates.every((r) => r.source === "demo")).toBe(true);
    const roleOf = new Map(demoStones.map((s) => [s.id, s.role]));
    for (const r of demoRates) {
      const role = roleOf.get(r.stoneId);
      // Stage Ra [C, trade-facts §2.4]: rough 1–3 µm, finish 0.4–0.8 µm, plateau 0.2–0.5 µm.
      const [lo, hi] = role === "coarse" ? [1, 3] : role === "finish" ? [0.4, 0.8] : [0.2, 0.5];
      expect(r.raUm).toBeGreaterThanOrEqual(lo);
      expect(r.raUm).toBeLessThanOrEqual(hi);
      // Vitrified stones on iron, G ≈ 5–50 [M, §4] → 0.2–1.7 µm height per µm of stock on the reference bore [D].
      expect(r.wearUmPerUmStock).toBeGreaterThanOrEqual(0.2);
      expect(r.wearUmPerUmStock).toBeLessThanOrEqual(1.7);
      if (role === "plateau") {
        // Plateau targets for cast-iron bores [M, §2.4]: Rpk 0.1–0.3, Rk 0.3–1.0, Rvk 0.8–2.0 µm.
        expect(r.rpkUm).toBeGreaterThanOrEqual(0.1);
        expect(r.rpkUm).toBeLessThanOrEqual(0.3);
        expect(r.rkUm).toBeGreaterThanOrEqual(0.3);
        expect(r.rkUm).toBeLessThanOrEqual(1.0);
        expect(r.rvkUm).toBeGreaterThanOrEqual(0.8);
        expect(r.rvkUm).toBeLessThanOrEqual(2.0);
      }
    }
    for (const machine of demoMachines) {
      for (const boreMaterial of ["grey_iron", "al_iron_liner"] as const) {
        const library = await getPlanningLibrary({ actor: shop.actors.apprentice, boreMaterial, machineId: machine.id });
        expect(library.skipped).toEqual([]);
        const plan = planHone({ piston: PISTON, bore: BORE, stones: library.stones.map((s) => s.input), machine: library.machineInput, boreLengthUm: 140_000 });
        expect(plan.errors).toEqual([]);
      }
    }
  });
});
