import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { INTERNAL_TEXT, userText } from "./user-text";
import { SIZING_RULE } from "@/lib/honing";
import { OVERSIZE_RULE } from "@/lib/honing/oversize";
import { STROKES_RULE } from "@/lib/honing/strokes";
import { OVERTRAVEL_RULE } from "@/lib/honing/stroke-setup";

describe("userText", () => {
  it("takes the source tags out of the computation's rules", () => {
    expect(userText("finished bore = piston at sizing point + clearance [V S17]")).toBe("finished bore = piston at sizing point + clearance");
    expect(userText("overtravel 1/3 stone length per end [C]; head stroke = L_bore + o_top + o_bottom − L_stone [D]")).toBe("overtravel 1/3 stone length per end; head stroke = L_bore + o_top + o_bottom − L_stone");
    expect(userText("Cutting speed 12.0 m/min is outside the usual 15–150 m/min [V S1].")).toBe("Cutting speed 12.0 m/min is outside the usual 15–150 m/min.");
    expect(userText("stage stock per DESIGN §5.3")).toBe("stage stock");
    expect(userText("unit mm (empty: mm). See docs/gauge-csv.md.")).toBe("unit mm (empty: mm).");
    for (const rule of [OVERSIZE_RULE, STROKES_RULE, OVERTRAVEL_RULE, SIZING_RULE]) expect(userText(rule)).not.toMatch(INTERNAL_TEXT);
  });

  it("keeps text without tags as it is, and never leaves a tag behind", () => {
    fc.assert(fc.property(fc.stringMatching(/^[a-z0-9 .,;=+−()µ°-]{0,60}$/), (words) => {
      const plain = words.replace(/\s+/g, " ").replace(/\s+([.,;:])/g, "$1").trim();
      expect(userText(plain)).toBe(plain);
      expect(userText(`${plain} [V S${words.length}]`)).not.toMatch(INTERNAL_TEXT);
      expect(userText(`${plain} [D, ${plain}]`)).not.toMatch(INTERNAL_TEXT);
    }));
  });
});
