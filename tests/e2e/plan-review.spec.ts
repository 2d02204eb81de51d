// Issue 10, "review is the truth": a field that will not save is listed on the review with its step
// marked, and a pressure typed with its unit is read in the rate row's unit. Screens at 1366 and 820 px.
import { expect, test } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { waitForPreview } from "./pages/wizard-page";
import { shoot } from "./pages/screens";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";

const SHOTS = "test-results/screens/plan-review";
const PASSWORD = "plan review e2e 10";
let setup: TestShopResult<"plan">;

test.beforeAll(() => {
  setup = setUpTestShop("plan", PASSWORD);
});

test("the review lists a pressure that will not save and marks its step; a pressure with its unit is read", async ({ page }) => {
  await signIn(page, setup.machinistEmail, PASSWORD);
  await page.goto(`/jobs/${setup.demoJobId}/plan?step=stones`);
  await waitForPreview(page);

  const pressure = page.getByTestId("pressure-finish");
  await pressure.fill("9 bananas");
  await expect(page.getByTestId("step-mark-stones")).toHaveText("1");
  await page.getByTestId("step-link-review").click();
  // The pressure, and cylinder 5 (prepared worn past its target) on the readings step.
  await expect(page.getByTestId("review-verdict")).toContainText("problems to resolve");
  await expect(page.getByTestId("step-mark-readings")).toBeVisible();
  await expect(page.getByTestId("review-verdict")).not.toContainText("No errors");
  await expect(page.getByTestId("blocker-stones")).toContainText("Stones and strokes");
  await shoot(page, SHOTS, "review-blocked");

  // The way out is one click away, and "9 bar" is a pressure.
  await page.getByTestId("blocker-stones").getByRole("button").click();
  await expect(page).toHaveURL(/step=stones/);
  await page.getByTestId("pressure-finish").fill("900 kPa");
  await expect(page.getByTestId("step-mark-stones")).toHaveCount(0);
  await waitForPreview(page);
  await expect(page.getByTestId("stages-cylinder-1").getByTestId("stage-finish")).toContainText("9.00 bar");
});
