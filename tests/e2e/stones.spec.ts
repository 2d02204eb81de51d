// Issue 6 end to end: the lead edits a rate row with a reason and sees it in the history; an
// apprentice sees the stone library read-only. Screens at 1366 and 820 px go to test-results/screens/stones.
import { expect, test } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { shoot } from "./pages/screens";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";

const SHOTS = "test-results/screens/stones";
const POLISH = "test-results/screens/polish";
const PASSWORD = "stone table e2e bench 7";

let setup: TestShopResult<"stones">;

test.beforeAll(() => {
  setup = setUpTestShop("stones", PASSWORD);
});

test("the lead edits a rate row with a reason and sees it in the history", async ({ page }) => {
  await signIn(page, setup.leadEmail, PASSWORD);
  await page.goto("/stones");
  await expect(page.getByTestId("stone-row")).toHaveCount(4);
  await shoot(page, SHOTS, "01-library-lead");

  await page.getByRole("link", { name: "DF-400" }).click();
  await expect(page.getByTestId("stone-code")).toHaveText("DF-400");
  await shoot(page, SHOTS, "02-stone-lead");

  const greyIron = page.locator('[data-testid="rate-row"][data-material="grey_iron"]');
  await expect(greyIron.getByTestId("rate-removal")).toHaveText("0.45");
  await greyIron.getByTestId("edit-rate").click();
  const form = page.getByTestId("rate-form");
  await form.getByLabel("Removal per double stroke").fill("0.52");
  await form.getByTestId("rate-form-submit").click();
  await expect(form.getByText("Say why you are making this change")).toBeVisible();
  await expect(form.getByLabel("Removal per double stroke")).toHaveValue("0.52");
  await shoot(page, SHOTS, "03-rate-edit-needs-reason");

  await form.getByLabel("Reason for the change (required)").fill("Six demo blocks took fewer strokes than planned");
  await form.getByTestId("rate-form-submit").click();
  await expect(page.getByText("Rate row saved as a new version.")).toBeVisible();
  await expect(greyIron.getByTestId("rate-removal")).toHaveText("0.52");
  const latest = page.getByTestId("history-entry").first();
  await expect(latest).toContainText("Six demo blocks took fewer strokes than planned");
  await expect(latest).toContainText("E2E lead");
  await expect(latest).toContainText("0.45 µm → 0.52 µm");
  await shoot(page, SHOTS, "04-history-after-edit");

  await latest.getByTestId("view-version").click();
  await expect(page.getByText("This is the current version.")).toBeVisible();
  await expect(page.getByTestId("restore-form")).toHaveCount(0);
  await page.goBack();
  // Restore the original figure: a new version 3 with its own reason.
  await page.getByTestId("history-entry").filter({ hasText: "Rate row · Grey cast iron" }).filter({ hasText: "v1" }).getByTestId("view-version").click();
  await expect(page.getByTestId("version-values")).toBeVisible();
  await shoot(page, SHOTS, "05-version");
  await page.getByTestId("restore-form").getByLabel("Why restore it? (required)").fill("Back to the data-sheet figure until more blocks are logged");
  await page.getByTestId("restore-form-submit").click();
  await expect(page.getByText("Version restored as a new version.")).toBeVisible();
  await expect(greyIron.getByTestId("rate-removal")).toHaveText("0.45");
  await expect(page.getByTestId("history-entry").first()).toContainText("Restored version 1");

  await page.goto("/stones/new");
  const stoneForm = page.getByTestId("stone-form");
  await stoneForm.getByLabel("Grit (scale and number)").fill("400");
  await stoneForm.getByTestId("stone-form-submit").click();
  await expect(stoneForm.getByText(/has no scale/)).toBeVisible();
  await shoot(page, SHOTS, "06-new-stone-bare-grit");

  await page.goto("/machines");
  await expect(page.getByTestId("machine-card")).toHaveCount(2);
  await shoot(page, SHOTS, "07-machines-lead");
  await page.getByRole("link", { name: /Edit Bay 1/ }).click();
  await expect(page.getByTestId("machine-form")).toBeVisible();
  await shoot(page, SHOTS, "08-machine-edit");
});

