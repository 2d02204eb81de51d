import "server-only";
import type { z } from "zod";
import { AppError } from "@/server/errors";
import { requireActorAndCounter } from "@/server/auth/current";
import type { Actor } from "@/shared/auth/policy";
import { toPublicError } from "./errors";
import { readJsonValue } from "./body";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

// Route handlers have no built-in CSRF protection: a state-changing request must come from our own
// origin (web-anchors A5). A missing Origin is refused too.
export function assertSameOrigin(request: Request): void {
  if (SAFE_METHODS.has(request.method)) return;
  const origin = request.headers.get("origin");
  const host = request.headers.get("x-forwarded-host") ?? request.headers.get("host");
  let originHost: string | null = null;
  try {
    originHost = origin && origin !== "null" ? new URL(origin).host : null;
  } catch {
    originHost = null;
  }
  if (!originHost || !host || originHost !== host) {
    throw new AppError("forbidden", "Cross-site requests are not accepted.");
  }
}

type Handler<P> = (request: Request, context: { params: P }) => Promise<Response>;

/** Wraps a route handler: origin check for mutations, typed errors mapped to status codes. */
export function route<P = Record<string, never>>(handler: Handler<P>) {
  return async (request: Request, context: { params: Promise<P> }): Promise<Response> => {
    try {
      assertSameOrigin(request);
      return await handler(request, { params: await context.params });
    } catch (error) {
      const { status, body, retryAfterSeconds } = toPublicError(error);
      const headers: HeadersInit = {};
      if (retryAfterSeconds) headers["retry-after"] = String(retryAfterSeconds);
      return Response.json(body, { status, headers });
    }
  };
}

/**
 * A route handler for a signed-in actor: 401 first, then the handler's own checks. `planningVersion` is
 * the actor's shop's planning counter, read with the session (null when it was not: read it yourself).
 */
export function actorRoute<P = Record<string, never>>(
  handler: (request: Request, context: { params: P; actor: Actor; planningVersion: number | null }) => Promise<Response>,
) {
  return route<P>(async (request, context) => handler(request, { ...context, ...(await requireActorAndCounter()) }));
}

/** Parses a JSON body (byte-limited, see body.ts) with the given schema. */
export async function readJson<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S>> {
  return schema.parse(await readJsonValue(request));
}

/**
 * A JSON object body with the path's ids laid over it (the path wins), checked with the schema the
 * server function parses it with, and handed on as sent: the server function parses it again (its
 * schemas transform, e.g. a grit text into its scale and number, so the output is not re-parseable).
 * The route's own parse makes a bad body a 400 here, before any read of the database.
 */
export async function readJsonFor<S extends z.ZodType>(request: Request, schema: S, pathIds: Record<string, string> = {}): Promise<Record<string, unknown>> {
  const value = await readJsonValue(request);
  if (value === null || typeof value !== "object" || Array.isArray(value)) throw new AppError("bad_request", "The request body must be a JSON object.");
  const body = { ...(value as Record<string, unknown>), ...pathIds };
  schema.parse(body);
  return body;
}
