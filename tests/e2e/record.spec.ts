// Issue 14 end to end: the machinist opens the demo job's machining record (passed final inspection),
// sends it; the customer opens the link from the caught e-mail in a signed-out browser and sees the
// figures; the PDF's first page and the print view are kept for the README; a revoked link shows nothing.
// Needs a mail catcher (scripts/mail-catcher.ts) on SMTP_PORT / MAIL_CATCHER_HTTP_PORT.
import { execFileSync } from "node:child_process";
import { writeFileSync } from "node:fs";
import { randomUUID } from "node:crypto";
import { expect, test } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";
import { shoot } from "./pages/screens";

const PASSWORD = "machining record e2e 14";
const SHOTS = "docs/screens/record";
const HTTP_PORT = Number(process.env.MAIL_CATCHER_HTTP_PORT ?? 2580);
let setup: TestShopResult<"record">;

test.beforeAll(() => {
  setup = setUpTestShop("record", PASSWORD);
});

type Caught = { to: string[]; subject: string; text: string; attachments?: { filename: string; contentType: string; bytes: number }[] };
async function mailTo(address: string): Promise<Caught> {
  for (let i = 0; i < 60; i++) {
    const messages = (await (await fetch(`http://127.0.0.1:${HTTP_PORT}/messages`)).json()) as Caught[];
    const found = messages.find((m) => m.to.includes(address));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`No mail for ${address} reached the catcher`);
}

test("send the demo job's record and open it from the e-mail without signing in", async ({ page, browser, baseURL }) => {
  await signIn(page, setup.machinistEmail, PASSWORD);
  await page.goto(`/jobs/${setup.jobId}`);
  await page.getByTestId("open-record").click();
  const sheet = page.getByTestId("record-sheet");
  await expect(sheet).toBeVisible();
  await expect(sheet.getByTestId("record-cylinder-1")).toContainText("Piston clearance");
  const topA = (await page.getByTestId("record-1-top-A").textContent())!;
  expect(topA).toMatch(/^\d+\.\d{3} mm$/);
  await expect(sheet).toContainText("µm");
  await expect(sheet).toContainText("Ø");
  await shoot(page, SHOTS, "record-page");
  const noSideways = await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);
  expect(noSideways).toBe(true);
  await page.emulateMedia({ media: "print" });
  await page.screenshot({ path: `${SHOTS}/record-print-view.png`, fullPage: true });
  await expect(page.getByTestId("send-record-form")).toBeHidden();
  await page.emulateMedia({ media: "screen" });

  const customer = `record-customer-${randomUUID().slice(0, 8)}@example.test`;
  const form = page.getByTestId("send-record-form");
  await form.getByLabel("Customer's e-mail").fill(customer);
  await form.getByTestId("send-record").click();
  await expect(form.getByRole("status")).toContainText(`Version 1 sent to ${customer}`);

  const mail = await mailTo(customer);
  expect(mail.subject).toMatch(/Machining record, job #\d+/);
  if (mail.attachments) expect(mail.attachments.map((a) => a.contentType)).toEqual(["application/pdf"]);
  const link = /(http:\/\/\S+\/records\/[0-9a-f]{40})/.exec(mail.text)![1]!;
  expect(link.startsWith(baseURL!)).toBe(true);

  // The customer: a fresh browser with no session.
  const outsider = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const customerPage = await outsider.newPage();
  await customerPage.goto(link);
  await expect(customerPage.getByTestId("shop-header")).toHaveCount(0);
  await expect(customerPage.getByTestId("record-sheet")).toContainText("version 1");
  await expect(customerPage.getByTestId("record-1-top-A")).toHaveText(topA);
  await expect(customerPage.getByTestId("record-cylinder-2")).toContainText(/Piston clearance\s*\d+\.\d µm – \d+\.\d µm/);
  await shoot(customerPage, SHOTS, "customer-link");
  const pdf = await customerPage.request.get(`${link}/pdf`);
  expect(pdf.headers()["content-type"]).toBe("application/pdf");
  writeFileSync("test-results/record.pdf", await pdf.body());
  const text = execFileSync("pdftotext", ["-enc", "UTF-8", "test-results/record.pdf", "-"], { encoding: "utf8" });
  expect(text).toContain(topA);
  expect(text).toContain("µm");
  expect(text).toContain("Ø");
  expect(text).toContain("°C");
  execFileSync("pdftoppm", ["-png", "-r", "90", "-f", "1", "-l", "1", "-singlefile", "test-results/record.pdf", `${SHOTS}/record-pdf-page-1`]);

  // Back on the job: version 1 with its live link; revoked, the customer's link shows nothing.
  await page.goto(`/jobs/${setup.jobId}`);
  await expect(page.getByTestId("record-versions")).toContainText(`Version 1`);
  await expect(page.getByTestId("record-link-state-1")).toContainText("link active");
  await page.getByTestId("record-versions").screenshot({ path: `${SHOTS}/records-panel.png` });
  await page.getByRole("button", { name: "Revoke link" }).click();
  await expect(page.getByTestId("record-link-state-1")).toContainText("link revoked");
  await customerPage.goto(link);
  await expect(customerPage.getByTestId("record-link-dead")).toBeVisible();
  await outsider.close();
});
