// Rows for integration tests. Every test makes its own shop with unique names, so test files can run
// in parallel against one database without touching each other's data.
import { randomUUID } from "node:crypto";
import { db } from "@/server/db";
import { memberships, shops, users } from "@/server/db/schema";
import { ROLES, type Role } from "@/shared/auth/roles";
import type { Actor } from "@/shared/auth/policy";

export type TestShop = { shopId: string; actors: Record<Role, Actor>; emails: Record<Role, string> };

/** A shop with one member per role. Password hashes are placeholders: sign-in tests make real ones. */
export async function createShopWithMembers(label = "test"): Promise<TestShop> {
  const shopId = randomUUID();
  const tag = randomUUID().slice(0, 8);
  await db.insert(shops).values({ id: shopId, name: `Test shop ${label} ${tag}` });
  const actors = {} as Record<Role, Actor>;
  const emails = {} as Record<Role, string>;
  for (const role of ROLES) {
    const userId = randomUUID();
    const email = `${role}-${tag}@example.test`;
    await db.insert(users).values({ id: userId, email, name: `Test ${role}`, passwordHash: "!", emailConfirmedAt: new Date() });
    await db.insert(memberships).values({ id: randomUUID(), shopId, userId, role });
    actors[role] = { userId, shopId, role };
    emails[role] = email;
  }
  return { shopId, actors, emails };
}
