// The controlled forms that save through useCheckedSave, in the browser: a value the shared schema
// refuses shows its message under the field and changes nothing; a good one is saved and kept after a
// reload. Screens at 1366 and 820 px go to test-results/screens/checked-save.
import { expect, test } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { shoot } from "./pages/screens";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";

const SHOTS = "test-results/screens/checked-save";
const PASSWORD = "checked save e2e 15";

let setup: TestShopResult<"settings">;

test.beforeAll(() => {
  setup = setUpTestShop("settings", PASSWORD);
});

test("the owner's tolerances and floor settings: refused without a change, then saved and kept", async ({ page }) => {
  await signIn(page, setup.ownerEmail, PASSWORD);
  await page.goto("/settings/tolerances");
  const floor = page.getByTestId("floor-settings-form");
  const difference = floor.getByLabel(/warmer than the gauge/);
  await difference.fill("40");
  await floor.getByRole("button", { name: "Save floor settings" }).click();
  await expect(floor.getByText("The temperature difference must be 0.5 to 10 K.")).toBeVisible();
  await expect(difference).toHaveAttribute("aria-invalid", "true");
  await expect(floor.getByRole("status")).toHaveText("");
  const tolerances = page.getByTestId("tolerances-form");
  await tolerances.getByLabel(/Oversize steps/).fill("0, 0.25, lots");
  await tolerances.getByRole("button", { name: "Save settings" }).click();
  await expect(tolerances.getByText(/"lots"/)).toBeVisible();
  await shoot(page, SHOTS, "01-settings-refused");

  await page.reload();
  await expect(difference).toHaveValue("2");
  await difference.fill("1.5");
  await floor.getByRole("button", { name: "Save floor settings" }).click();
  await expect(floor.getByRole("status")).toHaveText("Saved. Final checks from now on use these figures.");
  await tolerances.getByLabel(/Oversize steps/).fill("0, 0.25, 0.50");
  await tolerances.getByRole("button", { name: "Save settings" }).click();
  await expect(tolerances.getByRole("status")).toHaveText("Saved. New readings are judged against these figures.");
  await shoot(page, SHOTS, "02-settings-saved");
  await page.reload();
  await expect(difference).toHaveValue("1.5");
  await expect(tolerances.getByLabel(/Oversize steps/)).toHaveValue("0.00, 0.25, 0.50");
});

test("the customer editor: a bad address is refused under its field, a good one saved, archive in the same line", async ({ page }) => {
  await signIn(page, setup.ownerEmail, PASSWORD);
  await page.goto("/customers");
  await page.getByText("Ridgeway Vintage Tractors (demo)").click();
  await expect(page.getByRole("heading", { name: /Ridgeway/ })).toBeVisible();
  const email = page.getByLabel("E-mail");
  await email.fill("not an address");
  await page.getByRole("button", { name: "Save", exact: true }).click();
  await expect(page.getByText("That is not an e-mail address.")).toBeVisible();
  await shoot(page, SHOTS, "03-customer-refused");
  await email.fill("orders@example.test");
  await page.getByRole("button", { name: "Save", exact: true }).click();
  await expect(page.getByRole("status").filter({ hasText: "Saved." })).toBeVisible();
  await expect(page.getByText("That is not an e-mail address.")).toHaveCount(0);
  await page.getByRole("button", { name: "Archive" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Archived." })).toBeVisible();
  await expect(page.getByRole("button", { name: "Restore" })).toBeVisible();
  await shoot(page, SHOTS, "04-customer-saved");
  await page.reload();
  await expect(email).toHaveValue("orders@example.test");
});
