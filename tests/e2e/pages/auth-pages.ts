import { expect, type Page } from "@playwright/test";

// Page objects for the account screens: tests say what a person does, these say how.
export class SignUpPage {
  constructor(private readonly page: Page) {}
  async createShop(input: { shopName: string; name: string; email: string; password: string }) {
    await this.page.goto("/sign-up");
    const form = this.page.getByTestId("sign-up-form");
    await form.getByLabel("Shop name").fill(input.shopName);
    await form.getByLabel("Your name").fill(input.name);
    await form.getByLabel("E-mail").fill(input.email);
    await form.getByLabel("Password").fill(input.password);
    await form.getByRole("button", { name: "Create shop" }).click();
    await expect(this.page.getByTestId("shop-header")).toBeVisible();
  }
}

/** Signs in through the sign-in form and waits for the shop's header. */
export async function signIn(page: Page, email: string, password: string) {
  await page.goto("/sign-in");
  const form = page.getByTestId("sign-in-form");
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Password").fill(password);
  await form.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("shop-header")).toBeVisible();
}

export class SettingsPage {
  constructor(private readonly page: Page) {}
  async open() {
    await this.page.goto("/settings");
    await expect(this.page.getByRole("heading", { name: "Settings" })).toBeVisible();
  }
  async invite(email: string, role: "owner" | "lead" | "machinist" | "apprentice") {
    const form = this.page.getByTestId("invite-form");
    await form.getByLabel("E-mail").fill(email);
    await form.getByLabel("Role").selectOption(role);
    await form.getByRole("button", { name: "Send invitation" }).click();
    await expect(form.getByRole("status")).toContainText(`Invitation sent to ${email}`);
  }
  members() {
    return this.page.getByTestId("member-list");
  }
}

export class InvitationPage {
  constructor(private readonly page: Page) {}
  async acceptAsNewUser(link: string, name: string, password: string) {
    await this.page.goto(link);
    const form = this.page.getByTestId("accept-invitation-form");
    await form.getByLabel("Your name").fill(name);
    await form.getByLabel("Choose a password").fill(password);
    await form.getByRole("button", { name: "Create account and join" }).click();
    await expect(this.page.getByTestId("shop-header")).toBeVisible();
  }
}

type CaughtMail = { to: string[]; subject: string; text: string };

/** Reads the local SMTP catcher's loopback API (scripts/mail-catcher.ts). */
export async function waitForMailTo(address: string, httpPort = Number(process.env.MAIL_CATCHER_HTTP_PORT ?? 2580)): Promise<CaughtMail> {
  for (let i = 0; i < 60; i++) {
    const res = await fetch(`http://127.0.0.1:${httpPort}/messages`);
    const messages = (await res.json()) as CaughtMail[];
    const found = messages.find((m) => m.to.includes(address));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`No mail for ${address} reached the catcher`);
}
