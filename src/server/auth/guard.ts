import "server-only";
import { AppError } from "@/server/errors";
import { can, type Actor, type Permission } from "@/shared/auth/policy";

/** Throws 403 unless the actor's role grants the permission (DESIGN.md §2). */
export function assertCan(actor: Actor, permission: Permission): void {
  if (!can(actor, permission)) {
    throw new AppError("forbidden", "Your role in this shop does not allow that.");
  }
}

/** A row of another shop is answered exactly like a missing row, so ids leak nothing. */
export function assertSameShop<T extends { shopId: string }>(actor: Actor, row: T | null | undefined, what = "That"): T {
  if (!row || row.shopId !== actor.shopId) throw new AppError("not_found", `${what} was not found.`);
  return row;
}
