// Server actions over HTTP, as the browser's React runtime calls them: a POST to a page with the
// `Next-Action` header naming the action and the arguments encoded as React encodes a reply
// ([previous state, FormData] for the forms' actions). Action ids come from the build's manifest.
import { readFileSync } from "node:fs";
import path from "node:path";
import { ROOT } from "./private-db";

export type BuiltAction = { id: string; filename: string; exportedName: string };

export function builtActions(dist = process.env.NEXT_DIST_DIR ?? ".next"): BuiltAction[] {
  const manifest = JSON.parse(readFileSync(path.join(ROOT, dist, "server/server-reference-manifest.json"), "utf8")) as {
    node: Record<string, { filename: string; exportedName: string }>;
  };
  return Object.entries(manifest.node).map(([id, entry]) => ({ id, filename: entry.filename, exportedName: entry.exportedName }));
}

export function actionId(exportedName: string, dist?: string): string {
  const found = builtActions(dist).find((a) => a.exportedName === exportedName);
  if (!found) throw new Error(`no server action ${exportedName} in the build`);
  return found.id;
}

/** `[null, FormData]` as React's encodeReply writes it: the form's fields under prefix "_1_", the args under "0". */
export function encodeFormArgs(fields: Record<string, string>): FormData {
  const body = new FormData();
  for (const [key, value] of Object.entries(fields)) body.append(`_1_${key}`, value);
  body.append("0", JSON.stringify([null, "$K1"]));
  return body;
}

export async function callActionOverHttp(
  url: string,
  page: string,
  id: string,
  fields: Record<string, string>,
  options: { cookie?: string; origin?: string | null } = {},
): Promise<Response> {
  const headers: Record<string, string> = { "next-action": id, accept: "text/x-component" };
  const origin = options.origin === undefined ? url : options.origin;
  if (origin) headers.origin = origin;
  if (options.cookie) headers.cookie = options.cookie;
  return fetch(`${url}${page}`, { method: "POST", headers, body: encodeFormArgs(fields), redirect: "manual", signal: AbortSignal.timeout(15_000) });
}

/** The session cookie a response set, as a Cookie header value. */
export function sessionCookieFrom(response: Response): string | null {
  const cookie = response.headers.getSetCookie().find((c) => /^(__Host-)?borewise_session=[^;]+/.test(c));
  return cookie ? cookie.split(";")[0]! : null;
}
