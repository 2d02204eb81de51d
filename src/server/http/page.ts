import "server-only";
import { notFound, redirect } from "next/navigation";
import { getViewer } from "@/server/auth/current";
import { can, type Actor, type Permission } from "@/shared/auth/policy";
import { AppError } from "@/server/errors";

/** The actor of a page; without a session the page goes to sign-in, without `permission` to `fallback`. */
export async function pageActor(permission?: Permission, fallback = "/"): Promise<Actor> {
  const viewer = await getViewer();
  if (!viewer?.actor) redirect("/sign-in");
  if (permission && !can(viewer.actor, permission)) redirect(fallback);
  return viewer.actor;
}

/** Turns a "not found" from the server layer (a missing row, or one of another shop) into the page's 404; everything else propagates. */
export async function orNotFound<T>(load: Promise<T>): Promise<T> {
  try {
    return await load;
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}
