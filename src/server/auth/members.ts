import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "@/server/db";
import { memberships, users, type Role } from "@/server/db/schema";
import { AppError } from "@/server/errors";
import { assertCan, assertSameShop } from "./guard";
import type { Actor } from "./policy";

export type MemberRow = { membershipId: string; userId: string; name: string; email: string; role: Role; joinedAt: Date };

export async function listMembers(actor: Actor): Promise<MemberRow[]> {
  assertCan(actor, "members.view");
  return db
    .select({ membershipId: memberships.id, userId: users.id, name: users.name, email: users.email, role: memberships.role, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.shopId, actor.shopId))
    .orderBy(asc(memberships.createdAt), asc(users.name));
}

const lastOwner = () =>
  new AppError("conflict", "A shop needs at least one owner. Make someone else owner first.", {
    fieldErrors: { role: ["A shop needs at least one owner."] },
  });

/**
 * Loads the membership with a row lock and, when it is an owner's, locks every owner row of the shop
 * and counts them, so two owners demoting each other at once cannot leave the shop without one.
 */
async function lockMembership(tx: Parameters<Parameters<typeof db.transaction>[0]>[0], actor: Actor, membershipId: string) {
  const [row] = await tx
    .select({ id: memberships.id, shopId: memberships.shopId, role: memberships.role })
    .from(memberships)
    .where(eq(memberships.id, membershipId))
    .for("update");
  const membership = assertSameShop(actor, row, "That member");
  let owners = 0;
  if (membership.role === "owner") {
    const ownerRows = await tx.select({ id: memberships.id }).from(memberships).where(and(eq(memberships.shopId, actor.shopId), eq(memberships.role, "owner"))).for("update");
    owners = ownerRows.length;
  }
  return { membership, owners };
}

export async function changeMemberRole(actor: Actor, input: { membershipId: string; role: Role }): Promise<void> {
  assertCan(actor, "members.manage");
  await db.transaction(async (tx) => {
    const { membership, owners } = await lockMembership(tx, actor, input.membershipId);
    if (membership.role === "owner" && input.role !== "owner" && owners <= 1) throw lastOwner();
    await tx.update(memberships).set({ role: input.role }).where(and(eq(memberships.id, membership.id), eq(memberships.shopId, actor.shopId)));
  });
}

export async function removeMember(actor: Actor, input: { membershipId: string }): Promise<void> {
  assertCan(actor, "members.manage");
  await db.transaction(async (tx) => {
    const { membership, owners } = await lockMembership(tx, actor, input.membershipId);
    if (membership.role === "owner" && owners <= 1) throw lastOwner();
    await tx.delete(memberships).where(and(eq(memberships.id, membership.id), eq(memberships.shopId, actor.shopId)));
  });
}

export async function countMembers(shopId: string): Promise<number> {
  const [row] = await db.select({ n: sql<number>`count(*)` }).from(memberships).where(eq(memberships.shopId, shopId));
  return Number(row?.n ?? 0);
}
