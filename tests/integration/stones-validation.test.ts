import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { rateRows, stones } from "@/server/db/schema";
import { createStone } from "@/server/stones/mutations";
import { createRateRow } from "@/server/stones/rate-mutations";
import { getStoneDetail } from "@/server/stones/queries";
import { createShopWithMembers } from "../support/fixtures";
import { fieldErrorsOf, machineFor, rateInput, stoneInput } from "./stones-fixtures";

const shopStones = (shopId: string) => db.select().from(stones).where(eq(stones.shopId, shopId));
const shopRates = (shopId: string) => db.select().from(rateRows).where(eq(rateRows.shopId, shopId));

describe("grit: scale and number from the published tables", () => {
  const cases: Array<[string, string, number, string]> = [
    ["JIS #400", "JIS", 30.0, "JIS R 6001:1987 #400 d50 30.0 µm [V S11]"],
    ["JIS #1000", "JIS", 11.5, "JIS R 6001:1987 #1000 d50 11.5 µm [V S11]"],
    ["F220", "FEPA-F", 63.05, "FEPA F 42-D-1986 F220 band 53–75 µm, geometric midpoint [V S12, D]"],
    ["F80", "FEPA-F", 178.3, "FEPA F 42-D-1986 F80 band 150–212 µm, geometric midpoint [V S12, D]"],
    ["D151", "D", 136.9, "ISO 6106 D151 = 150/125 µm, geometric midpoint [V S14, D]"],
    ["P400", "FEPA-P", 35.0, "FEPA P coated-abrasive average P400 35.0 µm [M, trade-facts §3.4]"],
  ];
  it.each(cases)("%s is stored as its scale and shows its grain size (%s, %d µm: %s)", async (grit, scale, grainUm) => {
    const shop = await createShopWithMembers("grit-ok");
    const { stoneId } = await createStone({ actor: shop.actors.lead, input: stoneInput({ grit }) });
    const { stone } = await getStoneDetail({ actor: shop.actors.lead, stoneId });
    expect(stone.grit.scale).toBe(scale);
    expect(stone.grainSizeUm).toBeCloseTo(grainUm, 1);
  });

  it.each(["400", "400 grit", "#400", "JIS #450", "F 999", "fine"])("refuses %j and writes nothing", async (grit) => {
    const shop = await createShopWithMembers("grit-bad");
    const errors = await fieldErrorsOf(createStone({ actor: shop.actors.lead, input: stoneInput({ grit }) }));
    expect(errors.grit?.[0]).toBeTruthy();
    expect(await shopStones(shop.shopId)).toEqual([]);
  });

  it("a bare number says the scale is missing (JIS #400 ≈ 30 µm vs P400 ≈ 35 µm, trade-facts §11.15)", async () => {
    const shop = await createShopWithMembers("grit-bare");
    const errors = await fieldErrorsOf(createStone({ actor: shop.actors.lead, input: stoneInput({ grit: "400" }) }));
    expect(errors.grit?.[0]).toMatch(/no scale/);
  });
});

