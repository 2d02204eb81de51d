// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from "vitest";
import { useState } from "react";
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { Confirm } from "./confirm";

afterEach(cleanup);

function Asking({ onYes = () => {} }: { onYes?: () => void }) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <button type="button" onClick={() => setOpen(true)}>Remove</button>
      {open ? <Confirm question="Remove Sam?" consequence="Sam loses access." yes="Yes, remove" danger onYes={() => { setOpen(false); onYes(); }} onNo={() => setOpen(false)} testId="ask" /> : null}
    </>
  );
}

describe("Confirm", () => {
  it("takes focus on its first button when opened and gives it back to the opener on Cancel", () => {
    render(<Asking />);
    const opener = screen.getByRole("button", { name: "Remove" });
    opener.focus();
    fireEvent.click(opener);
    expect(document.activeElement).toBe(screen.getByTestId("ask-yes"));
    expect(screen.getByRole("alertdialog", { name: "Remove Sam?" }).getAttribute("aria-describedby")).toBe("ask-c");
    fireEvent.click(screen.getByTestId("ask-no"));
    expect(screen.queryByRole("alertdialog")).toBeNull();
    expect(document.activeElement).toBe(opener);
  });

  it("answers no on Escape and yes only on its button", () => {
    const yes = vi.fn();
    render(<Asking onYes={yes} />);
    const opener = screen.getByRole("button", { name: "Remove" });
    opener.focus();
    fireEvent.click(opener);
    fireEvent.keyDown(screen.getByTestId("ask-yes"), { key: "Escape" });
    expect(screen.queryByRole("alertdialog")).toBeNull();
    expect(yes).not.toHaveBeenCalled();
    expect(document.activeElement).toBe(opener);
    fireEvent.click(opener);
    fireEvent.click(screen.getByTestId("ask-yes"));
    expect(yes).toHaveBeenCalledTimes(1);
    expect(document.activeElement).toBe(opener);
  });
});
