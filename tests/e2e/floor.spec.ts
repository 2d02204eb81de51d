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
  // The profilometer's report is chosen with the network gone: kept on the tablet, then sent once, before
  // the final check that names it. The six final readings come as a keyboard-wedge gauge types them.
  await context.setOffline(true);
  await page.getByText("Surface finish from the profilometer (optional)").click();
  await page.getByTestId("surface-report-file").setInputFiles("tests/fixtures/uploads/surface-report.pdf");
  await expect(page.getByTestId("surface-report-name")).toHaveText("surface-report.pdf");
  await expect(page.getByTestId("surface-report-waiting")).toBeVisible();
  await page.getByTestId("reading-final-top-A").focus();
  for (let i = 0; i < 6; i++) {
    await page.keyboard.type(target.toFixed(4));
    await page.keyboard.press("Enter");
  }
  for (const level of ["top", "middle", "bottom"]) for (const d of ["A", "B"]) await expect(page.getByTestId(`reading-final-${level}-${d}`)).toHaveValue(target.toFixed(4));
  // The last Enter lands on Next, and sends nothing by itself.
  await expect(page.getByTestId("card-next")).toBeFocused();
  await expect(page.getByTestId("card-final")).toBeVisible();
  await expect(page.getByTestId("waiting-count")).toHaveText("Waiting to send: 1");
  await page.getByTestId("reading-final-block-c").fill("21");
  await page.getByTestId("reading-final-gauge-c").fill("20.5");
  const posts: { url: string; body: string | null }[] = [];
  page.on("requestfinished", (r) => {
    if (r.method() === "POST" && r.url().includes("/api/floor/")) posts.push({ url: r.url(), body: r.postData() });
  });
  await next(page);
  await expect(page.getByTestId("waiting-count")).toHaveText("Waiting to send: 2");
  await context.setOffline(false);
  await expect(page.getByTestId("waiting-count")).toHaveText("Waiting to send: 0", { timeout: 20_000 });
  await expect(page.getByTestId("surface-report-waiting")).toHaveCount(0);
  const uploads = posts.filter((p) => p.url.includes("/surface-reports"));
  const inspections = posts.filter((p) => p.url.includes("/inspections"));
  expect(uploads).toHaveLength(1);
  expect(inspections).toHaveLength(1);
  expect(posts.indexOf(uploads[0]!)).toBeLessThan(posts.indexOf(inspections[0]!));
  const reportId = JSON.parse(inspections[0]!.body ?? "{}").surfaceReportId as string;
  expect(reportId).toMatch(/^[0-9a-f-]{36}$/);
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

test("two people on one tablet: each one's entries and drafts stay theirs, sent only when they sign in again", async ({ page }) => {
  const sent: string[] = [];
  page.on("request", (r) => {
    if (r.url().includes("/api/floor/runs") && r.method() === "POST") sent.push(JSON.parse(r.postData() ?? "{}").id);
  });
  // The apprentice logs a block on cylinder 2 while the server cannot take it: it waits on the tablet.
  await page.route("**/api/floor/runs", (route) => route.fulfill({ status: 503, body: "{}" }));
  await signIn(page, setup.apprenticeEmail, PASSWORD);
  await page.goto(`/floor/${setup.planId}/2`);
  await expect(page.getByTestId("step-cards")).toHaveAttribute("data-loaded", "yes");
  await advanceTo(page, "run");
  await next(page);
  const measure = await cardId(page);
  if (measure.startsWith("card-measure")) {
    await enterReading(page, `reading-${measure.slice(5)}`, (await mm(page, "Expected smallest")) - 0.006);
    await next(page);
  }
  await expect(page.getByTestId("waiting-count")).toHaveText(/Waiting to send: [1-9]/);
  const waiting = Number((await page.getByTestId("waiting-count").textContent())!.replace(/\D/g, ""));
  const apprenticeCard = await page.locator("[data-testid^='card-']").first().getAttribute("data-testid");

  // Signing out asks first; the entry stays on the tablet.
  let question = "";
  page.once("dialog", (dialog) => {
    question = dialog.message();
    void dialog.accept();
  });
  await page.getByTestId("sign-out").click();
  await page.waitForURL(/\/sign-in/);
  expect(question).toBe(`${waiting} ${waiting === 1 ? "entry" : "entries"} not sent yet: sign out anyway? They stay on this tablet for you.`);
  await page.unroute("**/api/floor/runs");
  const sentBefore = sent.length;

  // The machinist on the same tablet sees a count, not the entry, and the cylinder from its first card.
  await signIn(page, setup.machinistEmail, PASSWORD);
  await page.goto(`/floor/${setup.planId}/2`);
  await expect(page.getByTestId("step-cards")).toHaveAttribute("data-loaded", "yes");
  await expect(page.getByTestId("card-mount")).toBeVisible();
  expect(apprenticeCard).not.toBe("card-mount");
  await expect(page.getByTestId("waiting-count")).toHaveText("Waiting to send: 0");
  await expect(page.getByTestId("waiting-others")).toHaveText(`${waiting} ${waiting === 1 ? "entry" : "entries"} from another person ${waiting === 1 ? "is" : "are"} waiting (sent when they sign in)`);
  await page.waitForTimeout(6_000); // past the queue's retry tick: still nothing of the apprentice's goes
  expect(sent.length).toBe(sentBefore);
  await page.getByTestId("sign-out").click(); // nothing of the machinist's waits: no question
  await page.waitForURL(/\/sign-in/);

  // The apprentice again: the entry goes, once, and the card is where they left it.
  await signIn(page, setup.apprenticeEmail, PASSWORD);
  await page.goto(`/floor/${setup.planId}/2`);
  await expect(page.getByTestId("step-cards")).toHaveAttribute("data-loaded", "yes");
  // The count reads 0 until the device store has been read, so wait for the send itself.
  await expect.poll(() => sent.length - sentBefore, { timeout: 20_000 }).toBeGreaterThan(0);
  await expect(page.getByTestId("waiting-count")).toHaveText("Waiting to send: 0", { timeout: 20_000 });
  await expect(page.locator("[data-testid^='card-']").first()).toHaveAttribute("data-testid", apprenticeCard!);
  const afterIds = sent.slice(sentBefore);
  expect(new Set(afterIds).size).toBe(afterIds.length); // each sent once
});
