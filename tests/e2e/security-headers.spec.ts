// Issue 15 §3: security headers on pages, API answers and errors; the pages really work under the
// nonce-based CSP in Chromium (no violation reported while a machinist goes through the main screens).
import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./pages/auth-pages";
import { shoot } from "./pages/screens";
import { setUpTestShop, type TestShopResult } from "./pages/set-up";

const PASSWORD = "headers e2e 15 long";
let setup: TestShopResult<"plan">;

test.beforeAll(() => {
  setup = setUpTestShop("plan", PASSWORD);
});

function expectSecurityHeaders(headers: Record<string, string>, what: string) {
  const csp = headers["content-security-policy"] ?? "";
  expect(csp, what).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]{20,}' 'strict-dynamic'/);
  expect(csp, what).toContain("frame-ancestors 'none'");
  expect(csp, what).toContain("object-src 'none'");
  expect(headers["x-content-type-options"], what).toBe("nosniff");
  expect(headers["referrer-policy"], what).toBe("no-referrer");
  expect(headers["x-frame-options"], what).toBe("DENY");
  expect(headers["permissions-policy"], what).toContain("geolocation=()");
  // Served over plain http here: no HSTS (it only belongs on https).
  expect(headers["strict-transport-security"], what).toBeUndefined();
}

test("headers on a page, an API answer, an error and a static file", async ({ request, page }) => {
  const pageResponse = await request.get("/sign-in");
  expect(pageResponse.status()).toBe(200);
  expectSecurityHeaders(pageResponse.headers(), "page");
  const api = await request.get("/api/health");
  expect(api.status()).toBe(200);
  expectSecurityHeaders(api.headers(), "api");
  expect(await api.json()).toEqual({ ok: true, database: "up" });
  const unauthorised = await request.get("/api/jobs");
  expect(unauthorised.status()).toBe(401);
  expectSecurityHeaders(unauthorised.headers(), "api error");
  const missing = await request.get("/no-such-page-here");
  expect(missing.status()).toBe(404);
  expectSecurityHeaders(missing.headers(), "404 page");
  await page.goto("/sign-in");
  const script = await page.locator("script[src*='/_next/static/']").first().getAttribute("src");
  const file = await request.get(script!);
  expect(file.status()).toBe(200);
  expectSecurityHeaders(file.headers(), "static file");
  // Two loads, two nonces.
  const again = await request.get("/sign-in");
  expect(again.headers()["content-security-policy"]).not.toBe(pageResponse.headers()["content-security-policy"]);
});

/** Collects every CSP violation the page reports, from the DOM event and from the console. */
async function watchViolations(page: Page): Promise<string[]> {
  const seen: string[] = [];
  page.on("console", (message) => {
    if (/Content Security Policy|Refused to (execute|load|apply)/i.test(message.text())) seen.push(message.text());
  });
  await page.exposeFunction("reportViolation", (text: string) => seen.push(text));
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      (window as unknown as { reportViolation: (t: string) => void }).reportViolation(`${e.violatedDirective} ${e.blockedURI}`);
    });
  });
  return seen;
}

test("the main screens run under the CSP with no violation", async ({ page }) => {
  const violations = await watchViolations(page);
  await signIn(page, setup.machinistEmail, PASSWORD);
  const paths = ["/", "/jobs", `/jobs/${setup.demoJobId}`, `/jobs/${setup.demoJobId}/plan`, "/plan", "/stones", "/machines", "/customers", "/settings"];
  for (const path of paths) {
    await page.goto(path);
    await page.waitForLoadState("networkidle");
    // Hydrated: React has attached to the document (scripts ran with the nonce).
    const hydrated = await page.evaluate(() => Object.keys(document.body).some((k) => k.startsWith("__react")) || Object.keys(document.querySelector("main") ?? {}).some((k) => k.startsWith("__react")));
    expect(hydrated, path).toBe(true);
  }
  // A client-side interaction: the plan wizard's live preview needs fetch and hydrated handlers.
  await page.goto(`/jobs/${setup.demoJobId}/plan`);
  await page.waitForLoadState("networkidle");
  expect(violations).toEqual([]);
});

test("the e-mail confirmation page", async ({ page }) => {
  const violations = await watchViolations(page);
  await page.goto(`/confirm/${"0".repeat(40)}`);
  await page.getByRole("button", { name: "Confirm my address" }).click();
  await expect(page.getByText("This link has expired or was already used.")).toBeVisible();
  await shoot(page, "test-results/screens/hardening", "confirm-email-refused");
  expect(violations).toEqual([]);
});
