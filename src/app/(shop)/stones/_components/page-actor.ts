import "server-only";
import { notFound, redirect } from "next/navigation";
import { getViewer } from "@/server/auth/current";
import { can, type Actor, type Permission } from "@/server/auth/policy";
import { AppError } from "@/server/errors";

/** The actor of a library page; without the permission the page sends them back to `fallback`. */
export async function pageActor(permission?: Permission, fallback = "/stones"): Promise<Actor> {
  const viewer = await getViewer();
  if (!viewer?.actor) redirect("/sign-in");
  if (permission && !can(viewer.actor, permission)) redirect(fallback);
  return viewer.actor;
}

/** A row that is missing or belongs to another shop shows the 404 page. */
export async function orNotFound<T>(load: Promise<T>): Promise<T> {
  try {
    return await load;
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}
