// Issue 13 end to end: in a shop with the demo run history, the lead opens a stone set, sees the learned
// rate per material × machine with the chart of every run, and adopts one; a machinist sees no Adopt.
// Screens go to docs/screens/learning for the README.
import { expect, test } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { shoot } from "./pages/screens";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";

const PASSWORD = "learning e2e 13";
const SHOTS = "docs/screens/learning";
let setup: TestShopResult<"learning">;

test.describe.configure({ mode: "serial" });
test.beforeAll(() => {
  setup = setUpTestShop("learning", PASSWORD);
});

test("a machinist sees the learned rates but cannot adopt them", async ({ page }) => {
  await signIn(page, setup.machinistEmail, PASSWORD);
  await page.goto(`/stones/${setup.stoneId}#learning`);
  await expect(page.locator("[data-testid^='learning-']").first()).toBeVisible();
  await expect(page.locator("[data-testid^='adopt-']")).toHaveCount(0);
});

test("the lead opens the run log, filters by a machine, and sees the chart and the capability figures", async ({ page }) => {
  await signIn(page, setup.leadEmail, PASSWORD);
  await page.goto("/runs");
  await expect(page).toHaveTitle(/Run log/);
  await expect(page.getByTestId("run-row").first()).toBeVisible();
  const machine = page.getByTestId("filter-machine");
  const name = (await machine.locator("option").nth(1).textContent())!;
  await machine.selectOption({ index: 1 });
  await page.getByTestId("apply-filters").click();
  await expect(page).toHaveURL(/machine=/);
  const machines = await page.getByTestId("run-machine").allTextContents();
  expect(machines.length).toBeGreaterThan(0);
  expect(new Set(machines)).toEqual(new Set([name]));
  await expect(page.locator("[data-testid='prediction-chart'] .recharts-wrapper > svg")).toBeVisible();
  expect(await page.locator("[data-testid='prediction-chart'] .recharts-scatter-symbol").count()).toBeGreaterThan(3);
  await expect(page.getByTestId("prediction-summary")).toContainText("double strokes");
  await expect(page.getByTestId("capability-cpk")).toHaveText(/^-?\d+\.\d\d$/);
  await expect(page.getByTestId("capability-sentence")).toContainText(/Cpk .*normal distribution/);
  await expect(page.getByTestId("capability-histogram").locator("tr").first()).toBeVisible();
  await shoot(page, SHOTS, "run-log");
  for (const width of [1366, 820]) {
    await page.setViewportSize({ width, height: 900 });
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
  }
  await page.setViewportSize({ width: 1366, height: 900 });
});

test("the lead sees the chart of the runs and adopts a learned rate", async ({ page }) => {
  await signIn(page, setup.leadEmail, PASSWORD);
  await page.goto(`/stones/${setup.stoneId}#learning`);
  const section = page.locator("[data-testid^='learning-']").first();
  await expect(section).toBeVisible();
  await expect(section.getByTestId("learned-value")).toContainText(/runs?/);
  // recharts draws an SVG with one dot per run, loaded on this page only.
  await expect(section.locator("[data-testid^='rate-chart-'] .recharts-wrapper > svg")).toBeVisible();
  expect(await section.locator(".recharts-scatter-symbol").count()).toBeGreaterThan(3);
  await shoot(page, SHOTS, "stone-learning");
  const width = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(width).toBeLessThanOrEqual(1366);
  const form = section.locator("[data-testid^='adopt-']");
  await form.getByLabel("Reason for adopting").fill("The demo runs agree: the stone cuts faster than its data sheet");
  await form.getByRole("button", { name: "Adopt learned rate" }).click();
  // The page re-renders from the new rate row: version 2, learning starts again from it.
  await expect(section.getByTestId("learned-value")).toContainText("no runs on this version yet");
  await expect(section).toContainText("rate row v2");
  await page.reload();
  await expect(page.locator("[data-testid^='learning-']").first().getByTestId("learned-value")).toContainText("no runs on this version yet");
  await expect(page.locator("#history")).toContainText("Adopted the rate learned from");
  await shoot(page, SHOTS, "stone-adopted");
});
