import { describe, expect, it } from "vitest";
import type { PlanIssue } from "@/lib/honing";
import { issueText } from "./issue-text";
import { displayUnits } from "@/shared/units";

const metric = displayUnits("metric");
const inch = displayUnits("inch");
const stone = (id: string) => (id === "s1" ? "DF-400" : "?");

describe("issueText", () => {
  const over: PlanIssue = {
    code: "BORE_OVER_TARGET", severity: "error", level: "top", direction: "A", readingUm: 92_262, targetUm: 92_251, overByUm: 11, bandMaxUm: 92_261,
    choices: [{ kind: "NEXT_OVERSIZE" }, { kind: "OTHER_PISTON", pistonAtLeastUm: 92_212 }], message: "",
  };

  it("says where the bore is over, by how much, and the ways out", () => {
    const text = issueText(over, metric, stone);
    expect(text.title).toContain("top A");
    expect(text.detail).toContain("92.262 mm");
    expect(text.detail).toContain("11.0 µm");
    expect(text.wayOut).toContain("next oversize");
    expect(text.wayOut).toContain("92.212 mm");
  });

  it("speaks the viewer's units: thou for small lengths in inch", () => {
    // 11 µm = 0.43 thou (1 thou = 25.4 µm exactly [V S24]).
    expect(issueText(over, inch, stone).detail).toContain("0.43 thou");
  });

  it("names the stone by its code, not its id", () => {
    const wear: PlanIssue = { code: "STONE_WEAR_LIMIT", severity: "warning", stoneId: "s1", stage: "finish", heightBeforeUm: 2_100, heightAfterUm: 1_950, wearLimitHeightUm: 2_000, message: "" };
    expect(issueText(wear, metric, stone).title).toContain("DF-400");
    expect(issueText(wear, metric, stone).wayOut).toContain("fresh set");
  });
});
