import { describe, expect, it } from "vitest";
import { planRequestSchema } from "@/shared/plans/schema";
import { countByStep, reviewBlockers, stepOfField } from "./review-blockers";

describe("review blockers", () => {
  it("puts each field on its step", () => {
    expect(stepOfField("pressures.finish")).toBe("stones");
    expect(stepOfField("clearance.maxUm")).toBe("pistons");
    expect(stepOfField("cylinders.2.pistonDiameterUm")).toBe("pistons");
    expect(stepOfField("cylinders.2.bore.diameterUm")).toBe("readings");
    expect(stepOfField("boring.marginUm")).toBe("readings");
    expect(stepOfField("targetCrosshatchDeg")).toBe("stroke");
    expect(stepOfField("machineId")).toBe("stroke");
  });
  it("a pressure that will not save is a blocker on the stones step, whatever an older preview said", () => {
    const draft = { mode: "job", jobId: "j", machineId: "m", clearance: { minUm: 40, maxUm: 60 }, pressures: { finish: Number.NaN } };
    const checked = planRequestSchema.safeParse(draft);
    expect(checked.success).toBe(false);
    const fieldErrors: Record<string, string[]> = {};
    if (!checked.success) for (const i of checked.error.issues) (fieldErrors[i.path.join(".")] ??= []).push(i.message);
    const stalePreview = { canRelease: true, errorCount: 0, cylinders: [{ cylinder: 1, needs: [], plan: { errors: [] } }] } as never;
    const blockers = reviewBlockers({ fieldErrors, preview: stalePreview, valid: false, loading: false });
    expect(blockers.map((b) => b.step)).toEqual(["stones"]);
    expect(countByStep(blockers)).toEqual({ stones: 1 });
  });
  it("a cylinder without a piston or readings blocks, on its step", () => {
    const preview = { canRelease: false, errorCount: 2, cylinders: [{ cylinder: 1, needs: [{ field: "piston", message: "no piston" }, { field: "bore", message: "no readings" }], plan: null }] } as never;
    expect(reviewBlockers({ fieldErrors: {}, preview, valid: true, loading: false }).map((b) => b.step)).toEqual(["pistons", "readings"]);
  });
  it("plan errors land on the step their code belongs to; the quick wizard folds steps", () => {
    const preview = { cylinders: [{ cylinder: 1, needs: [], plan: { errors: [{ code: "NO_HONING_STONE", severity: "error", message: "No stone" }] } }] } as never;
    const blockers = reviewBlockers({ fieldErrors: {}, preview, valid: true, loading: false });
    expect(blockers).toEqual([{ step: "stones", text: "Cylinder 1: No stone" }]);
    expect(countByStep([{ step: "pistons", text: "" }, { step: "readings", text: "" }], (s) => (s === "pistons" || s === "readings" ? "inputs" : s))).toEqual({ inputs: 2 });
  });
});
