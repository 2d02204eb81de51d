// @vitest-environment jsdom
// The job page's piston editing and per-cylinder attachments, with a hand-made detail (invented values).
import { afterEach, describe, expect, it, vi } from "vitest";
import { cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import type { JobDetail } from "@/server/jobs/detail";
import { PistonsPanel } from "./pistons-panel";
import { CylinderCard } from "./cylinder-card";
import { JobActionsProvider, type JobActions } from "./job-actions";

afterEach(() => {
  cleanup();
});

const piston = (id: string, label: string, diameterUm: number) => ({
  id, cylinderId: null, label, diameterUm, sizingHeightUm: 12_700, type: "cast" as const, clearanceMinUm: 40, clearanceMaxUm: 60, notes: "Kept by an edit",
});

function detail(overrides: Partial<Record<keyof JobDetail, unknown>> = {}): JobDetail {
  return {
    job: { id: "job-1" },
    cylinders: [{ id: "cyl-1", number: 1, assignedUserId: null }, { id: "cyl-2", number: 2, assignedUserId: null }],
    readingSets: [],
    pistons: [piston("p-1", "1", 92_200), piston("p-2", "2", 92_205)],
    attachments: [],
    settings: { taperToleranceUm: 10, outOfRoundToleranceUm: 5 },
    unitSystem: "metric",
    units: { size: "mm", small: "um" },
    members: [],
    summary: { cylinders: [], pairing: null },
    permissions: { editJob: false, editPistons: true, upload: true, deleteReadings: false, readingKindsByCylinder: {} },
    ...overrides,
  } as unknown as JobDetail;
}

/** Every job action answering success, each a mock to inspect. */
function stubActions() {
  const ok = () => vi.fn(async () => ({ ok: true as const, data: { id: "p-2" } }));
  const actions = {
    createJob: ok(), updateJob: ok(), setJobStatus: ok(), setJobArchived: ok(), assignCylinder: ok(), createPiston: ok(), updatePiston: ok(),
    deletePiston: ok(), createReadingSet: ok(), deleteReadingSet: ok(), deleteAttachment: ok(),
  };
  return actions;
}
const renderWith = (actions: ReturnType<typeof stubActions>, ui: React.ReactElement) => render(<JobActionsProvider actions={actions as unknown as JobActions}>{ui}</JobActionsProvider>);

describe("editing a piston on the job page", () => {
  it("opens the add form filled with the piston, saves it through the update action (notes kept) and hands back to the list", async () => {
    const actions = stubActions();
    const onChanged = vi.fn();
    renderWith(actions, <PistonsPanel detail={detail()} onChanged={onChanged} />);
    fireEvent.click(screen.getByRole("button", { name: "Edit piston 2" }));
    const form = screen.getByTestId("piston-form");
    expect(form.getAttribute("data-mode")).toBe("edit");
    expect((screen.getByTestId("piston-diameter") as HTMLInputElement).value).toBe("92.205");
    expect((screen.getByTestId("piston-label") as HTMLInputElement).value).toBe("2");
    fireEvent.change(screen.getByTestId("piston-diameter"), { target: { value: "92.212" } });
    fireEvent.click(screen.getByTestId("piston-save"));
    await waitFor(() => expect(onChanged).toHaveBeenCalled());
    expect(actions.createPiston).not.toHaveBeenCalled();
    expect(actions.updatePiston).toHaveBeenCalledWith(null, {
      jobId: "job-1", pistonId: "p-2", input: expect.objectContaining({ label: "2", diameterUm: 92_212, notes: "Kept by an edit", cylinderId: null }),
    });
    expect(screen.getByTestId("piston-form").getAttribute("data-mode")).toBe("add");
    expect(screen.getByText("Piston 2 saved.")).toBeTruthy();
  });

  it("checks an edit with the same schema before sending anything; Cancel goes back to adding", () => {
    const actions = stubActions();
    renderWith(actions, <PistonsPanel detail={detail()} onChanged={() => {}} />);
    fireEvent.click(screen.getByRole("button", { name: "Edit piston 1" }));
    fireEvent.change(screen.getByTestId("piston-cmax"), { target: { value: "30" } });
    fireEvent.click(screen.getByTestId("piston-save"));
    expect(screen.getByText("The largest clearance is smaller than the smallest.")).toBeTruthy();
    expect(actions.updatePiston).not.toHaveBeenCalled();
    fireEvent.click(screen.getByTestId("piston-cancel"));
    expect(screen.getByTestId("piston-form").getAttribute("data-mode")).toBe("add");
  });
});

describe("attachments on a cylinder card", () => {
  it("lists the cylinder's own attachments with their thumbnails, not the job's or another cylinder's", () => {
    const file = (id: string, cylinderId: string | null, kind: "photo" | "report", hasThumbnail: boolean) => ({
      id, cylinderId, kind, displayName: `${id}.${kind === "photo" ? "jpg" : "pdf"}`, contentType: "", sizeBytes: 20_000, hasThumbnail, createdAt: "2030-01-01T00:00:00.000Z", uploadedByName: null,
    });
    const d = detail({ attachments: [file("bore-1", "cyl-1", "photo", true), file("finish-1", "cyl-1", "report", false), file("bore-2", "cyl-2", "photo", true), file("block", null, "photo", true)] });
    renderWith(stubActions(), <CylinderCard detail={d} cylinder={d.cylinders[0]!} onChanged={() => {}} />);
    const list = within(screen.getByTestId("cylinder-attachments-1"));
    expect(list.getAllByTestId("attachment-tile")).toHaveLength(2);
    expect(list.getByRole("img", { name: "Photo: bore-1.jpg" }).getAttribute("src")).toBe("/api/attachments/bore-1/thumbnail");
    expect(list.getByText("finish-1.pdf")).toBeTruthy();
    expect(list.queryByText("bore-2.jpg")).toBeNull();
    expect(list.queryByText("block.jpg")).toBeNull();
  });

  it("shows no attachment section on a cylinder without files", () => {
    const d = detail();
    renderWith(stubActions(), <CylinderCard detail={d} cylinder={d.cylinders[1]!} onChanged={() => {}} />);
    expect(screen.queryByTestId("cylinder-attachments-2")).toBeNull();
  });
});
