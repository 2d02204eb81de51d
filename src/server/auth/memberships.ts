import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { memberships, shops } from "@/server/db/schema";
import type { Role } from "@/shared/auth/roles";

export type ShopOfUser = { shopId: string; shopName: string; role: Role };

/** The shops a user belongs to, oldest membership first. */
export async function listMembershipsOfUser(userId: string): Promise<ShopOfUser[]> {
  return db
    .select({ shopId: memberships.shopId, shopName: shops.name, role: memberships.role })
    .from(memberships)
    .innerJoin(shops, eq(shops.id, memberships.shopId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(memberships.createdAt), asc(memberships.id));
}

export async function findMembership(userId: string, shopId: string): Promise<ShopOfUser | null> {
  const rows = await db
    .select({ shopId: memberships.shopId, shopName: shops.name, role: memberships.role })
    .from(memberships)
    .innerJoin(shops, eq(shops.id, memberships.shopId))
    .where(and(eq(memberships.userId, userId), eq(memberships.shopId, shopId)))
    .limit(1);
  return rows[0] ?? null;
}
