// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from "vitest";
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { ReadingGrid } from "./reading-grid";

const props = {
  levelNames: ["top", "middle", "bottom"],
  units: { size: "mm" as const, small: "um" as const },
  tolerances: { taperToleranceUm: 10, outOfRoundToleranceUm: 5 },
  idPrefix: "t",
};

afterEach(cleanup);

describe("ReadingGrid", () => {
  it("puts the inputs in DOM order down the A column, then down the B column (Tab order)", () => {
    render(<ReadingGrid {...props} onChange={() => {}} />);
    const order = Array.from(document.querySelectorAll("input[data-grid-cell]")).map((i) => i.getAttribute("data-testid"));
    expect(order).toEqual(["grid-top-A", "grid-middle-A", "grid-bottom-A", "grid-top-B", "grid-middle-B", "grid-bottom-B"]);
  });

  it("computes taper and out-of-round live and marks what breaks the tolerance", () => {
    const onChange = vi.fn();
    render(<ReadingGrid {...props} onChange={onChange} />);
    const type = (id: string, v: string) => fireEvent.change(screen.getByTestId(id), { target: { value: v } });
    type("grid-top-A", "92.031");
    type("grid-middle-A", "92.024");
    expect(screen.getByTestId("grid-taper-A").textContent).toContain("7.0 µm");
    type("grid-bottom-A", "92.012");
    // 92.031 − 92.012 = 19 µm > 10 µm (the default finished-bore tolerance, common practice) [D].
    expect(screen.getByTestId("grid-taper-A").textContent).toContain("19.0 µm");
    expect(screen.getByTestId("grid-taper-A").getAttribute("data-over")).toBe("true");
    type("grid-top-B", "3.6244 in"); // 92.05976 mm: a unit on one cell is fine
    expect(screen.getByTestId("grid-oor-0").textContent).toContain("28.8 µm");
    expect(screen.getByTestId("grid-oor-0").getAttribute("data-over")).toBe("true");
    type("grid-middle-B", "92,02");
    expect(screen.getByText(/Use a point for decimals/)).toBeTruthy();
    const last = onChange.mock.calls.at(-1)![0];
    expect(last[0]).toEqual({ name: "top", aUm: 92_031, bUm: 92_059.76 });
    expect(last[1].bUm).toBeNull();
  });
});