test("an apprentice sees the stone table read-only", async ({ page }) => {
  await signIn(page, setup.apprenticeEmail, PASSWORD);
  await page.goto("/stones");
  await expect(page.getByText("Read only")).toBeVisible();
  await expect(page.getByTestId("add-stone")).toHaveCount(0);
  await shoot(page, SHOTS, "09-library-apprentice");

  await page.getByRole("link", { name: "DC-150" }).click();
  await expect(page.getByTestId("rate-table")).toBeVisible();
  await expect(page.getByTestId("rate-row")).toHaveCount(2);
  await expect(page.getByTestId("edit-rate")).toHaveCount(0);
  await expect(page.getByTestId("edit-stone")).toHaveCount(0);
  await expect(page.getByTestId("history-entry").first()).toBeVisible();
  await shoot(page, SHOTS, "10-stone-apprentice");

  // Typing an edit address does not open the form.
  const stoneUrl = page.url();
  await page.goto(`${new URL(stoneUrl).pathname}/edit`);
  await expect(page).toHaveURL(/\/stones$/);
  await page.goto("/machines");
  await expect(page.getByTestId("add-machine")).toHaveCount(0);
});

test("an inch user reads and writes the library in inches", async ({ page }) => {
  await signIn(page, setup.ownerEmail, PASSWORD);
  await page.goto("/stones");
  // 100 mm × 6 mm stones, 8 mm start height = 3.94 in × 0.236 in, 0.3150 in (1 in = 25.4 mm exactly [V S24]).
  const row = page.getByTestId("stone-row").filter({ hasText: "DF-400" });
  await expect(row).toContainText("3.94 in × 0.236 in");
  await shoot(page, POLISH, "03-library-inch");
  await row.getByRole("link", { name: "DF-400" }).click();
  await expect(page.getByText("start 0.3150 in · wear limit 0.0787 in")).toBeVisible();
  await expect(page.locator('[data-testid="rate-row"][data-material="grey_iron"]').getByTestId("rate-bore-length")).toHaveText("5.51 in");
  await expect(page.locator('[data-testid="rate-row"][data-material="grey_iron"]').getByTestId("rate-removal")).toHaveText("0.45");
  await shoot(page, POLISH, "04-stone-inch");

  await page.getByTestId("edit-stone").click();
  const stoneForm = page.getByTestId("stone-form");
  await expect(stoneForm.getByTestId("field-stoneLengthUm")).toHaveValue("3.937008");
  await expect(stoneForm.getByTestId("field-stoneLengthUm-unit")).toHaveText("in");
  await stoneForm.getByTestId("field-currentHeightUm").fill("0.25");
  await stoneForm.getByLabel("Reason for the change (required)").fill("Measured the set in inches");
  await shoot(page, POLISH, "05-stone-edit-inch");
  await stoneForm.getByTestId("stone-form-submit").click();
  await expect(page.getByText("Saved as a new version.")).toBeVisible();
  // 0.25 in = 6.35 mm; the history shows the change in the reader's unit.
  await expect(page.getByTestId("history-entry").first()).toContainText("Current height: 0.1181 in → 0.2500 in");

  await page.goto("/machines");
  const bay2 = page.getByTestId("machine-card").filter({ hasText: "Bay 2" });
  await expect(bay2).toContainText("7.09 in");
  await bay2.getByRole("link", { name: /Edit Bay 2/ }).click();
  const machineForm = page.getByTestId("machine-form");
  await expect(machineForm.getByTestId("field-maxStrokeLengthUm")).toHaveValue("7.086614");
  await machineForm.getByTestId("field-maxStrokeLengthUm").fill("7");
  await shoot(page, POLISH, "06-machine-edit-inch");
  await machineForm.getByTestId("machine-form-submit").click();
  await expect(machineForm.getByText("Machine saved.")).toBeVisible();
  await page.goto("/machines");
  await expect(page.getByTestId("machine-card").filter({ hasText: "Bay 2" })).toContainText("7.00 in");
  await shoot(page, POLISH, "07-machines-inch");
});
