// Issue 6 end to end: the lead edits a rate row with a reason and sees it in the history; an
// apprentice sees the stone library read-only. Screens at 1366 and 820 px go to test-results/screens/stones.
import { execFileSync } from "node:child_process";
import { expect, test, type Page } from "@playwright/test";
import { SignInPage } from "./pages/auth-pages";

const SHOTS = "test-results/screens/stones";
const POLISH = "test-results/screens/polish";
const PASSWORD = "stone table e2e bench 7";

type Setup = { leadEmail: string; apprenticeEmail: string; ownerEmail: string };
let setup: Setup;

// A fresh shop with a lead and an apprentice and the demo library, made through the server functions
// (the demo seed's own users are not needed, so this works whether or not the seed is wired).
const SETUP_SCRIPT = `
import("./src/server/demo/stones.ts").then(async ({ seedDemoStones }) => {
  const { db, pool } = await import("./src/server/db/index.ts");
  const { shops, users, memberships } = await import("./src/server/db/schema.ts");
  const { hashPassword } = await import("./src/server/auth/password.ts");
  const { randomUUID } = await import("node:crypto");
  const tag = randomUUID().slice(0, 8);
  const shopId = randomUUID();
  await db.insert(shops).values({ id: shopId, name: "E2E stones shop " + tag });
  const passwordHash = await hashPassword(process.env.E2E_PASSWORD);
  const ids = {};
  const emails = {};
  // The owner works in inches (DESIGN.md §5 units per user); the lead and the apprentice in mm.
  for (const role of ["lead", "apprentice", "owner"]) {
    const id = randomUUID();
    emails[role] = role + "-stones-" + tag + "@example.test";
    const unitSystem = role === "owner" ? "inch" : "metric";
    await db.insert(users).values({ id, email: emails[role], name: "E2E " + role, passwordHash, unitSystem });
    await db.insert(memberships).values({ id: randomUUID(), shopId, userId: id, role });
    ids[role] = id;
  }
  await seedDemoStones({ shopId, signIns: [], userIdsByRole: ids });
  console.log(JSON.stringify({ leadEmail: emails.lead, apprenticeEmail: emails.apprentice, ownerEmail: emails.owner }));
  await pool.end();
});
`;

test.beforeAll(() => {
  const out = execFileSync("npx", ["tsx", "--conditions=react-server", "-e", SETUP_SCRIPT], {
    env: { ...process.env, DB_NAME: process.env.DB_TEST_NAME ?? "borewise_test", E2E_PASSWORD: PASSWORD },
    encoding: "utf8",
  });
  setup = JSON.parse(out.trim().split("\n").pop()!) as Setup;
});

async function shoot(page: Page, name: string, dir = SHOTS) {
  for (const [label, width] of [["desktop", 1366], ["tablet", 820]] as const) {
    await page.setViewportSize({ width, height: 1000 });
    await page.screenshot({ path: `${dir}/${name}-${label}.png`, fullPage: true });
  }
  await page.setViewportSize({ width: 1366, height: 900 });
}

test("the lead edits a rate row with a reason and sees it in the history", async ({ page }) => {
  await new SignInPage(page).signIn(setup.leadEmail, PASSWORD);
  await page.goto("/stones");
  await expect(page.getByTestId("stone-row")).toHaveCount(4);
  await shoot(page, "01-library-lead");

  await page.getByRole("link", { name: "DF-400" }).click();
  await expect(page.getByTestId("stone-code")).toHaveText("DF-400");
  await shoot(page, "02-stone-lead");

  const greyIron = page.locator('[data-testid="rate-row"][data-material="grey_iron"]');
  await expect(greyIron.getByTestId("rate-removal")).toHaveText("0.45");
  await greyIron.getByTestId("edit-rate").click();
  const form = page.getByTestId("rate-form");
  await form.getByLabel("Removal per double stroke").fill("0.52");
  await form.getByTestId("rate-form-submit").click();
  await expect(form.getByText("Say why you are making this change")).toBeVisible();
  await expect(form.getByLabel("Removal per double stroke")).toHaveValue("0.52");
  await shoot(page, "03-rate-edit-needs-reason");

  await form.getByLabel("Reason for the change (required)").fill("Six demo blocks took fewer strokes than planned");
  await form.getByTestId("rate-form-submit").click();
  await expect(page.getByText("Rate row saved as a new version.")).toBeVisible();
  await expect(greyIron.getByTestId("rate-removal")).toHaveText("0.52");
  const latest = page.getByTestId("history-entry").first();
  await expect(latest).toContainText("Six demo blocks took fewer strokes than planned");
  await expect(latest).toContainText("E2E lead");
  await expect(latest).toContainText("0.45 µm → 0.52 µm");
  await shoot(page, "04-history-after-edit");

  await latest.getByTestId("view-version").click();
  await expect(page.getByText("This is the current version.")).toBeVisible();
  await expect(page.getByTestId("restore-form")).toHaveCount(0);
  await page.goBack();
  // Restore the original figure: a new version 3 with its own reason.
  await page.getByTestId("history-entry").filter({ hasText: "Rate row · Grey cast iron" }).filter({ hasText: "v1" }).getByTestId("view-version").click();
  await expect(page.getByTestId("version-values")).toBeVisible();
  await shoot(page, "05-version");
  await page.getByTestId("restore-form").getByLabel("Why restore it? (required)").fill("Back to the data-sheet figure until more blocks are logged");
  await page.getByTestId("restore-form-submit").click();
  await expect(page.getByText("Version restored as a new version.")).toBeVisible();
  await expect(greyIron.getByTestId("rate-removal")).toHaveText("0.45");
  await expect(page.getByTestId("history-entry").first()).toContainText("Restored version 1");

  await page.goto("/stones/new");
  const stoneForm = page.getByTestId("stone-form");
  await stoneForm.getByLabel("Grit (scale and number)").fill("400");
  await stoneForm.getByTestId("stone-form-submit").click();
  await expect(stoneForm.getByText(/has no scale/)).toBeVisible();
  await shoot(page, "06-new-stone-bare-grit");

  await page.goto("/machines");
  await expect(page.getByTestId("machine-card")).toHaveCount(2);
  await shoot(page, "07-machines-lead");
  await page.getByRole("link", { name: /Edit Bay 1/ }).click();
  await expect(page.getByTestId("machine-form")).toBeVisible();
  await shoot(page, "08-machine-edit");
});

