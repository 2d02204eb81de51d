/// <reference types="vite/client" />
// Issue 18 §2: generated bodies, query strings and form data to every route handler (every
// src/app/**/route.ts, found by glob, so a new route is covered by itself) as a signed-in member of
// each role: never a 500, nothing changed when the answer is a 4xx, never another shop's data.
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { asUser, makeRequest, putSessionToken, type TestSession } from "../support/session";
import { bodyArbitrary, schemaKeys, shopFingerprint, shopRowIds } from "../support/fuzz";
import { createFloorPlan } from "./floor-fixtures";
import { ROLES, type Role } from "@/shared/auth/roles";
import { inArray } from "drizzle-orm";
import { db } from "@/server/db";
import { users } from "@/server/db/schema";
import { hashPassword } from "@/server/auth/password";

type Handler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
const routeModules = import.meta.glob<Record<string, unknown>>("/src/app/**/route.ts");
const sharedModules = import.meta.glob<Record<string, unknown>>(["/src/shared/**/*.ts", "!/src/shared/**/*.test.ts"], { eager: true });
const RUNS_PER_HANDLER = Number(process.env.FUZZ_RUNS ?? 10);

const routes = Object.keys(routeModules).sort().map((file) => {
  const pattern = file.replace(/^\/src\/app/, "").replace(/\/route\.ts$/, "").replace(/\/\([^)]+\)/g, "");
  return { file, pattern, params: [...pattern.matchAll(/\[(\w+)\]/g)].map((m) => m[1]!) };
});

let shop: TestShop;
let other: TestShop;
const sessions = {} as Record<Role, TestSession>;
let ownIds: string[];
let otherIds: string[];
let otherMarkers: string[];
let arbitraries: ReturnType<typeof bodyArbitrary>;
const statuses = new Map<number, number>();
afterAll(() => console.info(`fuzz routes: ${[...statuses].sort().map(([s, n]) => `${s}×${n}`).join(" ")}`));

beforeAll(async () => {
  [shop, other] = await Promise.all([createShopWithMembers("fuzz routes"), createShopWithMembers("fuzz routes other")]);
  await Promise.all([createFloorPlan(shop, 2), createFloorPlan(other, 2)]);
  // Real password hashes, so an answer that carried one would show "$argon2".
  const hash = await hashPassword("fuzz routes password, long");
  await db.update(users).set({ passwordHash: hash }).where(inArray(users.id, [...Object.values(shop.actors), ...Object.values(other.actors)].map((a) => a.userId)));
  for (const role of ROLES) sessions[role] = await asUser(shop.actors[role]);
  ownIds = await shopRowIds(shop.shopId);
  otherIds = await shopRowIds(other.shopId);
  otherMarkers = [...otherIds, ...Object.values(other.emails)];
  arbitraries = bodyArbitrary(schemaKeys(sharedModules), [...ownIds, ...otherIds]);
}, 120_000);

function buildRequest(path: string, method: string, kind: "json" | "form" | "raw" | "none", body: unknown): Request {
  const base = makeRequest(path, { method });
  const headers = new Headers(base.headers);
  if (kind === "none" || method === "GET") return new Request(base.url, { method, headers });
  if (kind === "form") {
    headers.delete("content-type");
    const form = new FormData();
    for (const [k, v] of Object.entries(body as Record<string, string>)) form.append(k, v);
    if (Math.random() < 0.3) form.append("file", new Blob([new Uint8Array([0x89, 0x50, 0x4e, 0x47, 1, 2, 3])], { type: "image/png" }), "x.png");
    return new Request(base.url, { method, headers, body: form });
  }
  return new Request(base.url, { method, headers, body: kind === "raw" ? String(body) : JSON.stringify(body) });
}

describe.each(routes)("$pattern", ({ file, pattern, params }) => {
  it("never answers 500, changes nothing on a 4xx and shows no other shop's data", async () => {
    const handlerModule = await routeModules[file]!();
    const handlers = METHODS.filter((m) => typeof handlerModule[m] === "function");
    expect(handlers.length).toBeGreaterThan(0);
    const a = arbitraries;
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom(...handlers), fc.constantFrom(...ROLES), fc.tuple(...params.map(() => a.id)), a.query,
        fc.oneof(fc.tuple(fc.constant("json" as const), a.json), fc.tuple(fc.constant("form" as const), a.form), fc.tuple(fc.constant("raw" as const), a.raw), fc.tuple(fc.constant("none" as const), fc.constant(null))),
        async (method, role, values, query, [kind, body]) => {
          putSessionToken(sessions[role].token);
          const routeParams = Object.fromEntries(params.map((p, i) => [p, String(values[i])]));
          const path = params.reduce((p, name) => p.replace(`[${name}]`, encodeURIComponent(routeParams[name]!)), pattern);
          const search = new URLSearchParams(Object.entries(query).map(([k, v]) => [k, String(v)])).toString();
          const before = await shopFingerprint([shop.shopId, other.shopId], [...Object.values(shop.actors), ...Object.values(other.actors)].map((x) => x.userId));
          const response = await (handlerModule[method] as Handler)(buildRequest(`${path}${search ? `?${search}` : ""}`, method, kind, body), { params: Promise.resolve(routeParams) });
          const text = await response.text();
          statuses.set(response.status, (statuses.get(response.status) ?? 0) + 1);
          const label = `${method} ${path} as ${role}: ${response.status} ${text.slice(0, 200)}`;
          expect(response.status, label).toBeLessThan(500);
          expect(text.includes("$argon2"), `${label} carries a password hash`).toBe(false);
          const sent = JSON.stringify([values, query, body]);
          for (const marker of otherMarkers) if (!sent.includes(marker)) expect(text.includes(marker), `${label} shows ${marker}`).toBe(false);
          if (response.status >= 400) {
            const after = await shopFingerprint([shop.shopId, other.shopId], [...Object.values(shop.actors), ...Object.values(other.actors)].map((x) => x.userId));
            expect(after, `${label} changed rows`).toBe(before);
          }
        },
      ),
      { seed: 18, numRuns: RUNS_PER_HANDLER * handlers.length, endOnFailure: true },
    );
  });
});
