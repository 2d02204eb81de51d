// Issue 12 end to end at tablet size: the apprentice works through every card of the demo floor plan's
// cylinder 1: a checkpoint reading that calls for more strokes, entries made while the network is gone
// (kept on the tablet through a reload, then sent once), and a final check that passes. Screens of the
// cards go to docs/screens/floor for the README.
import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";

const PASSWORD = "floor cards e2e 12";
const SHOTS = "docs/screens/floor";
let setup: TestShopResult<"floor">;

test.use({ viewport: { width: 820, height: 1180 } });
test.beforeAll(() => {
  setup = setUpTestShop("floor", PASSWORD);
});

const cardId = async (page: Page) => (await page.locator("[data-testid^='card-']").first().getAttribute("data-testid"))!;
const mm = async (page: Page, figure: string) => Number.parseFloat((await page.getByTestId(`figure-${figure}`).textContent())!);
const next = (page: Page) => page.getByTestId("card-next").click();

async function enterReading(page: Page, testId: string, valueMm: number, temps?: { block: string; gauge: string }) {
  for (const level of ["top", "middle", "bottom"]) for (const d of ["A", "B"]) await page.getByTestId(`${testId}-${level}-${d}`).fill(valueMm.toFixed(4));
  if (temps) {
    await page.getByTestId(`${testId}-block-c`).fill(temps.block);
    await page.getByTestId(`${testId}-gauge-c`).fill(temps.gauge);
  }
}

/** Clicks through the set-up and information cards until a card of the given kind. */
async function advanceTo(page: Page, kind: string) {
  for (let i = 0; i < 30; i++) {
    const id = await cardId(page);
    if (id.startsWith(`card-${kind}`)) return id;
    await next(page);
    await expect(page.getByTestId(id)).toHaveCount(0);
  }
  throw new Error(`no ${kind} card`);
}

