import { expect, test } from "@playwright/test";

test.describe("home page", () => {
  test("renders the Borewise shell with the shipped font", async ({ page }, testInfo) => {
    await page.goto("/");
    await expect(page.getByRole("link", { name: "Borewise" })).toBeVisible();
    await expect(page.getByTestId("home-title")).toBeVisible();

    // next/font/local names the family; the body must use it, and the browser must have loaded it.
    const declared = await page.locator("html").getAttribute("data-font-sans");
    expect(declared).toBeTruthy();
    const family = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    const unquote = (name: string) => name.replace(/['"]/g, "").trim();
    const declaredFirst = unquote(declared!.split(",")[0]!);
    expect(unquote(family.split(",")[0]!)).toBe(declaredFirst);
    const loaded = await page.evaluate(async (name) => {
      await document.fonts.ready;
      return [...document.fonts].some((f) => f.family.replace(/['"]/g, "") === name && f.status === "loaded");
    }, declaredFirst);
    expect(loaded).toBe(true);

    await page.screenshot({ path: testInfo.outputPath("home-desktop.png"), fullPage: true });
    await page.setViewportSize({ width: 820, height: 1180 });
    await page.screenshot({ path: testInfo.outputPath("home-tablet.png"), fullPage: true });
  });

  test("health route answers 200", async ({ request }) => {
    const response = await request.get("/api/health");
    expect(response.status()).toBe(200);
    expect(await response.json()).toMatchObject({ ok: true });
  });
});
