// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from "vitest";
import { useState } from "react";
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { FilePicker } from "./file-picker";
import { ATTACHMENT_EXTENSIONS, GAUGE_CSV_EXTENSIONS, GAUGE_CSV_MAX_BYTES, type FileRule } from "@/shared/uploads/file-rules";

afterEach(cleanup);

const CSV_RULE: FileRule = { extensions: GAUGE_CSV_EXTENSIONS, maxBytes: GAUGE_CSV_MAX_BYTES };
const fileOf = (name: string, bytes: number, type = "") => new File([new Uint8Array(bytes)], name, { type });

function Picker({ rule = CSV_RULE, onChoose = () => {} }: { rule?: FileRule; onChoose?: (f: File) => void }) {
  const [file, setFile] = useState<File | null>(null);
  return <FilePicker label="Gauge file" rule={rule} chosen={file} onChoose={(f) => { setFile(f); onChoose(f); }} testId="picker" />;
}
const dropZone = () => screen.getByTestId("picker").closest("label")!;

describe("FilePicker", () => {
  it("states the types and the byte limit of the rule the server applies", () => {
    render(<Picker />);
    expect(screen.getByText(/CSV, up to 256 KB/)).toBeTruthy();
    cleanup();
    render(<Picker rule={{ extensions: ATTACHMENT_EXTENSIONS, maxBytes: 15 * 1024 * 1024 }} />);
    expect(screen.getByText(/JPEG, PNG, PDF or CSV, up to 15 MB/)).toBeTruthy();
    expect(screen.getByTestId("picker").getAttribute("accept")).toContain(".jpeg");
  });

  it("takes a dropped file and shows its name and size", () => {
    const chosen = vi.fn();
    render(<Picker onChoose={chosen} />);
    fireEvent.dragOver(dropZone(), { dataTransfer: { files: [] } });
    expect(dropZone().getAttribute("data-dragging")).toBe("true");
    fireEvent.drop(dropZone(), { dataTransfer: { files: [fileOf("bores.csv", 3 * 1024, "text/csv")] } });
    expect(chosen).toHaveBeenCalledTimes(1);
    expect(screen.getByTestId("picker-chosen").textContent).toBe("bores.csv (3 KB)");
    expect(dropZone().getAttribute("data-dragging")).toBeNull();
  });

  it("takes a file chosen through the input, which is a focusable, labelled control", () => {
    const chosen = vi.fn();
    render(<Picker onChoose={chosen} />);
    const input = screen.getByTestId("picker") as HTMLInputElement;
    input.focus();
    expect(document.activeElement).toBe(input);
    expect(screen.getByLabelText(/Gauge file/)).toBe(input);
    fireEvent.change(input, { target: { files: [fileOf("set two.csv", 1500)] } });
    expect(chosen).toHaveBeenCalledWith(expect.objectContaining({ name: "set two.csv" }));
    expect(screen.getByTestId("picker-chosen").textContent).toBe("set two.csv (1 KB)");
  });

  it("refuses a wrong type, an empty file, an oversize file and several at once, saying why", () => {
    const chosen = vi.fn();
    render(<Picker onChoose={chosen} />);
    const drop = (...files: File[]) => fireEvent.drop(dropZone(), { dataTransfer: { files } });
    drop(fileOf("photo.png", 100, "image/png"));
    expect(screen.getByTestId("picker-problem").textContent).toMatch(/photo\.png is not a CSV file/);
    drop(fileOf("empty.csv", 0));
    expect(screen.getByTestId("picker-problem").textContent).toMatch(/empty/);
    drop(fileOf("huge.csv", GAUGE_CSV_MAX_BYTES + 1));
    expect(screen.getByTestId("picker-problem").textContent).toMatch(/larger than the 256 KB limit/);
    drop(fileOf("a.csv", 10), fileOf("b.csv", 10));
    expect(screen.getByTestId("picker-problem").textContent).toMatch(/one file at a time/);
    expect(chosen).not.toHaveBeenCalled();
    expect(screen.getByTestId("picker").getAttribute("aria-invalid")).toBe("true");
    // A right file clears the refusal.
    drop(fileOf("fine.csv", GAUGE_CSV_MAX_BYTES));
    expect(screen.queryByTestId("picker-problem")).toBeNull();
    expect(chosen).toHaveBeenCalledTimes(1);
  });

  it("ignores a drop while disabled", () => {
    const chosen = vi.fn();
    render(<FilePicker label="Report" rule={CSV_RULE} chosen={null} onChoose={chosen} disabled testId="picker" />);
    fireEvent.drop(dropZone(), { dataTransfer: { files: [fileOf("bores.csv", 10)] } });
    expect(chosen).not.toHaveBeenCalled();
    expect((screen.getByTestId("picker") as HTMLInputElement).disabled).toBe(true);
  });
});
