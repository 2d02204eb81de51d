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
  it("puts the inputs in the measuring order: top A, top B, middle A, … (Tab order)", () => {
    render(<ReadingGrid {...props} onChange={() => {}} />);
    const order = Array.from(document.querySelectorAll("input[data-grid-cell]")).map((i) => i.getAttribute("data-testid"));
    expect(order).toEqual(["grid-top-A", "grid-top-B", "grid-middle-A", "grid-middle-B", "grid-bottom-A", "grid-bottom-B"]);
  });

  it("moves on with Enter in the measuring order, the last Enter to the save button without submitting", () => {
    const submit = vi.fn((e: { preventDefault: () => void }) => e.preventDefault());
    render(<form onSubmit={submit}><ReadingGrid {...props} autoFocus onChange={() => {}} /><button type="submit">Save</button></form>);
    const visited: (string | null)[] = [];
    for (let i = 0; i < 6; i++) {
      const active = document.activeElement as HTMLInputElement;
      visited.push(active.getAttribute("data-testid"));
      fireEvent.change(active, { target: { value: "92.03" } });
      fireEvent.keyDown(active, { key: "Enter" });
    }
    expect(visited).toEqual(["grid-top-A", "grid-top-B", "grid-middle-A", "grid-middle-B", "grid-bottom-A", "grid-bottom-B"]);
    expect(document.activeElement).toBe(screen.getByRole("button", { name: "Save" }));
    expect(submit).not.toHaveBeenCalled();
  });

  it("shows a cell's error only after it is left, and drops the error and the red border once fixed", () => {
    render(<ReadingGrid {...props} onChange={() => {}} />);
    const cell = screen.getByTestId("grid-top-A");
    fireEvent.change(cell, { target: { value: "2.8 thou" } });
    expect(screen.queryByText(/must be between 20 mm and 400 mm/)).toBeNull();
    expect(screen.getByTestId("grid-taper-A").textContent).toContain("—");
    fireEvent.blur(cell);
    expect(screen.getByText("The reading in direction A must be between 20 mm and 400 mm.")).toBeTruthy();
    expect(cell.className).toContain("border-stop");
    fireEvent.change(cell, { target: { value: "92.031" } });
    expect(screen.queryByText(/must be between/)).toBeNull();
    expect(cell.className).not.toContain("border-stop");
    expect(cell.getAttribute("aria-invalid")).toBeNull();
  });

  it("clears the server's refusal of a cell when that cell is edited", () => {
    render(<ReadingGrid {...props} errors={{ "levels.0.aUm": ["Refused by the server."] }} onChange={() => {}} />);
    expect(screen.getByText("Refused by the server.")).toBeTruthy();
    fireEvent.change(screen.getByTestId("grid-top-A"), { target: { value: "92.031" } });
    expect(screen.queryByText("Refused by the server.")).toBeNull();
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
    fireEvent.blur(screen.getByTestId("grid-middle-B"));
    expect(screen.getByText(/Use a point for decimals/)).toBeTruthy();
    const last = onChange.mock.calls.at(-1)![0];
    expect(last[0]).toEqual({ name: "top", aUm: 92_031, bUm: 92_059.76 });
    expect(last[1].bUm).toBeNull();
  });
});
