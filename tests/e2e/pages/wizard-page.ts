import { expect, type Page } from "@playwright/test";

// The plan wizard as a machinist works it with the keyboard: specs say what is typed and checked,
// these say how.

/** Types into a field with the keyboard only: focus, select what is there, type, Tab away. */
export async function typeInto(page: Page, testId: string, text: string) {
  const field = page.getByTestId(testId);
  // Keys typed before React has hydrated the field reach the DOM but not the form's state (seen on a slow CI
  // machine right after a page load): wait until React has claimed this element.
  await expect.poll(() => field.evaluate((el) => Object.keys(el).some((key) => key.startsWith("__reactProps")))).toBe(true);
  await field.focus();
  await page.keyboard.press("ControlOrMeta+A");
  await page.keyboard.type(text);
  await page.keyboard.press("Tab");
}

/** Waits until the summary says the numbers shown are the server's answer to what is typed. */
export async function waitForPreview(page: Page) {
  await expect(page.getByTestId("plan-summary")).toContainText("Up to date");
}

/** Moves to the next step with Enter on "Next" and waits for its numbers. */
export async function nextStep(page: Page, stepId: string) {
  await page.getByTestId("wizard-next").focus();
  await page.keyboard.press("Enter");
  await expect(page).toHaveURL(new RegExp(`step=${stepId}`));
  await waitForPreview(page);
}
