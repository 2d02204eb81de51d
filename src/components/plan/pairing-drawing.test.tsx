// @vitest-environment jsdom
import { afterEach, describe, expect, it } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import type { PreviewCylinder } from "@/server/plans/preview";
import { METRIC } from "@/shared/units";
import { PairingDrawing } from "./pairing-drawing";

afterEach(cleanup);

// Invented demo figures, only to draw.
function cylinder(n: number, source: "paired" | "assigned" | null): PreviewCylinder {
  return {
    cylinder: n, cylinderId: `c${n}`, bore: null, needs: [],
    piston: source ? { source, pistonId: `p${n}`, label: `K${n}`, diameterUm: 81_950 + n, sizingHeightUm: null } : null,
    plan: { sizing: { targetUm: 82_000 + n, minUm: 81_990, maxUm: 82_010, pistonDiameterUm: 81_950, clearanceTargetUm: 50, performanceAllowanceUm: 0, bandWideningUm: 0 },
      geometry: { maxUm: 81_970 }, stock: { startDiameterUm: 81_960 } },
  } as unknown as PreviewCylinder;
}

describe("PairingDrawing", () => {
  it("draws each bore with its piston, frames the proposed pairing and labels every figure with its unit", () => {
    render(<PairingDrawing cylinders={[cylinder(1, "paired"), cylinder(2, "assigned"), cylinder(3, null)]} units={METRIC} />);
    expect(screen.getByTestId("pairing-1").getAttribute("data-paired")).toBe("true");
    expect(screen.getByTestId("pairing-2").getAttribute("data-paired")).toBe("false");
    expect(screen.getByRole("img", { name: /Cylinder 1: bore 81\.970 mm, piston K1 81\.951 mm, finished 82\.001 mm/ })).toBeTruthy();
    expect(screen.getByTestId("pairing-1").textContent).toContain("50.0 µm");
    expect(screen.getByTestId("pairing-1").textContent).toContain("proposed pairing");
    expect(screen.getByTestId("pairing-3").textContent).toContain("none yet");
  });

  it("draws nothing without cylinders", () => {
    const { container } = render(<PairingDrawing cylinders={[]} units={METRIC} />);
    expect(container.innerHTML).toBe("");
  });
});
