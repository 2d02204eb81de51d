import type { Page } from "@playwright/test";

/** Full-page screenshots at desktop (1366 px) and tablet (820 px) width, then back to the desktop viewport. */
export async function shoot(page: Page, dir: string, name: string) {
  for (const [label, width] of [["desktop", 1366], ["tablet", 820]] as const) {
    await page.setViewportSize({ width, height: 1000 });
    await page.screenshot({ path: `${dir}/${name}-${label}.png`, fullPage: true });
  }
  await page.setViewportSize({ width: 1366, height: 900 });
}
