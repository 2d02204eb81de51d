import "server-only";
import type { z } from "zod";
import { unstable_rethrow } from "next/navigation";
import type { ActionResult } from "@/shared/action-result";
import { requireActor } from "@/server/auth/current";
import { assertCan } from "@/server/auth/guard";
import type { Actor, Permission } from "@/shared/auth/policy";
import { AppError } from "@/server/errors";
import { toPublicError } from "./errors";

export type { ActionResult };

/**
 * Turns FormData into a plain object for zod; repeated names become arrays. An action is a public
 * endpoint whose caller may send any value in the form's place: that is a bad request, not a crash.
 */
export function formDataToObject(formData: unknown): Record<string, unknown> {
  if (!(formData instanceof FormData)) throw new AppError("bad_request", "The form's data did not arrive; reload the page and send it again.");
  const out: Record<string, unknown> = {};
  for (const [key, value] of formData.entries()) {
    if (key.startsWith("$ACTION")) continue;
    const existing = out[key];
    if (existing === undefined) out[key] = value;
    else out[key] = Array.isArray(existing) ? [...existing, value] : [existing, value];
  }
  return out;
}

/**
 * Every server action has one shape: session → role → zod parse → one server function → typed
 * result (STYLE.md pattern 2). Every exported action is a public endpoint, so none skips a step.
 * The payload is a form's FormData (useActionState) or the plain object a controlled form already
 * validated with the same schema; either way the server parses it again.
 */
export function defineAction<S extends z.ZodType, T>(
  schema: S,
  permission: Permission,
  run: (actor: Actor, input: z.infer<S>) => Promise<T | ActionResult<T>>,
) {
  return async (_previous: ActionResult<T> | null, payload: FormData | Record<string, unknown>): Promise<ActionResult<T>> => {
    try {
      const actor = await requireActor();
      assertCan(actor, permission);
      const input = schema.parse(payload instanceof FormData ? formDataToObject(payload) : payload);
      const result = await run(actor, input);
      if (result && typeof result === "object" && "ok" in result) return result as ActionResult<T>;
      return { ok: true, data: result as T };
    } catch (error) {
      unstable_rethrow(error);
      const { body } = toPublicError(error);
      return { ok: false, message: body.message, fieldErrors: body.fieldErrors };
    }
  };
}
