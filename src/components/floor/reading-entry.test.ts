import { describe, expect, it } from "vitest";
import { parseReading, type ReadingDraft } from "./reading-entry";

const values = { "top.A": "94.000", "top.B": "94.000", "bottom.A": "94.001", "bottom.B": "94.000" };
const draft = (blockC: string, gaugeC: string): ReadingDraft => ({ values, blockC, gaugeC });
const temps = (d: ReadingDraft, shop: number | null) => {
  const parsed = parseReading(d, ["top", "bottom"], "mm", shop);
  return parsed.ok ? parsed.temperatures : parsed.error;
};

describe("reading temperatures", () => {
  it("a blank gauge takes the shop's gauge temperature once the block's is typed; a typed one wins", () => {
    expect(temps(draft("23", ""), 20.5)).toEqual({ blockC: 23, gaugeC: 20.5 });
    expect(temps(draft("23", "21"), 20.5)).toEqual({ blockC: 23, gaugeC: 21 });
    expect(temps(draft("", ""), 20.5)).toBeNull();
  });
  it("without a shop setting both are needed, or neither", () => {
    expect(temps(draft("23", ""), null)).toBe("Enter both temperatures, or neither.");
    expect(temps(draft("", "21"), 20.5)).toBe("Enter both temperatures, or neither.");
    expect(temps(draft("", ""), null)).toBeNull();
  });
});
