// Issue 4 end to end: sign up a shop, invite a machinist, read the invitation from the SMTP catcher,
// accept it in a second browser context, and see that the machinist cannot use the members page.
// Needs the mail catcher running: npx tsx scripts/mail-catcher.ts (ports SMTP_PORT / MAIL_CATCHER_HTTP_PORT).
import { expect, test } from "@playwright/test";
import { InvitationPage, SettingsPage, SignUpPage, signIn, waitForMailTo } from "./pages/auth-pages";
import { shoot } from "./pages/screens";

const SHOTS = "test-results/screens/accounts";
const PASSWORD = "tablet beside the honing bench";

test("owner invites a machinist who joins and cannot manage members", async ({ page, browser }) => {
  const tag = Date.now().toString(36);
  const ownerEmail = `owner-${tag}@example.test`;
  const machinistEmail = `machinist-${tag}@example.test`;

  await page.goto("/");
  await shoot(page, SHOTS, "01-landing");
  await page.goto("/sign-up");
  await shoot(page, SHOTS, "02-sign-up");
  await page.getByTestId("sign-up-form").getByRole("button", { name: "Create shop" }).click();
  await expect(page.getByTestId("sign-up-form").getByText("Enter the shop's name")).toBeVisible();
  await shoot(page, SHOTS, "03-sign-up-errors");

  await new SignUpPage(page).createShop({ shopName: `E2E Test Shop ${tag}`, name: "Test Owner", email: ownerEmail, password: PASSWORD });
  await expect(page.getByTestId("dashboard")).toBeVisible();
  await shoot(page, SHOTS, "04-dashboard-owner");

  // A new owner confirms their address (issue 15) before the shop may send invitations.
  const confirmation = await waitForMailTo(ownerEmail);
  const confirmLink = /https?:\/\/\S+\/confirm\/[0-9A-Za-z_-]+/.exec(confirmation.text)?.[0];
  expect(confirmLink, "confirmation link in the plain-text part").toBeTruthy();
  await page.goto(new URL(confirmLink!).pathname);
  await page.getByTestId("confirm-email-form").getByRole("button", { name: "Confirm my address" }).click();
  await expect(page.getByTestId("confirm-email-form").getByRole("status")).toContainText("confirmed");

  const settings = new SettingsPage(page);
  await settings.open();
  await settings.invite(machinistEmail, "machinist");
  await expect(page.getByTestId("pending-invitations")).toContainText(machinistEmail);
  await shoot(page, SHOTS, "05-settings-owner");

  const mail = await waitForMailTo(machinistEmail);
  const link = /https?:\/\/\S+\/invite\/[0-9a-f]{40}/.exec(mail.text)?.[0];
  expect(link, "invitation link in the plain-text part").toBeTruthy();
  const path = new URL(link!).pathname;

  const machinistContext = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const machinistPage = await machinistContext.newPage();
  await machinistPage.goto(path);
  await shoot(machinistPage, SHOTS, "06-invitation");
  await new InvitationPage(machinistPage).acceptAsNewUser(path, "Test Machinist", PASSWORD);
  await expect(machinistPage.getByTestId("signed-in-as")).toContainText("machinist");

  // The same link cannot be used twice.
  const thirdContext = await browser.newContext();
  const thirdPage = await thirdContext.newPage();
  await thirdPage.goto(path);
  await expect(thirdPage.getByText("This invitation cannot be used")).toBeVisible();
  await thirdContext.close();

  // Sign out, then sign in as the machinist.
  await machinistPage.getByTestId("sign-out").click();
  await expect(machinistPage).toHaveURL(/\/sign-in/);
  await shoot(machinistPage, SHOTS, "07-sign-in");
  await signIn(machinistPage, machinistEmail, PASSWORD);

  await machinistPage.goto("/settings");
  await expect(machinistPage.getByRole("heading", { name: "Settings" })).toBeVisible();
  await expect(machinistPage.getByTestId("member-list")).toHaveCount(0);
  await expect(machinistPage.getByTestId("invite-form")).toHaveCount(0);
  await expect(machinistPage.getByTestId("session-list")).toBeVisible();
  await shoot(machinistPage, SHOTS, "08-settings-machinist");

  const api = await machinistPage.request.get("/api/settings/members");
  expect(api.status()).toBe(403);

  // The owner sees the new member.
  await settings.open();
  await expect(settings.members()).toContainText(machinistEmail);
  await machinistContext.close();
});

test("signed-out visitors are sent to sign-in, and the reset pages render", async ({ page }) => {
  await page.goto("/settings");
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fsettings/);
  await page.goto("/reset");
  await shoot(page, SHOTS, "09-reset-request");
  await page.getByTestId("reset-request-form").getByLabel("E-mail").fill(`nobody-${Date.now()}@example.test`); // fresh per run: the per-account reset limit outlives a run
  await page.getByRole("button", { name: "Send reset link" }).click();
  await expect(page.getByRole("status")).toContainText("If an account uses that address");
  await page.goto(`/reset/${"0".repeat(40)}`);
  await expect(page.getByText("This link cannot be used")).toBeVisible();
  expect((await page.request.get("/dev/mail")).status()).toBe(404); // production build
});
