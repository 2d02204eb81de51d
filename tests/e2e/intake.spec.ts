// Issue 5 end to end: a machinist books in a six-cylinder block, types a full reading grid with the
// keyboard (taper and out-of-round update live), imports a CSV for another cylinder, attaches a photo
// and sees the proposed oversize. Screens at 1366 and 820 px go to test-results/screens/jobs.
import path from "node:path";
import { expect, test } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { shoot } from "./pages/screens";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";

const SHOTS = "test-results/screens/jobs";
const POLISH = "test-results/screens/polish";
const PASSWORD = "intake bench e2e 5";
const FIXTURES = path.resolve("tests/fixtures/uploads");

let setup: TestShopResult<"intake">;

test.beforeAll(() => {
  setup = setUpTestShop("intake", PASSWORD);
});

test("a machinist books in a six-cylinder block and measures it", async ({ page }) => {
  await signIn(page, setup.machinistEmail, PASSWORD);
  await shoot(page, SHOTS, "01-dashboard");
  await page.goto("/jobs");
  await expect(page.getByTestId("jobs-table")).toBeVisible();
  await shoot(page, SHOTS, "02-job-list");

  await page.getByTestId("new-job").click();
  const form = page.getByTestId("job-form");
  await form.getByTestId("job-customer-name").fill("Moorland Hillclimb Team (e2e)");
  await form.getByTestId("job-engine").fill("inline six, 3.4 L, grey-iron block");
  await form.getByTestId("job-cylinders").fill("6");
  await form.getByTestId("job-standard-bore").fill("92");
  await form.getByTestId("job-bore-length").fill("5.43 in");
  await expect(form.getByText("= 137.922 mm")).toBeVisible();
  await shoot(page, SHOTS, "03-new-job");
  await form.getByTestId("job-save").click();

  await expect(page.getByTestId("job-title")).toContainText("Moorland Hillclimb Team (e2e)");
  await expect(page.getByTestId("cylinder-6")).toBeVisible();
  await shoot(page, SHOTS, "04-job-empty");

  // Cylinder 1 as a keyboard-wedge gauge types it (issue 17 §5): Enter on "Enter readings" puts focus
  // in the first cell, then value + Enter six times in the measuring order (top A, top B, middle A, …).
  await page.getByTestId("enter-readings-1").focus();
  await page.keyboard.press("Enter");
  const grid = page.getByTestId("reading-form-1");
  await expect(grid.getByTestId("grid-top-A")).toBeFocused();
  for (const value of ["92.031", "92.028", "92.024", "92.021", "92.012", "92.010"]) {
    await page.keyboard.type(value);
    await page.keyboard.press("Enter");
  }
  await expect(grid.getByTestId("grid-middle-A")).toHaveValue("92.024");
  await expect(grid.getByTestId("grid-bottom-B")).toHaveValue("92.010");
  // The last Enter lands on Save, it does not submit by surprise.
  await expect(grid.getByTestId("reading-save")).toBeFocused();
  await expect(page.getByTestId("set-1")).toHaveCount(0);
  // Taper A = 92.031 − 92.012 = 19 µm, over the 10 µm default; out-of-round worst 3 µm at the top [D].
  await expect(grid.getByTestId("grid-taper-A")).toContainText("19.0 µm");
  await expect(grid.getByTestId("grid-taper-A")).toHaveAttribute("data-over", "true");
  await expect(grid.getByTestId("grid-oor")).toContainText("3.0 µm");
  await expect(grid.getByTestId("grid-oor")).toHaveAttribute("data-over", "false");
  await shoot(page, SHOTS, "05-reading-grid");
  await page.keyboard.press("Enter");
  await expect(page.getByTestId("set-1")).toBeVisible();
  await expect(page.getByTestId("enter-readings-1")).toBeFocused();
  await expect(page.getByTestId("summary-row-1")).toContainText("19.0 µm");

  // Cylinder 2 from a gauge CSV: preview, then write.
  const csv = page.getByTestId("csv-import");
  await csv.getByTestId("csv-file").setInputFiles(path.join(FIXTURES, "gauge-cylinder-2.csv"));
  await csv.getByTestId("csv-preview").click();
  await expect(csv.getByTestId("csv-preview-table")).toContainText("14.0 µm");
  await shoot(page, SHOTS, "06-csv-preview");
  await csv.getByTestId("csv-commit").click();
  await expect(csv.getByText("Wrote 1 reading set.")).toBeVisible();
  await expect(page.getByTestId("set-2")).toBeVisible();

  // A file with bad rows writes nothing and lists each line.
  await csv.getByTestId("csv-file").setInputFiles(path.join(FIXTURES, "gauge-bad-rows.csv"));
  await csv.getByTestId("csv-preview").click();
  await expect(csv.getByTestId("csv-problems")).toContainText("Line 3: cylinder \"9\" is not 1–6");
  await shoot(page, SHOTS, "07-csv-bad-rows");

  // A photo of bore 1: in the job's list and on cylinder 1's card.
  const files = page.getByTestId("attachments");
  await files.getByTestId("attachment-file").setInputFiles(path.join(FIXTURES, "bore-photo.jpg"));
  await files.getByTestId("attachment-target").selectOption({ label: "Cylinder 1" });
  await files.getByTestId("attachment-upload").click();
  await expect(files.getByText("bore-photo.jpg attached.")).toBeVisible();
  await expect(files.getByRole("img", { name: /Photo: bore-photo\.jpg/ })).toBeVisible();
  await expect(page.getByTestId("cylinder-attachments-1").getByRole("img", { name: /Photo: bore-photo\.jpg/ })).toBeVisible();
  await expect(page.getByTestId("cylinder-attachments-2")).toHaveCount(0);
  await page.getByTestId("cylinder-1").scrollIntoViewIfNeeded();
  await shoot(page, POLISH, "01-cylinder-attachment");
  // A PNG renamed .pdf is refused with the reason.
  await files.getByTestId("attachment-file").setInputFiles({ name: "report.pdf", mimeType: "application/pdf", buffer: await import("node:fs").then((fs) => fs.readFileSync(path.join(FIXTURES, "bore-photo.png"))) });
  await files.getByTestId("attachment-upload").click();
  await expect(files.getByText("named .pdf but its content is a PNG image")).toBeVisible();

  // The worst reading is 92.034 mm (cylinder 2): +0.25 mm cleans it up with the 50 µm allowance [D].
  await expect(page.getByTestId("worst-bore")).toContainText("cylinder 2");
  await expect(page.getByTestId("proposed-oversize")).toContainText("+0.25 mm oversize");
  await expect(page.getByTestId("proposed-oversize")).toContainText("92.250 mm");
  await shoot(page, SHOTS, "08-job-measured");
});