test("an apprentice sees the stone table read-only", async ({ page }) => {
  await new SignInPage(page).signIn(setup.apprenticeEmail, PASSWORD);
  await page.goto("/stones");
  await expect(page.getByText("Read only")).toBeVisible();
  await expect(page.getByTestId("add-stone")).toHaveCount(0);
  await shoot(page, "09-library-apprentice");

  await page.getByRole("link", { name: "DC-150" }).click();
  await expect(page.getByTestId("rate-table")).toBeVisible();
  await expect(page.getByTestId("rate-row")).toHaveCount(2);
  await expect(page.getByTestId("edit-rate")).toHaveCount(0);
  await expect(page.getByTestId("edit-stone")).toHaveCount(0);
  await expect(page.getByTestId("history-entry").first()).toBeVisible();
  await shoot(page, "10-stone-apprentice");

  // Typing an edit address does not open the form.
  const stoneUrl = page.url();
  await page.goto(`${new URL(stoneUrl).pathname}/edit`);
  await expect(page).toHaveURL(/\/stones$/);
  await page.goto("/machines");
  await expect(page.getByTestId("add-machine")).toHaveCount(0);
});

test("an inch user reads and writes the library in inches", async ({ page }) => {
  await new SignInPage(page).signIn(setup.ownerEmail, PASSWORD);
  await page.goto("/stones");
  // 100 mm × 6 mm stones, 8 mm start height = 3.94 in × 0.236 in, 0.3150 in (1 in = 25.4 mm exactly [V S24]).
  const row = page.getByTestId("stone-row").filter({ hasText: "DF-400" });
  await expect(row).toContainText("3.94 in × 0.236 in");
  await shoot(page, "03-library-inch", POLISH);
  await row.getByRole("link", { name: "DF-400" }).click();
  await expect(page.getByText("start 0.3150 in · wear limit 0.0787 in")).toBeVisible();
  await expect(page.locator('[data-testid="rate-row"][data-material="grey_iron"]').getByTestId("rate-bore-length")).toHaveText("5.51 in");
  await expect(page.locator('[data-testid="rate-row"][data-material="grey_iron"]').getByTestId("rate-removal")).toHaveText("0.45");
  await shoot(page, "04-stone-inch", POLISH);

  await page.getByTestId("edit-stone").click();
  const stoneForm = page.getByTestId("stone-form");
  await expect(stoneForm.getByTestId("field-stoneLengthUm")).toHaveValue("3.937008");
  await expect(stoneForm.getByTestId("field-stoneLengthUm-unit")).toHaveText("in");
  await stoneForm.getByTestId("field-currentHeightUm").fill("0.25");
  await stoneForm.getByLabel("Reason for the change (required)").fill("Measured the set in inches");
  await shoot(page, "05-stone-edit-inch", POLISH);
  await stoneForm.getByTestId("stone-form-submit").click();
  await expect(page.getByText("Saved as a new version.")).toBeVisible();
  // 0.25 in = 6.35 mm; the history shows the change in the reader's unit.
  await expect(page.getByTestId("history-entry").first()).toContainText("Current height: 0.1181 in → 0.2500 in");

  await page.goto("/machines");
  const bay2 = page.getByTestId("machine-card").filter({ hasText: "Bay 2" });
  await expect(bay2).toContainText("7.09 in");
  await bay2.getByRole("link", { name: /Edit Bay 2/ }).click();
  const machineForm = page.getByTestId("machine-form");
  await expect(machineForm.getByTestId("field-maxStrokeLengthUm")).toHaveValue("7.086614");
  await machineForm.getByTestId("field-maxStrokeLengthUm").fill("7");
  await shoot(page, "06-machine-edit-inch", POLISH);
  await machineForm.getByTestId("machine-form-submit").click();
  await expect(machineForm.getByText("Machine saved.")).toBeVisible();
  await page.goto("/machines");
  await expect(page.getByTestId("machine-card").filter({ hasText: "Bay 2" })).toContainText("7.00 in");
  await shoot(page, "07-machines-inch", POLISH);
});
