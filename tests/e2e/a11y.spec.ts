// Issue 18 §4: every page the e2e suite visits, as the demo user who works there, checked with axe
// against the WCAG 2.0/2.1/2.2 A and AA rules: no serious or critical violation.
import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";

// Many pages per test, each loaded and audited: more than the suite's 60 s per test.
test.describe.configure({ timeout: 240_000 });

const PASSWORD = "accessibility e2e 18 long";
const WCAG_AA = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"];
let plan: TestShopResult<"plan">;
let floor: TestShopResult<"floor">;
let stones: TestShopResult<"stones">;

test.beforeAll(() => {
  plan = setUpTestShop("plan", PASSWORD);
  floor = setUpTestShop("floor", PASSWORD);
  stones = setUpTestShop("stones", PASSWORD);
});

/** Serious and critical violations of each path, as "path: rule (n nodes) first target". */
async function audit(page: Page, paths: string[]): Promise<string[]> {
  const found: string[] = [];
  for (const path of paths) {
    const response = await page.goto(path);
    expect(response?.status(), path).toBeLessThan(400);
    await page.waitForLoadState("networkidle");
    const { violations } = await new AxeBuilder({ page }).withTags(WCAG_AA).analyze();
    for (const v of violations.filter((x) => x.impact === "serious" || x.impact === "critical")) {
      found.push(`${path}: ${v.id} [${v.impact}] ${v.nodes.length}× e.g. ${v.nodes[0]?.target.join(" ")} — ${v.nodes[0]?.failureSummary?.split("\n")[1]?.trim() ?? v.help}`);
    }
  }
  return found;
}

/** The first link on `path` that matches `pattern`, for detail pages whose ids the set-up does not return. */
async function firstLink(page: Page, path: string, pattern: RegExp): Promise<string | null> {
  await page.goto(path);
  const hrefs = await page.locator("a[href]").evaluateAll((links) => links.map((a) => a.getAttribute("href") ?? ""));
  return hrefs.find((h) => pattern.test(h)) ?? null;
}

test("signed-out pages", async ({ page }) => {
  expect(await audit(page, ["/sign-in", "/sign-up", "/reset", `/reset/${"0".repeat(40)}`, `/confirm/${"0".repeat(40)}`])).toEqual([]);
});

test("the shop's pages as the machinist", async ({ page }) => {
  await signIn(page, plan.machinistEmail, PASSWORD);
  const job = `/jobs/${plan.demoJobId}`;
  const paths = ["/", "/jobs", "/jobs/new", job, `${job}/edit`, `${job}/plan`, `${job}/plan?step=stones`, "/plan", "/stones", "/machines", "/customers", "/settings", "/runs"];
  const customer = await firstLink(page, "/customers", /^\/customers\/[^/]+$/);
  const machine = await firstLink(page, "/machines", /^\/machines\/(?!new)[^/]+$/);
  expect(await audit(page, [...paths, ...[customer, machine].filter((p): p is string => p !== null)])).toEqual([]);
});

test("the library and settings as the lead and the owner", async ({ page, browser }) => {
  await signIn(page, stones.leadEmail, PASSWORD);
  const stone = await firstLink(page, "/stones", /^\/stones\/(?!new)[^/]+$/);
  expect(stone).toBeTruthy();
  const paths = ["/stones", "/stones/new", stone!, `${stone}/edit`, `${stone}/rates/new`, "/settings/tolerances", "/machines/new"];
  const version = await firstLink(page, stone!, /\/versions\/[^/]+$/);
  const rate = await firstLink(page, stone!, /\/rates\/(?!new)[^/]+$/);
  expect(await audit(page, [...paths, ...[version, rate].filter((p): p is string => p !== null)])).toEqual([]);
  const ownerContext = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const owner = await ownerContext.newPage();
  await signIn(owner, stones.ownerEmail, PASSWORD);
  expect(await audit(owner, ["/settings", "/stones"])).toEqual([]);
  await ownerContext.close();
});

test("the floor as the apprentice, on a tablet", async ({ browser }) => {
  const context = await browser.newContext({ viewport: { width: 820, height: 1180 } });
  const page = await context.newPage();
  await signIn(page, floor.apprenticeEmail, PASSWORD);
  expect(await audit(page, ["/floor", `/floor/${floor.planId}/1`])).toEqual([]);
  await context.close();
});
