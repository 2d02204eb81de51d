import "server-only";
import { inTransaction } from "@/server/db/retry";
import { and, asc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "@/server/db";
import { memberships, users } from "@/server/db/schema";
import type { Role } from "@/shared/auth/roles";
import { AppError } from "@/server/errors";
import { assertCan, assertSameShop } from "./guard";
import type { Actor } from "@/shared/auth/policy";

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
 * Locks every membership row of the shop in ONE statement before anything is decided, then finds the
 * target and counts the owners. Two owners demoting or removing each other at once then queue behind
 * one another (instead of deadlocking, which used to end as a 500), and the second sees the first's
 * change, so the shop is never left without an owner.
 */
async function lockMembership(tx: Tx, actor: Actor, membershipId: string) {
  const rows = await tx
    .select({ id: memberships.id, shopId: memberships.shopId, role: memberships.role })
    .from(memberships)
    .where(eq(memberships.shopId, actor.shopId))
    .for("update");
  const membership = assertSameShop(actor, rows.find((r) => r.id === membershipId), "That member");
  const owners = rows.filter((r) => r.role === "owner").length;
  return { membership, owners };
}

export async function changeMemberRole(actor: Actor, input: { membershipId: string; role: Role }): Promise<void> {
  assertCan(actor, "members.manage");
  await inTransaction(async (tx) => {
    const { membership, owners } = await lockMembership(tx, actor, input.membershipId);
    if (membership.role === "owner" && input.role !== "owner" && owners <= 1) throw lastOwner();
    await tx.update(memberships).set({ role: input.role }).where(and(eq(memberships.id, membership.id), eq(memberships.shopId, actor.shopId)));
  });
}

export async function removeMember(actor: Actor, input: { membershipId: string }): Promise<void> {
  assertCan(actor, "members.manage");
  await inTransaction(async (tx) => {
    const { membership, owners } = await lockMembership(tx, actor, input.membershipId);
    if (membership.role === "owner" && owners <= 1) throw lastOwner();
    await tx.delete(memberships).where(and(eq(memberships.id, membership.id), eq(memberships.shopId, actor.shopId)));
  });
}

export async function countMembers(shopId: string): Promise<number> {
  const [row] = await db.select({ n: sql<number>`count(*)` }).from(memberships).where(eq(memberships.shopId, shopId));
  return Number(row?.n ?? 0);
}
