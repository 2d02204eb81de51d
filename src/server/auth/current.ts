import "server-only";
import { cache } from "react";
import { AppError } from "@/server/errors";
import type { Actor } from "@/shared/auth/policy";
import { getCurrentSession, type CurrentSession } from "./session";
import { listMembershipsOfUser, type ShopOfUser } from "./memberships";

export type Viewer = CurrentSession & { actor: Actor | null; shops: ShopOfUser[] };

/**
 * Everything the header and pages need about who is signed in, read once per request: the session,
 * the user (name, e-mail, unit preference), their shops and the actor in the active shop. The active
 * shop is the one stored on the session; if that membership is gone, the user's first shop.
 */
export const getViewer = cache(async (): Promise<Viewer | null> => {
  const current = await getCurrentSession();
  if (!current) return null;
  const shops = await listMembershipsOfUser(current.user.id);
  const active = shops.find((s) => s.shopId === current.session.activeShopId) ?? shops[0];
  const actor: Actor | null = active ? { userId: current.user.id, shopId: active.shopId, role: active.role } : null;
  return { ...current, actor, shops };
});

/**
 * The actor of this request and its shop's planning counter as the session query read it. The session
 * query already read the role in the active shop, so the shop list is read only when that membership
 * is gone (then the user's first shop, as getViewer, and no counter: a caller reads it itself).
 */
export async function getCurrentActorAndCounter(): Promise<{ actor: Actor; planningVersion: number | null } | null> {
  const current = await getCurrentSession();
  if (!current) return null;
  const { session, user, activeRole, activePlanningVersion } = current;
  if (activeRole && session.activeShopId) return { actor: { userId: user.id, shopId: session.activeShopId, role: activeRole }, planningVersion: activePlanningVersion };
  const actor = (await getViewer())?.actor;
  return actor ? { actor, planningVersion: null } : null;
}

/** The actor of this request, or null when nobody is signed in or the user belongs to no shop. */
export async function getCurrentActor(): Promise<Actor | null> {
  return (await getCurrentActorAndCounter())?.actor ?? null;
}

/** The signed-in actor for this request (and the counter, see getCurrentActorAndCounter), or a 401. */
export async function requireActorAndCounter(): Promise<{ actor: Actor; planningVersion: number | null }> {
  const current = await getCurrentActorAndCounter();
  if (!current) throw new AppError("unauthorized", "Please sign in.");
  return current;
}

/** The signed-in actor for this request, or a 401. */
export async function requireActor(): Promise<Actor> {
  return (await requireActorAndCounter()).actor;
}

/** The signed-in viewer (even one who belongs to no shop any more), or a 401. */
export async function requireViewer(): Promise<Viewer> {
  const viewer = await getViewer();
  if (!viewer) throw new AppError("unauthorized", "Please sign in.");
  return viewer;
}
