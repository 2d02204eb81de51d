// Issue 16 end to end, in the invented demo shop (its price list is demo data): a machinist quotes a
// quick plan; the customer accepts from the caught e-mail, which books the job in; the lead drafts the
// demo floor job's invoice, issues it, follows the payment link to the local payment fake, pays, and
// sees the invoice paid. Needs the mail catcher (127.0.0.1:2580) and the payment fake (started by
// Playwright beside the app). Screens at 1366 and 820 px go to test-results/screens/billing.
import { expect, test } from "@playwright/test";
import { signIn, waitForMailTo } from "./pages/auth-pages";
import { shoot } from "./pages/screens";
import { typeInto } from "./pages/wizard-page";

const SHOTS = "test-results/screens/billing";
const PASSWORD = "demo honing bench 42"; // the demo shop's sign-ins (scripts/seed.ts, invented)

test("a quick plan is quoted, and the customer accepts it from the e-mail, booking the job in", async ({ page, browser }) => {
  const email = `quote-e2e-${Date.now()}@example.test`;
  await signIn(page, "machinist@demo.borewise.test", PASSWORD);
  await page.goto("/plan");
  await typeInto(page, "quick-piston", "92.2 mm");
  await typeInto(page, "quick-length", "138 mm");
  await typeInto(page, "quick-stock", "2.8 thou");
  await typeInto(page, "clearance-min", "40");
  await typeInto(page, "clearance-max", "60");
  await expect(page.getByTestId("plan-summary")).toContainText("Up to date");
  await page.goto("/plan?step=review");
  await typeInto(page, "quick-engine", "inline four, quote e2e (invented)");
  await typeInto(page, "quick-standard", "92.0 mm");
  await typeInto(page, "quote-customer", "Quote e2e customer (demo)");
  await typeInto(page, "quote-email", email);
  await page.getByTestId("quote-draft").click();
  await expect(page).toHaveURL(/\/quotes\/[0-9a-f-]{36}$/);
  await expect(page.getByTestId("quote-status")).toHaveText("draft");
  await expect(page.getByTestId("quote-lines")).toContainText("Honing, per cylinder (demo price)");
  await page.getByTestId("send-quote-submit").click();
  await expect(page.getByTestId("quote-status")).toHaveText("sent");
  await shoot(page, SHOTS, "1-quote");

  const mail = await waitForMailTo(email);
  const link = /http:\/\/127\.0\.0\.1:\d+\/quote\/[0-9a-f]{40}/.exec(mail.text)![0];
  const customer = await (await browser.newContext()).newPage(); // no account, no session
  await customer.goto(link);
  await expect(customer.getByTestId("public-quote-lines-total")).toContainText("EUR");
  await shoot(customer, SHOTS, "2-public-quote");
  await customer.getByTestId("quote-accept").click();
  await expect(customer.getByTestId("quote-answer")).toContainText(/booked in as job #\d+/);
  const jobNumber = /job #(\d+)/.exec((await customer.getByTestId("quote-answer").textContent())!)![1];
  // The link is spent: opening it again books nothing.
  await customer.goto(link);
  await expect(customer.getByText("This link is not valid any more")).toBeVisible();

  await page.reload();
  await expect(page.getByTestId("quote-status")).toHaveText("accepted");
  await expect(page.getByTestId("quote-job")).toHaveText(`Job #${jobNumber}`);
});

test("the lead issues the demo job's invoice, pays it through the fake and sees it paid", async ({ page }) => {
  await signIn(page, "lead@demo.borewise.test", PASSWORD);
  await page.goto("/invoices");
  const jobValue = await page.locator('[data-testid="draft-invoice-jobId"] option', { hasText: "demo floor job" }).first().getAttribute("value");
  await page.getByTestId("draft-invoice-jobId").selectOption(jobValue!);
  await page.getByTestId("draft-invoice-submit").click();
  await expect(page).toHaveURL(/\/invoices\/[0-9a-f-]{36}$/);
  await expect(page.getByTestId("invoice-status")).toHaveText("draft");
  await typeInto(page, "amend-invoice-lineDescription", "Labour, strip and clean (demo)");
  await typeInto(page, "amend-invoice-lineQuantity", "1.5");
  await typeInto(page, "amend-invoice-lineUnitPrice", "48.00");
  await typeInto(page, "amend-invoice-lineTaxRate", "20");
  await page.getByTestId("amend-invoice-submit").click();
  await expect(page.getByTestId("invoice-lines-total")).toHaveText("86.40 EUR"); // 1.5 × 48.00 = 72.00 net + 20 % = 14.40
  // The line is edited in place: its description changes, its figures stay.
  await expect(page.getByTestId("amend-line-1-quantity")).toHaveValue("1.5");
  await typeInto(page, "amend-line-1-description", "Labour, strip and clean, four bores (demo)");
  await page.getByTestId("amend-invoice-submit").click();
  await expect(page.getByTestId("invoice-lines")).toContainText("Labour, strip and clean, four bores (demo)");
  await expect(page.getByTestId("invoice-lines-total")).toHaveText("86.40 EUR");
  await shoot(page, SHOTS, "3a-invoice-draft-editor");
  await page.getByTestId("issue-invoice-submit").click();
  await expect(page.getByTestId("invoice-status")).toHaveText("issued");
  await shoot(page, SHOTS, "3-invoice-issued");

  await page.getByTestId("pay-by-card-submit").click();
  await expect(page.getByTestId("fake-amount")).toHaveText("86.40 EUR");
  await page.getByTestId("fake-pay").click();
  await expect(page.getByTestId("paid-page")).toBeVisible();
  await shoot(page, SHOTS, "4-paid-return");
  await page.goBack(); // back through the fake's page to the app
  await page.goto("/invoices");
  await shoot(page, SHOTS, "5-invoices");
  await page.locator('[data-testid="invoice-list"] a').first().click();
  await expect(page.getByTestId("invoice-status")).toHaveText("paid");
  await expect(page.getByTestId("invoice-paid-at")).not.toHaveText("—");
  await page.emulateMedia({ media: "print" });
  await page.screenshot({ path: `${SHOTS}/6-invoice-print.png`, fullPage: true });
  await page.emulateMedia({ media: "screen" });
});

test("the owner sees the price list, and a plan shows its machine time", async ({ page }) => {
  await signIn(page, "owner@demo.borewise.test", PASSWORD);
  await page.goto("/settings/billing");
  await expect(page.getByTestId("price-list")).toContainText("Honing, per cylinder (demo price)");
  await typeInto(page, "tax-rate-name", "Reduced (demo)");
  await typeInto(page, "tax-rate-rate", "abc");
  await page.getByTestId("tax-rate-submit").click();
  await expect(page.getByText("Enter the tax rate in percent")).toBeVisible();
  await shoot(page, SHOTS, "7-billing-settings");
  // The demo floor job's released plan: spindle time per stage, cylinder totals with allowances.
  await page.goto("/invoices");
  const jobId = await page.locator('[data-testid="draft-invoice-jobId"] option', { hasText: "demo floor job" }).first().getAttribute("value");
  await page.goto(`/jobs/${jobId}`);
  await page.getByTestId("job-plans").getByRole("link").first().click();
  await expect(page.getByTestId("machine-time")).toBeVisible();
  await expect(page.getByTestId("time-planned-total")).toContainText(/\d+\.\d min · \d+\.\d\d h/);
  await expect(page.getByTestId("time-logged-total")).toHaveText("—"); // nothing run yet on the floor
  await shoot(page, SHOTS, "8-plan-machine-time");
});
