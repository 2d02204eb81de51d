// Issue 17 §1, §2 and §6 (in part): every page, as the role that works there, at desktop (1366×900)
// and tablet (820×1180) width. (a) Nothing is wider than the viewport and the document never scrolls
// sideways; no scroll box (a table's overflow-x wrapper included) holds more than it shows. (b) Every
// visible target (a, button, input, select, summary, [role=button]) is at least 24×24 px (WCAG 2.2
// SC 2.5.8; a link inside a sentence is exempt, as the SC's "inline" exception says), and 44×44 px on
// the floor pages and in the reading grid (the floor's gloved-hand size, DESIGN.md; common practice).
// (c) Every detail page has its back-link to where it belongs. One sign-in per role; each page is
// loaded once and measured at both widths by resizing.
import { expect, test, type Browser, type Page } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";

test.describe.configure({ timeout: 240_000 });

const PASSWORD = "fit e2e 17 long enough";
const WIDTHS = [[1366, 900], [820, 1180]] as const;
const JOB_STEPS = ["pistons", "readings", "stones", "stroke", "review"];
const QUICK_STEPS = ["inputs", "stones", "stroke", "review"];
let shop: TestShopResult<"fit">;

test.beforeAll(() => {
  shop = setUpTestShop("fit", PASSWORD);
});

/** Runs in the page: what sticks out, what scrolls sideways and which targets are too small. */
function measure({ large }: { large: boolean }): string[] {
  const found: string[] = [];
  const describe = (el: Element): string => {
    const id = el.getAttribute("data-testid");
    const label = el.getAttribute("aria-label") ?? el.querySelector("caption")?.textContent ?? (el.textContent ?? "").trim().replace(/\s+/g, " ").slice(0, 40);
    const type = el.getAttribute("type");
    return `${el.tagName.toLowerCase()}${type ? `[type=${type}]` : ""}${id ? `[data-testid=${id}]` : ""}${label ? ` "${label}"` : ""}`;
  };
  const clipsSideways = (el: Element) => getComputedStyle(el).overflowX !== "visible";
  const root = document.documentElement;
  const width = root.clientWidth;
  if (root.scrollWidth > width + 1) found.push(`document scrolls sideways: ${root.scrollWidth} > ${width} px`);

  for (const el of Array.from(document.querySelectorAll<HTMLElement>("body *"))) {
    const rect = el.getBoundingClientRect();
    if (rect.width <= 1 || rect.height <= 1) continue; // not drawn, or visually hidden (sr-only)
    const style = getComputedStyle(el);
    if (style.visibility === "hidden" || style.display === "contents") continue;
    // A box that scrolls sideways and holds more than it shows (a table's wrapper most of all).
    if ((style.overflowX === "auto" || style.overflowX === "scroll") && !el.matches("input, textarea, select") && el.scrollWidth > el.clientWidth + 1) {
      const table = el.querySelector("table");
      found.push(`${table ? `table ${describe(table)} in ` : ""}scroll box ${describe(el)}: ${el.scrollWidth} > ${el.clientWidth} px`);
    }
    // Wider than the viewport where nothing clips it: cut off, or the page scrolls.
    if (rect.right > width + 1 || rect.left < -1) {
      let parent = el.parentElement;
      while (parent && parent !== document.body && !clipsSideways(parent)) parent = parent.parentElement;
      if (!parent || parent === document.body) found.push(`${describe(el)} sticks out of the viewport: ${Math.round(rect.left)}…${Math.round(rect.right)} of ${width} px`);
    }
  }

  const targets = "a[href], button, input:not([type=hidden]), select, textarea, summary, [role=button], [role=tab], [role=checkbox], [role=switch]";
  for (const el of Array.from(document.querySelectorAll<HTMLElement>(targets))) {
    const style = getComputedStyle(el);
    if (style.visibility === "hidden" || el.closest("[aria-hidden=true], [inert]")) continue;
    // A checkbox or radio inside its label, or a file input behind its styled label: the label is the target.
    const stand = el.matches("input[type=checkbox], input[type=radio], input[type=file]") ? el.closest("label") : null;
    const rect = (stand ?? el).getBoundingClientRect();
    if (rect.width <= 1 || rect.height <= 1 || (!stand && Number(style.opacity) === 0)) continue; // not drawn, or visually hidden
    if (el.matches("a") && isInSentence(el)) continue;
    const min = large || el.closest("[data-targets=large]") ? 44 : 24;
    if (rect.width + 0.5 < min || rect.height + 0.5 < min) found.push(`target ${describe(el)} is ${Math.round(rect.width)}×${Math.round(rect.height)} px, under ${min}×${min}`);
  }
  return found;

  /** A link in running text: inline, in a block that holds words of its own beside the link. */
  function isInSentence(link: HTMLElement): boolean {
    if (getComputedStyle(link).display !== "inline") return false;
    let block: HTMLElement | null = link.parentElement;
    while (block && getComputedStyle(block).display.startsWith("inline")) block = block.parentElement;
    const own = (block?.textContent ?? "").replace(link.textContent ?? "", "").trim();
    return own.length > 0;
  }
}

