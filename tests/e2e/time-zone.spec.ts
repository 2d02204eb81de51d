// Issue 17 (times in the shop's time): the owner picks the shop's time zone in settings, and the run
// log then shows every time in it with the zone's abbreviation; a lead sees the setting but cannot change it.
import { expect, test } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { shoot } from "./pages/screens";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";

const PASSWORD = "time zone e2e 17";
const SHOTS = process.env.E2E_SHOTS_DIR ?? "test-results/time-zone";
let setup: TestShopResult<"timeZone">;

test.describe.configure({ mode: "serial" });
test.beforeAll(() => {
  setup = setUpTestShop("timeZone", PASSWORD);
});

test("a lead sees the shop's time zone but only the owner may change it", async ({ page }) => {
  await signIn(page, setup.leadEmail, PASSWORD);
  await page.goto("/settings");
  await expect(page.getByTestId("time-zone-select")).toBeDisabled();
  await expect(page.getByTestId("time-zone-form")).toContainText("The owner sets the shop's time zone.");
  await page.goto("/runs");
  await expect(page.getByTestId("run-row").first().locator("td").first()).toHaveText(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC$/);
});

test("the owner sets America/Chicago and the run log shows Chicago time", async ({ page }) => {
  await signIn(page, setup.ownerEmail, PASSWORD);
  await page.goto("/settings");
  const select = page.getByTestId("time-zone-select");
  await expect(select).toHaveValue("UTC");
  await select.selectOption("America/Chicago");
  await page.getByRole("button", { name: "Save time zone" }).click();
  await expect(page.getByTestId("time-zone-form").getByRole("status")).toHaveText("Dates and times are now shown in America/Chicago.");
  await page.reload();
  await expect(page.getByTestId("time-zone-select")).toHaveValue("America/Chicago");
  await expect(page.getByTestId("time-zone-now")).toHaveText(/ C[DS]T$/);
  for (const width of [1366, 820]) {
    await page.setViewportSize({ width, height: 900 });
    expect(await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)).toBeLessThanOrEqual(0);
    const box = await page.getByTestId("time-zone-select").boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(44);
  }
  await shoot(page, SHOTS, "settings");

  await page.goto("/runs");
  const when = page.getByTestId("run-row").first().locator("td").first();
  await expect(when).toHaveText(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2} C[DS]T$/);
  await shoot(page, SHOTS, "run-log");
});
