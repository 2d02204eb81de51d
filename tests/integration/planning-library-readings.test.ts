// Job plans read the planning library through records.ts's single SQL query (for speed), quick plans
// and the planning route through drizzle (plans/library.ts). Both feed the one builder, so they must
// read the same records: checked here on a shop whose library has every case the builder tells apart.
import { describe, expect, it } from "vitest";
import { getPlanningLibrary, libraryFromRecords, readLibraryRecords } from "@/server/plans/library";
import { loadJobPlanningRecords } from "@/server/plans/records";
import { setStoneActive, createStone } from "@/server/stones/mutations";
import { setMachineActive } from "@/server/machines/mutations";
import { listMachines } from "@/server/machines/queries";
import { seedDemoStones } from "@/server/demo/stones";
import { createShopWithMembers } from "../support/fixtures";
import { makeJob } from "./jobs-support";
import { changeRateRow } from "./plans-fixtures";
import { machineFor, stoneInput, stoneWithRate } from "./stones-fixtures";

describe("the planning library's two readings", () => {
  it("agree record for record, and so build the same library, for every machine and bore material", async () => {
    const shop = await createShopWithMembers("library-readings");
    const lead = shop.actors.lead;
    // The invented demo library (two machines, three roles, rate rows for two materials) plus the awkward cases.
    await seedDemoStones({ shopId: shop.shopId, signIns: [], userIdsByRole: { lead: lead.userId, owner: shop.actors.owner.userId } });
    const crank = await machineFor(lead, { drive: "crank", maxStrokeLengthUm: 300_000, headStoneLengthUm: 120_000, pressureUnit: "dial", pressureMin: 1, pressureMax: 9 });
    const bar = await machineFor(lead, { spindleRpmMin: 120, spindleRpmMax: 300 });
    const retiredMachine = await machineFor(lead);
    await setMachineActive({ actor: lead, input: { machineId: retiredMachine.machineId, active: false, reason: "Sold" } });

    const twiceMeasured = await stoneWithRate(lead, { code: "Z-finish", role: "finish", grit: "JIS #400" }, { removalPerDoubleStrokeUm: 0.45, raUm: 0.6, rzUm: 4.5, cleanupStockUm: 3 });
    await changeRateRow(lead, twiceMeasured.rateRowId);
    await changeRateRow(lead, twiceMeasured.rateRowId);
    await stoneWithRate(lead, { code: "Z-dial" }, { referencePressureUnit: "dial", referencePressure: 5, cleanupMode: "from_rz", cleanupStockUm: undefined, cleanupRzMultiple: 2.5 });
    await stoneWithRate(lead, { code: "Z-liner", role: "plateau", grit: "JIS #800" }, { boreMaterial: "al_iron_liner", raUm: 0.35, rzUm: 3, referenceDiameterUm: 86_000, referenceAngleDeg: 40 });
    await createStone({ actor: lead, input: stoneInput({ code: "Z-norate" }) });
    const retiredStone = await stoneWithRate(lead, { code: "Z-retired" });
    await setStoneActive({ actor: lead, input: { stoneId: retiredStone.stoneId, active: false, reason: "Worn out" } });

    const machineIds = [crank.machineId, bar.machineId, ...(await listMachines({ actor: lead })).filter((m) => m.active && m.name.includes("(demo)")).map((m) => m.id)];
    let compared = 0;
    for (const boreMaterial of ["grey_iron", "al_iron_liner"] as const) {
      const { jobId } = await makeJob(shop.actors.machinist, { boreMaterial });
      for (const machineId of machineIds) {
        const byDrizzle = await readLibraryRecords({ actor: shop.actors.machinist, boreMaterial, machineId });
        const bySql = await loadJobPlanningRecords({ actor: shop.actors.machinist, jobId, machineId });
        expect({ machine: bySql.machine, stones: bySql.stones }).toEqual(byDrizzle);
        expect(libraryFromRecords(bySql.machine, bySql.stones)).toEqual(await getPlanningLibrary({ actor: shop.actors.machinist, boreMaterial, machineId }));
        compared += 1;
      }
    }
    expect(compared).toBe(2 * machineIds.length);

    // The cases the comparison must have covered: several rate versions, the skip reasons a machine that
    // fits every stone can give (createMachine refuses one shorter than a stone), retired rows left out.
    const library = await getPlanningLibrary({ actor: lead, boreMaterial: "grey_iron", machineId: bar.machineId });
    expect(library.stones.find((s) => s.code === "Z-finish")?.rate.version).toBe(3);
    expect(new Set(library.skipped.map((s) => s.reason))).toEqual(new Set(["no_rate_row", "pressure_unit_mismatch"]));
    expect([...library.stones, ...library.skipped].some((s) => s.code === "Z-retired")).toBe(false);
    const sqlOnRetired = (async () => {
      const { jobId } = await makeJob(lead);
      return loadJobPlanningRecords({ actor: lead, jobId, machineId: retiredMachine.machineId });
    })();
    await expect(sqlOnRetired).rejects.toMatchObject({ code: "conflict" });
    await expect(readLibraryRecords({ actor: lead, boreMaterial: "grey_iron", machineId: retiredMachine.machineId })).rejects.toMatchObject({ code: "conflict" });
  });
});

