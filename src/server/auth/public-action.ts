import "server-only";
import type { z } from "zod";
import { unstable_rethrow } from "next/navigation";
import { formDataToObject, type ActionResult } from "@/server/http/action";
import { toPublicError } from "@/server/http/errors";
import { requireViewer, type Viewer } from "./current";

/** A thrown error as the form's result; Next.js redirects and not-founds pass through. */
function failure(error: unknown): ActionResult<never> {
  unstable_rethrow(error);
  const { body } = toPublicError(error);
  return { ok: false, message: body.message, fieldErrors: body.fieldErrors };
}

/**
 * The shape of defineAction for the few actions a signed-out visitor may call (sign-up, sign-in,
 * reset, accepting an invitation): zod parse → one server function → typed result. Next.js checks
 * the Origin of every server action; redirects pass through.
 */
export function definePublicAction<S extends z.ZodType, T>(schema: S, run: (input: z.infer<S>) => Promise<ActionResult<T>>) {
  return async (_previous: ActionResult<T> | null, formData: FormData): Promise<ActionResult<T>> => {
    try {
      return await run(schema.parse(formDataToObject(formData)));
    } catch (error) {
      return failure(error);
    }
  };
}

/**
 * For actions on one's own account (unit preference, password, sessions): any signed-in user, whatever
 * their role; 401 without a session.
 */
export function defineViewerAction<S extends z.ZodType, T>(schema: S, run: (viewer: Viewer, input: z.infer<S>) => Promise<ActionResult<T>>) {
  return async (_previous: ActionResult<T> | null, formData: FormData): Promise<ActionResult<T>> => {
    try {
      const viewer = await requireViewer();
      return await run(viewer, schema.parse(formDataToObject(formData)));
    } catch (error) {
      return failure(error);
    }
  };
}
