import { describe, expect, it } from "vitest";
import { displayUnits } from "@/shared/units";
import { showField } from "./format";
import { length } from "@/shared/units";

const INCH = displayUnits("inch");
const METRIC = displayUnits("metric");

describe("library display units", () => {
  it("shows stone and machine lengths in mm or inches (1 in = 25.4 mm exactly [V S24])", () => {
    expect(length(100_000, METRIC, 0)).toBe("100 mm");
    expect(length(100_000, INCH, 0)).toBe("3.94 in");
    expect(length(6_350, INCH, 1)).toBe("0.250 in");
    expect(length(8_001, INCH, 2)).toBe("0.3150 in");
    expect(length(8_001, METRIC, 2)).toBe("8.00 mm");
    expect(length(null, INCH)).toBe("—");
  });

  it("history values follow the unit for lengths; removal and roughness stay in µm", () => {
    expect(showField("stoneLengthUm", 101_600, INCH)).toBe("4.000 in");
    expect(showField("stoneLengthUm", 101_600)).toBe("101.6 mm");
    expect(showField("referenceBoreLengthUm", 139_700, INCH)).toBe("5.500 in");
    expect(showField("removalPerDoubleStrokeUm", 0.45, INCH)).toBe("0.45 µm");
    expect(showField("raUm", 0.4, INCH)).toBe("0.4 µm");
    expect(showField("code", "C-1", INCH)).toBe("C-1");
  });
});
