// Issue 17, items 2, 4 and 6: a file dropped on the styled picker, confirmations that say what follows and
// hand focus back, a quick plan that is not red before anything is typed, and the pairing drawn in step 1.
// Screens at 1366 and 820 px go to test-results/screens/pickers.
import { readFileSync } from "node:fs";
import path from "node:path";
import { expect, test, type Locator, type Page } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { shoot } from "./pages/screens";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";
import { typeInto, waitForPreview } from "./pages/wizard-page";

const SHOTS = "test-results/screens/pickers";
const PASSWORD = "pickers e2e 17";
const FIXTURES = path.resolve("tests/fixtures/uploads");
let setup: TestShopResult<"pickers">;

test.beforeAll(() => {
  setup = setUpTestShop("pickers", PASSWORD);
});

/** Drops a file on the picker whose input has `testId`, as a drag from the desktop does. */
async function dropFile(page: Page, testId: string, name: string, type: string, bytes: Buffer) {
  const transfer = await page.evaluateHandle(({ name, type, data }) => {
    const dt = new DataTransfer();
    dt.items.add(new File([new Uint8Array(data)], name, { type }));
    return dt;
  }, { name, type, data: [...bytes] });
  const zone = page.getByTestId(`${testId}-picker`).locator("label");
  await zone.dispatchEvent("dragover", { dataTransfer: transfer });
  await zone.dispatchEvent("drop", { dataTransfer: transfer });
}

/** One part of the page at 1366 and 820 px, to read it at its real size. */
async function shootPart(page: Page, part: Locator, name: string) {
  for (const [label, width] of [["desktop", 1366], ["tablet", 820]] as const) {
    await page.setViewportSize({ width, height: 1000 });
    await part.screenshot({ path: `${SHOTS}/${name}-${label}.png` });
  }
  await page.setViewportSize({ width: 1366, height: 900 });
}

async function noSidewaysScroll(page: Page) {
  expect(await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)).toBeLessThanOrEqual(0);
}

test("a gauge CSV dropped on the picker is previewed; a wrong file is refused before it is sent", async ({ page }) => {
  await signIn(page, setup.machinistEmail, PASSWORD);
  await page.goto(`/jobs/${setup.demoJobId}`);
  const csv = page.getByTestId("csv-import");
  await expect(csv).toContainText("CSV, up to 256 KB");
  await dropFile(page, "csv-file", "photo.png", "image/png", readFileSync(path.join(FIXTURES, "bore-photo.png")));
  await expect(csv.getByTestId("csv-file-problem")).toContainText("photo.png is not a CSV file");
  await dropFile(page, "csv-file", "gauge-cylinder-2.csv", "text/csv", readFileSync(path.join(FIXTURES, "gauge-cylinder-2.csv")));
  await expect(csv.getByTestId("csv-file-chosen")).toContainText("gauge-cylinder-2.csv");
  await expect(csv.getByTestId("csv-file-chosen")).toContainText("KB");
  await expect(csv.getByTestId("csv-file-problem")).toHaveCount(0);
  await csv.getByTestId("csv-preview").click();
  await expect(csv.getByTestId("csv-preview-table")).toBeVisible();
  const box = await page.getByTestId("attachment-file-picker").locator("label").boundingBox();
  expect(box!.height).toBeGreaterThanOrEqual(44);
  await page.getByTestId("attachments").scrollIntoViewIfNeeded();
  await shoot(page, SHOTS, "01-job-pickers");
  await shootPart(page, csv, "01a-csv-picker");
  await shootPart(page, page.getByTestId("attachments"), "01b-attachment-picker");
  await page.setViewportSize({ width: 820, height: 1000 });
  await noSidewaysScroll(page);
});

test("the quick plan is not red before anything is typed; a field turns red on leaving it and clears when fixed", async ({ page }) => {
  await signIn(page, setup.machinistEmail, PASSWORD);
  await page.goto("/plan");
  await expect(page.getByTestId("quick-piston")).toBeVisible();
  await expect(page.locator("[aria-invalid=true]")).toHaveCount(0);
  await expect(page.locator("[data-testid^=step-mark-]")).toHaveCount(0);
  await shoot(page, SHOTS, "02-quick-empty");
  await typeInto(page, "quick-piston", "81.9 bananas");
  await expect(page.getByTestId("quick-piston")).toHaveAttribute("aria-invalid", "true");
  await expect(page.getByTestId("quick-length")).not.toHaveAttribute("aria-invalid", "true");
  await typeInto(page, "quick-piston", "81.9 mm");
  await expect(page.getByTestId("quick-piston")).not.toHaveAttribute("aria-invalid", "true");
});

test("step 1 draws each bore with its piston and frames the proposed pairing", async ({ page }) => {
  await signIn(page, setup.machinistEmail, PASSWORD);
  await page.goto(`/jobs/${setup.demoJobId}/plan?step=pistons`);
  await waitForPreview(page);
  const drawing = page.getByTestId("pairing-drawing");
  await expect(drawing).toBeVisible();
  await expect(drawing.getByTestId("pairing-1")).toContainText("mm");
  await expect(drawing.getByRole("img").first()).toHaveAttribute("aria-label", /Cylinder 1: bore .* mm/);
  await drawing.scrollIntoViewIfNeeded();
  await shoot(page, SHOTS, "03-pairing");
  await shootPart(page, drawing, "03a-pairing-drawing");
  await page.setViewportSize({ width: 820, height: 1000 });
  await noSidewaysScroll(page);
});

test("removing a member asks first, says what follows, and hands focus back on Cancel", async ({ page }) => {
  await signIn(page, setup.ownerEmail, PASSWORD);
  await page.goto("/settings");
  const row = page.getByTestId("member-row").filter({ hasText: setup.leadEmail });
  await row.getByTestId("member-remove").click();
  const ask = row.getByTestId("confirm-remove-member");
  await expect(ask).toContainText("can no longer open this shop's jobs");
  await expect(ask.getByTestId("confirm-remove-member-yes")).toBeFocused();
  await ask.scrollIntoViewIfNeeded();
  await shoot(page, SHOTS, "04-remove-member");
  await shootPart(page, row, "04a-remove-member-row");
  await page.keyboard.press("Escape");
  await expect(ask).toHaveCount(0);
  await expect(row.getByTestId("member-remove")).toBeFocused();
  await row.getByTestId("member-remove").click();
  await row.getByTestId("confirm-remove-member-yes").click();
  await expect(page.getByTestId("member-row").filter({ hasText: setup.leadEmail })).toHaveCount(0);

  await page.goto("/settings/record");
  await expect(page.getByTestId("logo-file-picker")).toContainText("PNG or JPEG, up to 2 MB");
  await dropFile(page, "logo-file", "sign.png", "image/png", readFileSync(path.join(FIXTURES, "bore-photo.png")));
  await expect(page.getByTestId("logo-file-chosen")).toContainText("sign.png");
  await shootPart(page, page.getByTestId("logo-form"), "05-logo-picker");
});
