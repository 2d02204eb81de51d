import "server-only";
import { notFound } from "next/navigation";
import { AppError } from "@/server/errors";

/** Turns a "not found" from the server layer into the page's 404; everything else propagates. */
export async function orNotFound<T>(load: Promise<T>): Promise<T> {
  try {
    return await load;
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}