test("the demo job, the customers list and the tolerance settings", async ({ page }) => {
  await signIn(page, setup.machinistEmail, PASSWORD);
  await page.goto(`/jobs/${setup.demoJobId}`);
  await expect(page.getByTestId("clearance-matrix")).toBeVisible();
  await page.getByTestId("piston-diameter").fill("3.6299 in");
  await shoot(page, SHOTS, "09-demo-job");

  // Edit piston 3 in place: the add form turns into its editor, and the table updates without a reload.
  await page.evaluate(() => Object.assign(window, { e2eSamePage: true }));
  await page.getByRole("button", { name: "Edit piston 3" }).click();
  const pistonForm = page.getByTestId("piston-form");
  await expect(pistonForm).toHaveAttribute("data-mode", "edit");
  await expect(pistonForm.getByTestId("piston-diameter")).toHaveValue("92.204");
  await pistonForm.getByTestId("piston-diameter").fill("92.207");
  await shoot(page, POLISH, "02-piston-edit");
  await pistonForm.getByTestId("piston-save").click();
  await expect(page.getByText("Piston 3 saved.")).toBeVisible();
  await expect(page.getByTestId("piston-row-3")).toContainText("92.207 mm");
  await expect(page.getByTestId("piston-form")).toHaveAttribute("data-mode", "add");
  expect(await page.evaluate(() => (window as unknown as { e2eSamePage?: boolean }).e2eSamePage)).toBe(true);

  await page.goto("/customers");
  await expect(page.getByText("Ridgeway Vintage Tractors (demo)")).toBeVisible();
  await shoot(page, SHOTS, "10-customers");
  await page.getByText("Ridgeway Vintage Tractors (demo)").click();
  await expect(page.getByRole("heading", { name: /Ridgeway/ })).toBeVisible();
  await shoot(page, SHOTS, "11-customer");
  await page.goto("/settings/tolerances");
  await expect(page.getByTestId("tolerances-form")).toBeVisible();
  await shoot(page, SHOTS, "12-tolerances");
});

test("an apprentice sees the job but may enter only final and checkpoint readings on assigned cylinders", async ({ page }) => {
  await signIn(page, setup.apprenticeEmail, PASSWORD);
  await page.goto(`/jobs/${setup.demoJobId}`);
  await expect(page.getByTestId("job-workspace")).toBeVisible();
  await expect(page.getByTestId("enter-readings-1")).toHaveCount(0);
  await expect(page.getByTestId("enter-readings-5")).toBeVisible();
  await expect(page.getByTestId("piston-form")).toHaveCount(0);
  await page.getByTestId("enter-readings-5").click();
  await expect(page.getByTestId("reading-kind").locator("option")).toHaveText(["Checkpoint", "Final"]);
  await shoot(page, SHOTS, "13-apprentice-job");
  await page.goto("/jobs/new");
  await expect(page.getByText("Only a machinist or above books jobs in.")).toBeVisible();
});
