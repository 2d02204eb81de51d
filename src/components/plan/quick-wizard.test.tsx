// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import type { QuickPlanDraft } from "@/shared/plans/schema";

// The wizard reads its step from the URL; here the URL is a plain variable the router moves.
const nav = vi.hoisted(() => ({ step: "inputs" }));
vi.mock("next/navigation", () => ({
  useRouter: () => ({ push: (url: string) => { nav.step = new URL(url, "http://x").searchParams.get("step") ?? "inputs"; }, refresh: () => {} }),
  usePathname: () => "/plan",
  useSearchParams: () => new URLSearchParams({ step: nav.step }),
}));

const { QuickPlanWizard } = await import("./quick-wizard");

const EMPTY: QuickPlanDraft = {
  mode: "quick", boreMaterial: "grey_iron", boreLengthUm: Number.NaN, pistonDiameterUm: Number.NaN, bore: { kind: "stock", stockUm: Number.NaN },
  machineId: "", clearance: { minUm: Number.NaN, maxUm: Number.NaN, targetUm: null, performanceAllowanceUm: 0 },
  stoneIds: {}, pressures: {}, checkpointFraction: 0.75, targetCrosshatchDeg: 45, boring: { enabled: null, marginUm: null },
};
const save = vi.fn();

function wizard() {
  return render(<QuickPlanWizard initialDraft={EMPTY} machines={[]} unitSystem="metric" saveQuickPlan={save} />);
}
const field = (testId: string) => screen.getByTestId(testId) as HTMLInputElement;
const isRed = (testId: string) => field(testId).getAttribute("aria-invalid") === "true";
const note = (testId: string) => document.getElementById(field(testId).getAttribute("aria-describedby")!)!;
const redNotes = () => Array.from(document.querySelectorAll("p.text-stop, [aria-invalid=true]"));

beforeEach(() => {
  nav.step = "inputs";
  sessionStorage.clear();
  // Nothing here waits for a preview: a valid draft's request simply never answers.
  vi.stubGlobal("fetch", vi.fn(() => new Promise(() => {})));
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("QuickPlanWizard errors", () => {
  it("shows no red on an empty form before anything is typed, nor a mark on any step", () => {
    wizard();
    expect(redNotes()).toEqual([]);
    expect(screen.queryByTestId("step-mark-inputs")).toBeNull();
  });

  it("shows a field's error once the user leaves it, and clears it as soon as the value is right", () => {
    wizard();
    const piston = field("quick-piston");
    fireEvent.focus(piston);
    fireEvent.change(piston, { target: { value: "80.0 bananas" } });
    expect(isRed("quick-piston")).toBe(false);
    fireEvent.blur(piston);
    expect(isRed("quick-piston")).toBe(true);
    expect(note("quick-piston").className).toContain("text-stop");
    // Other fields, never left, stay quiet.
    expect(isRed("quick-length")).toBe(false);
    expect(isRed("clearance-min")).toBe(false);
    fireEvent.change(piston, { target: { value: "80.0 mm" } });
    expect(isRed("quick-piston")).toBe(false);
    expect(note("quick-piston").className).not.toContain("text-stop");
  });

  it("an emptied required field says so only after it is left", () => {
    wizard();
    const length = field("quick-length");
    fireEvent.change(length, { target: { value: "120 mm" } });
    fireEvent.change(length, { target: { value: "" } });
    expect(isRed("quick-length")).toBe(false);
    fireEvent.blur(length);
    expect(isRed("quick-length")).toBe(true);
  });

  it("shows every error and the step marks once Next is pressed", () => {
    const view = wizard();
    fireEvent.click(screen.getByTestId("wizard-next"));
    expect(nav.step).toBe("stones");
    view.rerender(<QuickPlanWizard initialDraft={EMPTY} machines={[]} unitSystem="metric" saveQuickPlan={save} />);
    expect(screen.getByTestId("step-mark-inputs").textContent).not.toBe("");
    // Back on the first step, the empty required fields are red without being touched again.
    nav.step = "inputs";
    view.rerender(<QuickPlanWizard initialDraft={EMPTY} machines={[]} unitSystem="metric" saveQuickPlan={save} />);
    expect(isRed("quick-piston")).toBe(true);
    expect(isRed("clearance-min")).toBe(true);
  });
});