describe("stone physical limits", () => {
  it.each([
    [{ stoneLengthUm: 5_000 }, "stoneLengthUm"],
    [{ stoneLengthUm: 350_000 }, "stoneLengthUm"],
    [{ stoneLengthUm: "75 furlongs" }, "stoneLengthUm"],
    [{ stonesPerHead: 0 }, "stonesPerHead"],
    [{ stonesPerHead: 2.5 }, "stonesPerHead"],
    [{ wearLimitHeightUm: 9_000 }, "wearLimitHeightUm"],
    [{ currentHeightUm: 9_000 }, "currentHeightUm"],
    [{ code: "" }, "code"],
    [{ role: "roughing" }, "role"],
  ])("refuses %j with a field error on %s and writes nothing", async (override, field) => {
    const shop = await createShopWithMembers("stone-limits");
    const errors = await fieldErrorsOf(createStone({ actor: shop.actors.lead, input: stoneInput(override) }));
    expect(Object.keys(errors)).toContain(field);
    expect(await shopStones(shop.shopId)).toEqual([]);
  });

  it("reads form lengths with units; a bare number is mm", async () => {
    const shop = await createShopWithMembers("stone-units");
    const { stoneId } = await createStone({ actor: shop.actors.lead, input: stoneInput({ stoneLengthUm: "2.95 in", stoneWidthUm: "6", startHeightUm: "8 mm", wearLimitHeightUm: "2000 µm", currentHeightUm: "7.5" }) });
    const { stone } = await getStoneDetail({ actor: shop.actors.lead, stoneId });
    expect(stone).toMatchObject({ stoneLengthUm: 74_930, stoneWidthUm: 6_000, startHeightUm: 8_000, wearLimitHeightUm: 2_000, currentHeightUm: 7_500 }); // 1 in = 25.4 mm [V S24]
  });

  it("a stone must be shorter than every active machine's maximum stroke", async () => {
    const shop = await createShopWithMembers("stone-vs-machine");
    await machineFor(shop.actors.lead, { maxStrokeLengthUm: 120_000, headStoneLengthUm: 75_000 });
    const errors = await fieldErrorsOf(createStone({ actor: shop.actors.lead, input: stoneInput({ stoneLengthUm: 150_000 }) }));
    expect(errors.stoneLengthUm?.[0]).toMatch(/strokes at most 120 mm \(4\.72 in\)\./); // 1 in = 25.4 mm [V S24]
    expect(await shopStones(shop.shopId)).toEqual([]);
    await expect(createStone({ actor: shop.actors.lead, input: stoneInput({ stoneLengthUm: 100_000 }) })).resolves.toBeTruthy();
  });
});

describe("rate row physical limits", () => {
  it.each([
    [{ removalPerDoubleStrokeUm: 0.001 }, "removalPerDoubleStrokeUm"],
    [{ removalPerDoubleStrokeUm: 60 }, "removalPerDoubleStrokeUm"],
    [{ removalPerDoubleStrokeUm: "lots" }, "removalPerDoubleStrokeUm"],
    [{ referencePressure: 150, referencePressureUnit: "bar" }, "referencePressure"],
    [{ referencePressure: 0.01 }, "referencePressure"],
    [{ referenceBoreLengthUm: 5_000 }, "referenceBoreLengthUm"],
    [{ raUm: 2, rzUm: 1 }, "rzUm"],
    [{ cleanupMode: "explicit", cleanupStockUm: undefined }, "cleanupStockUm"],
    [{ uncertaintyFraction: 1 }, "uncertaintyFraction"],
    [{ wearUmPerUmStock: 50 }, "wearUmPerUmStock"],
    [{ source: "rumour" }, "source"],
    [{ boreMaterial: "wood" }, "boreMaterial"],
  ])("refuses %j with a field error on %s and writes nothing", async (override, field) => {
    const shop = await createShopWithMembers("rate-limits");
    const { stoneId } = await createStone({ actor: shop.actors.lead, input: stoneInput() });
    const errors = await fieldErrorsOf(createRateRow({ actor: shop.actors.lead, input: rateInput(stoneId, override) }));
    expect(Object.keys(errors)).toContain(field);
    expect(await shopRates(shop.shopId)).toEqual([]);
  });

  it("accepts the bounds: 0.01 and 50 µm per double stroke; 150 N is a sane pressure in newtons", async () => {
    const shop = await createShopWithMembers("rate-bounds");
    for (const [i, removal] of [0.01, 50].entries()) {
      const { stoneId } = await createStone({ actor: shop.actors.lead, input: stoneInput({ code: `B-${i}` }) });
      await createRateRow({ actor: shop.actors.lead, input: rateInput(stoneId, { removalPerDoubleStrokeUm: removal, referencePressure: 150, referencePressureUnit: "N" }) });
    }
    expect((await shopRates(shop.shopId)).map((r) => r.removalPerDoubleStrokeUm).sort((a, b) => a - b)).toEqual([0.01, 50]);
  });
});