/** One page's offences at both widths, as "width path: offence"; `back` is the pathname its back-link must open. */
async function checkPage(page: Page, path: string, back?: string): Promise<string[]> {
  const found: string[] = [];
  await page.setViewportSize({ width: WIDTHS[0][0], height: WIDTHS[0][1] });
  const response = await page.goto(path);
  expect(response?.status(), path).toBeLessThan(400);
  await page.waitForLoadState("networkidle");
  for (const [width, height] of WIDTHS) {
    await page.setViewportSize({ width, height });
    await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve))));
    const large = path.startsWith("/floor");
    for (const offence of await page.evaluate(measure, { large })) found.push(`${width} ${path}: ${offence}`);
  }
  if (back !== undefined) {
    const hrefs = await page.getByTestId("back-link").evaluateAll((links) => links.map((a) => new URL((a as HTMLAnchorElement).href).pathname));
    if (!hrefs.includes(back)) found.push(`${path}: no back-link to ${back} (found ${hrefs.join(", ") || "none"})`);
  }
  return found;
}

type Visit = { path: string; back?: string };

/** The job page with cylinder 1's reading form opened (the office reading screen: 44 px targets in its grid). */
async function checkReadingForm(page: Page, job: string): Promise<string[]> {
  const found: string[] = [];
  await page.setViewportSize({ width: WIDTHS[0][0], height: WIDTHS[0][1] });
  await page.goto(job);
  await page.getByTestId("enter-readings-1").click();
  await expect(page.getByTestId("reading-form-1")).toBeVisible();
  for (const [width, height] of WIDTHS) {
    await page.setViewportSize({ width, height });
    await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve))));
    for (const offence of await page.evaluate(measure, { large: false })) found.push(`${width} ${job} (reading form open): ${offence}`);
  }
  return found;
}

async function checkAll(page: Page, visits: Visit[]): Promise<string[]> {
  const found: string[] = [];
  for (const { path, back } of visits) found.push(...(await checkPage(page, path, back)));
  return found;
}

/** The first href on `path` that matches `pattern`, for rows whose ids the set-up does not return. */
async function firstLink(page: Page, path: string, pattern: RegExp): Promise<string> {
  await page.goto(path);
  const hrefs = await page.locator("a[href]").evaluateAll((all) => all.map((a) => a.getAttribute("href") ?? ""));
  const href = hrefs.find((h) => pattern.test(h));
  expect(href, `a link matching ${pattern} on ${path}`).toBeTruthy();
  return href!;
}

async function signedInAs(browser: Browser, email: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const page = await context.newPage();
  await signIn(page, email, PASSWORD);
  return page;
}

test("signed-out and customer pages fit", async ({ page }) => {
  const zeros = "0".repeat(40);
  const visits: Visit[] = [
    { path: "/" }, { path: "/sign-in" }, { path: "/sign-up" }, { path: "/reset" }, { path: `/reset/${zeros}` }, { path: `/confirm/${zeros}` },
    { path: `/invite/${zeros}` }, { path: "/paid" }, { path: `/quote/${shop.quoteToken}` }, { path: `/records/${shop.recordToken}` },
  ];
  expect(await checkAll(page, visits)).toEqual([]);
});