test("the apprentice works a demo cylinder through every card, on and off the network, to a passing final check", async ({ page, context }) => {
  await signIn(page, setup.apprenticeEmail, PASSWORD);
  await page.goto("/floor");
  await expect(page.getByTestId("waiting-count")).toHaveText("Waiting to send: 0");
  await page.screenshot({ path: `${SHOTS}/queue-tablet.png`, fullPage: true });
  await page.getByRole("link", { name: /Cylinder 1/ }).click();
  await expect(page.getByTestId("card-mount")).toBeVisible();
  await page.screenshot({ path: `${SHOTS}/card-mount-tablet.png`, fullPage: true });

  // Back never loses an entry: the stop card's figures come back after going back and forth.
  await next(page);
  await expect(page.getByTestId("card-stops")).toContainText("below the deck");
  await page.screenshot({ path: `${SHOTS}/card-stops-tablet.png`, fullPage: true });
  await page.getByTestId("card-back").click();
  await expect(page.getByTestId("card-mount")).toBeVisible();

  // Stage 1 to its checkpoint; the bore cut 6 µm less than expected, so the card asks for more strokes.
  await advanceTo(page, "run");
  await page.screenshot({ path: `${SHOTS}/card-run-tablet.png`, fullPage: true });
  await next(page);
  const measure = await advanceTo(page, "measure");
  const expected = await mm(page, "Expected smallest");
  await enterReading(page, `reading-${measure.slice(5)}`, expected - 0.006, { block: "21", gauge: "20.5" });
  await page.screenshot({ path: `${SHOTS}/card-measure-tablet.png`, fullPage: true });
  await next(page);
  await expect(page.getByTestId(/card-rest-/)).toBeVisible();
  const preset = Number.parseInt((await page.getByTestId("figure-New counter preset").textContent())!, 10);
  expect(preset).toBeGreaterThan(0);
  await page.screenshot({ path: `${SHOTS}/card-re-estimate-tablet.png`, fullPage: true });
  await next(page);
  await expect(page.getByTestId("waiting-count")).toHaveText("Waiting to send: 0");

  // The floor's service worker has kept this card's page (it controls the page and holds it in its cache).
  await page.waitForFunction(async () => {
    if (!navigator.serviceWorker.controller) return false;
    const kept = await (await caches.open("borewise-floor-pages-v1")).match(window.location.pathname);
    return kept !== undefined;
  }, undefined, { timeout: 20_000 });

  // The network goes: stage 2's checkpoint and the rest of the stage are kept on the tablet, in order.
  await context.setOffline(true);
  await expect(page.getByTestId("network-state")).toHaveText("Offline");
  await advanceTo(page, "run");
  await next(page);
  const measure2 = await advanceTo(page, "measure");
  await enterReading(page, `reading-${measure2.slice(5)}`, (await mm(page, "Expected smallest")) - 0.002);
  await next(page);
  await expect(page.getByTestId(/card-rest-/)).toBeVisible();
  await next(page);
  await expect(page.getByTestId("waiting-count")).toHaveText("Waiting to send: 2");

  // A reload with the network still gone: the service worker answers with the kept page, and the card
  // and the queued entries are still there.
  await page.reload();
  await expect(page.getByTestId("step-cards")).toHaveAttribute("data-loaded", "yes");
  await expect(page.getByTestId("network-state")).toHaveText("Offline");
  await expect(page.getByTestId("waiting-count")).toHaveText("Waiting to send: 2");
  const afterReload = await cardId(page);
  expect(afterReload).not.toMatch(/card-(mount|measure)/);
  await page.screenshot({ path: `${SHOTS}/waiting-to-send-tablet.png`, fullPage: true });

  // Back on the network: both are sent once, in order (each answer names its run; two runs, two answers).
  const sent: string[] = [];
  page.on("response", (r) => {
    if (r.url().includes("/api/floor/runs") && r.request().method() === "POST") sent.push(JSON.parse(r.request().postData() ?? "{}").id);
  });
  await context.setOffline(false);
  await expect(page.getByTestId("waiting-count")).toHaveText("Waiting to send: 0", { timeout: 20_000 });
  expect(sent).toHaveLength(2);
  expect(new Set(sent).size).toBe(2);

  // The remaining stages, then the final check at the target: it passes.
  for (let i = 0; i < 40; i++) {
    const id = await cardId(page);
    if (id === "card-final") break;
    if (id.startsWith("card-measure")) await enterReading(page, `reading-${id.slice(5)}`, await mm(page, "Stage goal"));
    await next(page);
    if (await page.getByTestId(/card-rest-/).count()) await next(page);
  }
  await expect(page.getByTestId("card-final")).toBeVisible();
  const target = await mm(page, "Target");
  // The profilometer's report goes up through the upload checks and is named by the final check.
  await page.getByText("Surface finish from the profilometer (optional)").click();
  await page.getByTestId("surface-report-file").setInputFiles("tests/fixtures/uploads/surface-report.pdf");
  await expect(page.getByTestId("surface-report-name")).toHaveText("surface-report.pdf");
  await enterReading(page, "reading-final", target, { block: "21", gauge: "20.5" });
  await next(page);
  await expect(page.getByTestId("verdict")).toHaveAttribute("data-status", "pass");
  await expect(page.getByTestId("waiting-count")).toHaveText("Waiting to send: 0", { timeout: 20_000 });
  await expect(page.getByTestId("verdict")).not.toContainText("waiting to send");
  await page.screenshot({ path: `${SHOTS}/card-final-tablet.png`, fullPage: true });
  await page.setViewportSize({ width: 1180, height: 820 });
  await page.screenshot({ path: `${SHOTS}/card-final-landscape.png`, fullPage: true });

  // The queue shows where the cylinder stands: every stage logged once and the check passed.
  await page.goto("/floor");
  await expect(page.getByTestId(/floor-cylinder-\d+-1/)).toContainText("Done, passed");
  for (const width of [1366, 820]) {
    await page.setViewportSize({ width, height: 900 });
    expect(await page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth)).toBe(false);
  }
  await page.setViewportSize({ width: 1366, height: 900 });
  await page.screenshot({ path: `${SHOTS}/queue-desktop.png`, fullPage: true });

  // Signing out forgets the floor pages this tablet kept: the next person never sees them.
  expect(await page.evaluate(() => caches.has("borewise-floor-pages-v1"))).toBe(true);
  await page.getByTestId("sign-out").click();
  await page.waitForURL(/\/sign-in/);
  await expect.poll(() => page.evaluate(() => caches.has("borewise-floor-pages-v1"))).toBe(false);
});
