import { describe, expect, it } from "vitest";
import { gritText, rateInputSchema, stoneInputSchema } from "./schema";
import { machineInputSchema } from "../machines/schema";

const stone = { code: "S-1", role: "finish", abrasive: "silicon_carbide", grit: "JIS #600", bond: "vitrified", stoneLengthUm: "100", stoneWidthUm: "6 mm", stonesPerHead: "4", startHeightUm: "8", wearLimitHeightUm: "2", currentHeightUm: "7.5" };

describe("stone form schema (shared by the form and the server)", () => {
  it("reads grit with its scale; a bare number is refused (trade-facts §3.4, §11.15)", () => {
    expect(gritText.parse("JIS #600")).toEqual({ scale: "JIS", number: 600 }); // JIS R 6001:1987 #600 [V S11]
    expect(gritText.parse("D54")).toEqual({ scale: "D", number: 54 }); // ISO 6106 D54 [V S14]
    expect(gritText.safeParse("600").success).toBe(false);
  });

  it("turns form text into µm: bare numbers are mm, units are honoured (1 in = 25.4 mm [V S24])", () => {
    const parsed = stoneInputSchema.parse({ ...stone, stoneLengthUm: "3.5 in" });
    expect(parsed).toMatchObject({ stoneLengthUm: 88_900, stoneWidthUm: 6_000, startHeightUm: 8_000, stonesPerHead: 4 });
  });

  it("an empty length asks for it by name", () => {
    const result = stoneInputSchema.safeParse({ ...stone, stoneWidthUm: "" });
    expect(result.error?.issues[0]?.message).toBe("Enter the stone width.");
  });

  it("names a length's limits in mm and in inches, for users of either", () => {
    const result = stoneInputSchema.safeParse({ ...stone, stoneLengthUm: "400" });
    expect(result.error?.issues[0]?.message).toBe("Stone length must be 10 mm (0.394 in) to 300 mm (11.8 in)."); // 1 in = 25.4 mm [V S24]
  });

  it("checks a pressure against its own unit's bounds", () => {
    const rate = { removalPerDoubleStrokeUm: "0.4", referencePressure: "500", referencePressureUnit: "N", referenceBoreLengthUm: "140", raUm: "0.6", rzUm: "4.5", cleanupMode: "from_rz", wearUmPerUmStock: "0.3", uncertaintyFraction: "0.25", source: "shop_measurement" };
    expect(rateInputSchema.safeParse(rate).success).toBe(true);
    expect(rateInputSchema.safeParse({ ...rate, referencePressureUnit: "bar" }).error?.issues[0]?.path).toEqual(["referencePressure"]);
  });

  it("a machine's ranges run low to high", () => {
    const machine = { name: "M", spindleRpmMin: 300, spindleRpmMax: 100, doubleStrokesPerMinMin: 20, doubleStrokesPerMinMax: 90, maxStrokeLengthUm: "200", drive: "crank", pressureUnit: "dial", pressureMin: 1, pressureMax: 10, headStoneLengthUm: "100" };
    expect(machineInputSchema.safeParse(machine).error?.issues.map((i) => i.path[0])).toEqual(["spindleRpmMax"]);
  });

  it("a rate's pressure and a machine's feed pressures accept their unit, read into the unit the form chose", () => {
    const rate = { removalPerDoubleStrokeUm: "0.4", referencePressure: "130 psi", referencePressureUnit: "bar", referenceBoreLengthUm: "140", raUm: "0.6", rzUm: "4.5", cleanupMode: "from_rz", wearUmPerUmStock: "0.3", uncertaintyFraction: "0.25", source: "shop_measurement" };
    // 1 psi = 6 894.757 Pa exactly (1959 yard and pound agreement, standard gravity); 1 bar = 10⁵ Pa (SI brochure, BIPM)
    expect(rateInputSchema.parse(rate).referencePressure).toBeCloseTo(8.963, 3);
    expect(rateInputSchema.parse({ ...rate, referencePressure: "900 kPa" }).referencePressure).toBeCloseTo(9, 9);
    expect(rateInputSchema.parse({ ...rate, referencePressure: "9" }).referencePressure).toBe(9);
    const wrong = rateInputSchema.safeParse({ ...rate, referencePressure: "9 bar", referencePressureUnit: "dial" });
    expect(wrong.error?.issues).toEqual([expect.objectContaining({ path: ["referencePressure"], message: expect.stringMatching(/dial setting/) })]);
    expect(rateInputSchema.safeParse({ ...rate, referencePressure: "9 furlongs" }).error?.issues[0]?.message).toMatch(/Unknown unit/);
    const machine = { name: "M", spindleRpmMin: 100, spindleRpmMax: 300, doubleStrokesPerMinMin: 20, doubleStrokesPerMinMax: 90, maxStrokeLengthUm: "200", drive: "crank", pressureUnit: "bar", pressureMin: "29 psi", pressureMax: "1.2 MPa", headStoneLengthUm: "100" };
    expect(machineInputSchema.parse(machine)).toMatchObject({ pressureMin: expect.closeTo(1.9995, 3), pressureMax: 12 });
    // the range is still checked after conversion: 300 psi is above 12 bar
    expect(machineInputSchema.safeParse({ ...machine, pressureMin: "300 psi" }).error?.issues.map((i) => i.path[0])).toEqual(["pressureMax"]);
  });
});