test("the machinist's pages fit and lead back", async ({ browser }) => {
  const page = await signedInAs(browser, shop.emails.machinist);
  const job = `/jobs/${shop.demoJobId}`;
  const planned = `/jobs/${shop.planJobId}`;
  const recorded = `/jobs/${shop.recordJobId}`;
  const customer = await firstLink(page, "/customers", /^\/customers\/[0-9a-f-]{36}$/);
  const visits: Visit[] = [
    { path: "/" }, { path: "/jobs" }, { path: "/jobs/new", back: "/jobs" }, { path: job, back: "/jobs" }, { path: `${job}/edit`, back: job },
    ...JOB_STEPS.map((s) => ({ path: `${job}/plan?step=${s}`, back: job })), ...QUICK_STEPS.map((s) => ({ path: `/plan?step=${s}` })),
    { path: planned, back: "/jobs" }, { path: `${planned}/plans/${shop.planId}`, back: planned }, { path: recorded, back: "/jobs" },
    { path: `${recorded}/record`, back: recorded }, { path: "/runs" }, { path: "/customers" }, { path: customer, back: "/customers" },
    { path: "/machines" }, { path: "/settings" },
  ];
  expect([...(await checkAll(page, visits)), ...(await checkReadingForm(page, job))]).toEqual([]);
  await page.context().close();
});

test("the lead's library, machines and invoices fit and lead back", async ({ browser }) => {
  const page = await signedInAs(browser, shop.emails.lead);
  const stone = await firstLink(page, "/stones", /^\/stones\/[0-9a-f-]{36}$/);
  const version = await firstLink(page, stone, /\/versions\/[0-9a-f-]{36}$/);
  const rate = await firstLink(page, stone, /\/rates\/[0-9a-f-]{36}$/);
  const machine = await firstLink(page, "/machines", /^\/machines\/[0-9a-f-]{36}$/);
  const visits: Visit[] = [
    { path: "/stones" }, { path: "/stones/new", back: "/stones" }, { path: stone, back: "/stones" }, { path: `${stone}/edit`, back: stone },
    { path: `${stone}/rates/new`, back: stone }, { path: rate, back: stone }, { path: version, back: stone },
    { path: "/machines" }, { path: machine, back: "/machines" }, { path: "/machines/new", back: "/machines" }, { path: "/settings" }, { path: "/settings/tolerances", back: "/settings" },
    { path: "/invoices" }, { path: `/invoices/${shop.invoiceId}`, back: "/invoices" },
  ];
  expect(await checkAll(page, visits)).toEqual([]);
  await page.context().close();
});

test("the owner's settings, quotes and invoices fit and lead back", async ({ browser }) => {
  const page = await signedInAs(browser, shop.emails.owner);
  const visits: Visit[] = [
    { path: "/" }, { path: "/settings" }, { path: "/settings/billing", back: "/settings" }, { path: "/settings/record", back: "/settings" },
    { path: "/quotes" }, { path: `/quotes/new?job=${shop.planJobId}`, back: `/jobs/${shop.planJobId}` }, { path: `/quotes/${shop.quoteId}`, back: "/quotes" },
    { path: "/invoices" }, { path: `/invoices/${shop.invoiceId}`, back: "/invoices" },
  ];
  expect(await checkAll(page, visits)).toEqual([]);
  await page.context().close();
});

test("the apprentice's floor fits with 44 px targets and leads back", async ({ browser }) => {
  const page = await signedInAs(browser, shop.emails.apprentice);
  const visits: Visit[] = [
    { path: "/" }, { path: "/jobs" }, { path: "/floor" }, { path: `/floor/${shop.planId}/1`, back: "/floor" }, { path: `/floor/${shop.planId}/2`, back: "/floor" },
  ];
  expect(await checkAll(page, visits)).toEqual([]);
  await page.context().close();
});
