// @vitest-environment jsdom
import { useState } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { LengthInput } from "./length-input";
import { lengthText } from "./length-text";

afterEach(cleanup);

const type = (value: string) => fireEvent.change(screen.getByTestId("len"), { target: { value } });
const input = () => screen.getByTestId("len") as HTMLInputElement;

/** A parent that keeps the value, as the forms do, and can push a value from outside (a restored draft). */
function Holder({ onValue, outside }: { onValue: (v: number | null) => void; outside?: number }) {
  const [um, setUm] = useState<number | null>(92_000);
  return (
    <>
      <LengthInput label="Bore" unit="mm" valueUm={um} onChange={(v) => { setUm(v); onValue(v); }} testId="len" />
      <button type="button" onClick={() => setUm(outside ?? null)}>outside</button>
    </>
  );
}

describe("LengthInput", () => {
  it("reads a bare number in the user's unit and shows that unit beside the field", () => {
    const onChange = vi.fn();
    render(<LengthInput label="Stone length" unit="in" valueUm={null} onChange={onChange} testId="len" />);
    expect(screen.getByTestId("len-unit").textContent).toBe("in");
    expect(screen.getByText("A bare number is in inches; or type the unit (mm, in, thou, µm).")).toBeTruthy();
    type("4");
    expect(onChange).toHaveBeenLastCalledWith(101_600); // 1 in = 25.4 mm exactly [V S24]
    type("100 mm");
    expect(onChange).toHaveBeenLastCalledWith(100_000);
    expect(screen.getByLabelText("Stone length")).toBe(input());
  });

  it("empty is null (with a reason unless optional); text that is not a length is NaN with its reason", () => {
    const onChange = vi.fn();
    render(<LengthInput label="Bore" unit="mm" valueUm={92_000} onChange={onChange} testId="len" />);
    type("");
    expect(onChange).toHaveBeenLastCalledWith(null);
    expect(screen.getByText(/Enter a length/)).toBeTruthy();
    type("92,01");
    expect(onChange.mock.lastCall![0]).toBeNaN();
    expect(screen.getByText(/Use a point for decimals/)).toBeTruthy();
    expect(input().getAttribute("aria-invalid")).toBe("true");
    cleanup();
    render(<LengthInput label="Room below" unit="mm" valueUm={5_000} optional onChange={onChange} testId="len" />);
    type("");
    expect(onChange).toHaveBeenLastCalledWith(null);
    expect(input().getAttribute("aria-invalid")).toBeNull();
  });

  it("follows a value changed from outside without fighting what is being typed", () => {
    const onValue = vi.fn();
    render(<Holder onValue={onValue} outside={93_920} />);
    expect(input().value).toBe("92");
    type("92.");
    expect(onValue).toHaveBeenLastCalledWith(92_000);
    expect(input().value).toBe("92."); // 92. and 92 are the same length: the typing stays
    type("3.6 in");
    expect(input().value).toBe("3.6 in");
    expect(screen.getByText("= 91.440 mm")).toBeTruthy();
    fireEvent.click(screen.getByText("outside"));
    expect(input().value).toBe("93.92");
  });

  it("writes the shortest text that reads back as the stored length to 0.1 µm", () => {
    expect(lengthText(100_000, "mm")).toBe("100");
    expect(lengthText(100_000, "in")).toBe("3.937008");
    expect(lengthText(101_600, "in")).toBe("4");
    expect(lengthText(12.5, "um")).toBe("12.5");
    expect(lengthText(25.4, "thou")).toBe("1");
    expect(lengthText(null, "mm")).toBe("");
    expect(lengthText(Number.NaN, "mm")).toBe("");
  });
});
