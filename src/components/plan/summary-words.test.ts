import { describe, expect, it } from "vitest";
import { cylinderStatus, stageStrokes } from "./summary-words";

describe("plan summary words", () => {
  const plan = (warnings: number, errors = 0) => ({ errors: Array.from({ length: errors }, () => ({})), warnings: Array.from({ length: warnings }, () => ({ severity: "warning" })), stages: [] });
  it("never says OK beside a warning of the cylinder", () => {
    expect(cylinderStatus({ needs: [], plan: plan(0) })).toEqual({ tone: "pass", text: "OK" });
    expect(cylinderStatus({ needs: [], plan: plan(1) })).toEqual({ tone: "caution", text: "1 warning" });
    expect(cylinderStatus({ needs: [], plan: plan(3) })).toEqual({ tone: "caution", text: "3 warnings" });
    expect(cylinderStatus({ needs: [{}], plan: plan(3, 1) })).toEqual({ tone: "stop", text: "2 to resolve" });
    expect(cylinderStatus({ needs: [], plan: { ...plan(0), warnings: [{ severity: "info" }] } }).text).toBe("OK");
  });
  it("spells the stages out", () => {
    const s = (kind: string, nominal: number) => ({ kind, strokes: { nominal } });
    expect(stageStrokes([{ kind: "bore" }, s("coarse", 131), s("finish", 50), s("plateau", 19)])).toBe("bore · coarse 131 · finish 50 · plateau 19 double strokes");
    expect(stageStrokes([{ kind: "bore" }])).toBe("bore");
  });
});
