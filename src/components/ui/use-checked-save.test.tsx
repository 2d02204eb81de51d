// @vitest-environment jsdom
// The three controlled forms that save through useCheckedSave, with stubbed server actions (invented values).
import { afterEach, describe, expect, it, vi } from "vitest";
import { act, cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import type { ActionResult } from "@/shared/action-result";
import { FloorSettingsForm } from "@/components/floor/floor-settings-form";
import { TolerancesForm } from "@/components/jobs/tolerances-form";
import { CustomerEditor } from "@/components/jobs/customer-editor";

const refresh = vi.fn();
vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh }) }));

afterEach(() => {
  cleanup();
  refresh.mockReset();
});

const saved = (message = "Saved.") => vi.fn(async (): Promise<ActionResult<unknown>> => ({ ok: true, message }));
const status = () => screen.getByRole("status");
const type = (label: RegExp, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
const press = (name: RegExp) => fireEvent.click(screen.getByRole("button", { name }));

/** A save that answers only when the test lets it. */
function heldSave() {
  let answer: (result: ActionResult<unknown>) => void = () => {};
  const save = vi.fn(() => new Promise<ActionResult<unknown>>((resolve) => (answer = resolve)));
  return { save, answer: (result: ActionResult<unknown>) => act(async () => answer(result)) };
}

describe("floor settings form", () => {
  const settings = { maxTemperatureDifferenceK: 2, gaugeTemperatureC: null };
  const difference = /warmer than the gauge/;

  it("shows the schema's error under the field and posts nothing", async () => {
    const save = saved();
    render(<FloorSettingsForm settings={settings} canEdit save={save} />);
    type(difference, "40");
    press(/Save floor settings/);
    expect(await screen.findByText("The temperature difference must be 0.5 to 10 K.")).toBeTruthy();
    expect(screen.getByLabelText(difference).getAttribute("aria-invalid")).toBe("true");
    expect(save).not.toHaveBeenCalled();
  });

  it("posts the checked numbers, says Saving… while waiting, then shows the answer and clears the errors", async () => {
    const { save, answer } = heldSave();
    render(<FloorSettingsForm settings={settings} canEdit save={save} />);
    type(difference, "");
    press(/Save floor settings/);
    expect(await screen.findByText("Enter the temperature difference.")).toBeTruthy();
    type(difference, "1.5");
    type(/usual temperature/, "21");
    press(/Save floor settings/);
    expect(save).toHaveBeenCalledWith(null, { maxTemperatureDifferenceK: 1.5, gaugeTemperatureC: 21 });
    expect((await screen.findByRole("button", { name: "Saving…" })).hasAttribute("disabled")).toBe(true);
    await answer({ ok: true, message: "Floor settings saved." });
    expect(status().textContent).toBe("Floor settings saved.");
    expect(screen.queryByText("Enter the temperature difference.")).toBeNull();
    expect(screen.getByRole("button", { name: "Save floor settings" }).hasAttribute("disabled")).toBe(false);
  });

  it("shows the server's refusal and its field errors", async () => {
    const save = vi.fn(async (): Promise<ActionResult<unknown>> => ({ ok: false, message: "Nothing was changed.", fieldErrors: { gaugeTemperatureC: ["Checked again on the server."] } }));
    render(<FloorSettingsForm settings={settings} canEdit save={save} />);
    press(/Save floor settings/);
    expect(await screen.findByText("Checked again on the server.")).toBeTruthy();
    expect(status().textContent).toBe("Nothing was changed.");
  });
});

describe("tolerances form", () => {
  const settings = { taperToleranceUm: 12, outOfRoundToleranceUm: 6, boringMarginUm: 8, boringRzUm: 5, asReceivedCleanupUm: 9, boreAboveStockUm: 120, oversizeStepsUm: [0, 300, 600], readingLevels: ["upper", "lower"] };
  const units = { size: "mm" as const, small: "um" as const };

  it("refuses a step it cannot read before the schema runs, and posts nothing", async () => {
    const save = saved();
    render(<TolerancesForm settings={settings} units={units} canEdit save={save} />);
    type(/Oversize steps/, "0, 0.3, lots");
    press(/Save settings/);
    expect(await screen.findByText('"lots" is not a length. Write a number with mm, in, thou or µm.')).toBeTruthy();
    expect(save).not.toHaveBeenCalled();
  });

  it("refuses what the shared schema refuses (one level) with the schema's message", async () => {
    const save = saved();
    render(<TolerancesForm settings={settings} units={units} canEdit save={save} />);
    type(/Reading levels/, "upper");
    press(/Save settings/);
    expect(await screen.findByText("Measure at least two levels (top and bottom).")).toBeTruthy();
    expect(save).not.toHaveBeenCalled();
  });

  it("names the step that is wrong once", async () => {
    render(<TolerancesForm settings={settings} units={units} canEdit save={saved()} />);
    type(/Oversize steps/, "0, -0.3");
    press(/Save settings/);
    expect(await screen.findByText('"-0.3": A length cannot be negative.')).toBeTruthy();
  });

  it("posts the settings as µm and names, and shows the answer", async () => {
    const save = saved("Settings saved.");
    render(<TolerancesForm settings={settings} units={units} canEdit save={save} />);
    type(/Oversize steps/, "0, 0.3, 0.6, 0.9");
    press(/Save settings/);
    await waitFor(() => expect(status().textContent).toBe("Settings saved."));
    expect(save).toHaveBeenCalledWith(null, { ...settings, oversizeStepsUm: [0, 300, 600, 900] });
  });
});

describe("customer editor", () => {
  const customer = { id: "cust-1", name: "Demo Customer", email: null, phone: null, notes: null, unitSystem: null, archived: false };
  const stubs = () => ({ update: saved("Customer saved."), setArchived: saved("Customer archived.") });

  it("shows the schema's error under the e-mail field and posts nothing", async () => {
    const actions = stubs();
    render(<CustomerEditor customer={customer} canEdit actions={actions} />);
    type(/E-mail/, "not an address");
    press(/^Save$/);
    expect(await screen.findByText("That is not an e-mail address.")).toBeTruthy();
    expect(actions.update).not.toHaveBeenCalled();
    expect(refresh).not.toHaveBeenCalled();
  });

  it("posts the checked customer with its id, shows the answer and refreshes the page", async () => {
    const actions = stubs();
    render(<CustomerEditor customer={customer} canEdit actions={actions} />);
    type(/E-mail/, "  orders@example.test ");
    type(/Phone/, "+1 555 0100");
    press(/^Save$/);
    await waitFor(() => expect(status().textContent).toBe("Customer saved."));
    expect(actions.update).toHaveBeenCalledWith(null, { name: "Demo Customer", email: "orders@example.test", phone: "+1 555 0100", notes: null, unitSystem: null, customerId: "cust-1" });
    expect(refresh).toHaveBeenCalledTimes(1);
  });

  it("archives into the same status line, keeping the field errors shown", async () => {
    const actions = stubs();
    render(<CustomerEditor customer={customer} canEdit actions={actions} />);
    type(/Phone/, "call me");
    press(/^Save$/);
    expect(await screen.findByText(/Use digits, spaces/)).toBeTruthy();
    press(/Archive/);
    await waitFor(() => expect(status().textContent).toBe("Customer archived."));
    expect(actions.setArchived).toHaveBeenCalledWith(null, { customerId: "cust-1", archived: true });
    expect(screen.getByText(/Use digits, spaces/)).toBeTruthy();
    expect(refresh).toHaveBeenCalledTimes(1);
  });
});
