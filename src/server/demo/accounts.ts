import "server-only";
import { inTransaction } from "@/server/db/retry";
import { newId } from "@/server/db/ids";
import { memberships, shops, users } from "@/server/db/schema";
import { ROLES } from "@/shared/auth/roles";
import { hashPassword } from "@/server/auth/password";
import type { DemoContext } from "./seed";

// The invented demo shop with one person per role (DESIGN.md §9). Names are invented; addresses use
// the reserved .test domain. The password is printed at `npm start` and is for local demos only.
export const DEMO_SHOP_NAME = "Demo Cylinder Works (demo)";
export const DEMO_PASSWORD = "demo honing bench 42";

const PEOPLE: Record<(typeof ROLES)[number], { name: string; email: string }> = {
  owner: { name: "Oda Demo-Owner", email: "owner@demo.borewise.test" },
  lead: { name: "Lars Demo-Lead", email: "lead@demo.borewise.test" },
  machinist: { name: "Mira Demo-Machinist", email: "machinist@demo.borewise.test" },
  apprentice: { name: "Ari Demo-Apprentice", email: "apprentice@demo.borewise.test" },
};

export async function seedDemoAccounts(context: DemoContext): Promise<void> {
  const shopId = newId();
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await inTransaction(async (tx) => {
    await tx.insert(shops).values({ id: shopId, name: DEMO_SHOP_NAME });
    for (const role of ROLES) {
      const userId = newId();
      await tx.insert(users).values({ id: userId, email: PEOPLE[role].email, name: PEOPLE[role].name, passwordHash });
      await tx.insert(memberships).values({ id: newId(), shopId, userId, role });
      context.userIdsByRole[role] = userId;
      context.signIns.push({ role, email: PEOPLE[role].email, password: DEMO_PASSWORD });
    }
  });
  context.shopId = shopId;
}
