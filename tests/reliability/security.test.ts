// Issue 18 §3 against the production build served by `next start`: security headers on every page
// and API answer (every route in the build's manifest), the session cookie's flags, a cross-site POST
// to every mutating route and every server action refused with nothing changed, and no secret or
// password hash in the client bundle or in any API answer.
import { randomUUID } from "node:crypto";
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { db } from "@/server/db";
import { users } from "@/server/db/schema";
import { hashPassword } from "@/server/auth/password";
import { env, paymentConfig } from "@/env";
import { securityHeaders } from "@/lib/security-headers";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { shopFingerprint } from "../support/fuzz";
import { createFloorPlan } from "../integration/floor-fixtures";
import { appFetch, startApp, type AppServer } from "./support/app-server";
import { builtActions, callActionOverHttp, sessionCookieFrom, actionId } from "./support/actions";
import { ROOT } from "./support/private-db";

const DIST = path.join(ROOT, process.env.NEXT_DIST_DIR ?? ".next");
const PORT = Number(process.env.RELIABILITY_APP_PORT ?? 3128);
const FOREIGN = "https://elsewhere.example";
const PASSWORD = "security checks, long enough";
const MUTATING = ["POST", "PUT", "PATCH", "DELETE"] as const;

let app: AppServer;
let shop: TestShop;
let cookie: string;
let setCookie: string;
const ids: Record<string, string> = {};

const appPaths = Object.keys(JSON.parse(readFileSync(path.join(DIST, "server/app-paths-manifest.json"), "utf8")) as Record<string, string>)
  .filter((p) => !/^\/(_|dev\/)/.test(p) && !p.endsWith(".svg/route"))
  .map((p) => ({ kind: p.endsWith("/route") ? ("route" as const) : ("page" as const), pattern: p.replace(/\/(page|route)$/, "").replace(/\/\([^)]+\)/g, "") || "/" }));
const fill = (pattern: string) => pattern.replace(/\[(\w+)\]/g, (_m, name: string) => ids[name] ?? randomUUID());

// Table of each dynamic segment's rows, so every path names a real row of the signed-in shop.
const SEGMENT_TABLES: Record<string, string> = { jobId: "jobs", planId: "plans", customerId: "customers", machineId: "machines", stoneId: "stones", rateRowId: "rate_rows", versionId: "stone_versions", attachmentId: "attachments" };

beforeAll(async () => {
  shop = await createShopWithMembers("security");
  const floor = await createFloorPlan(shop, 1);
  await db.update(users).set({ passwordHash: await hashPassword(PASSWORD) }).where(eq(users.id, shop.actors.owner.userId));
  for (const [segment, table] of Object.entries(SEGMENT_TABLES)) {
    const [rows] = (await db.execute(sql.raw(`SELECT id FROM \`${table}\` WHERE shop_id = '${shop.shopId}' LIMIT 1`))) as unknown as [Array<{ id: string }>];
    if (rows[0]) ids[segment] = rows[0].id;
  }
  ids.planId = floor.planId;
  ids.cylinder = "1";
  app = await startApp(PORT);
  const signIn = await callActionOverHttp(app.url, "/sign-in", actionId("signInAction"), { email: shop.emails.owner, password: PASSWORD, next: "/jobs" });
  setCookie = signIn.headers.getSetCookie().find((c) => /borewise_session=/.test(c)) ?? "";
  cookie = sessionCookieFrom(signIn) ?? "";
});

afterAll(async () => {
  await app?.stop();
  const { pool } = await import("@/server/db");
  await pool.end().catch(() => undefined);
});

function expectHeaders(response: Response, what: string) {
  for (const [name, value] of securityHeaders({ csp: "", https: false })) {
    if (name === "content-security-policy") expect(response.headers.get(name), what).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]{20,}' 'strict-dynamic'.*frame-ancestors 'none'/);
    else expect(response.headers.get(name), `${what}: ${name}`).toBe(value);
  }
}

/** Values a client must never see: the server's secrets, and any argon2 password hash. */
function secrets(): string[] {
  const payment = paymentConfig();
  return ["$argon2", env.DB_PASSWORD, env.SMTP_PASSWORD, payment.secretKey, payment.webhookSecret].filter((v): v is string => typeof v === "string" && v.length >= 6);
}

describe("security of the served build", () => {
  it("covers every page and route of the build", () => {
    expect(appPaths.filter((p) => p.kind === "page").length).toBeGreaterThan(20);
    expect(appPaths.filter((p) => p.kind === "route").length).toBeGreaterThan(25);
  });

  it("the session cookie is HttpOnly, SameSite=Lax, Path=/, bounded in time", () => {
    expect(cookie).toMatch(/^borewise_session=/);
    expect(setCookie).toMatch(/;\s*HttpOnly/i);
    expect(setCookie).toMatch(/;\s*SameSite=Lax/i);
    expect(setCookie).toMatch(/;\s*Path=\//i);
    expect(setCookie).toMatch(/;\s*(Max-Age=\d+|Expires=)/i);
    // Plain http on loopback: Secure would make the browser drop it (src/env.ts cookieSecure); https sets it.
    expect(setCookie).not.toMatch(/;\s*Secure/i);
  });

  it("every page and every API answer carries the security headers, and no answer carries a secret", async () => {
    const leaks: string[] = [];
    for (const { kind, pattern } of appPaths) {
      const target = fill(pattern);
      for (const who of [cookie, undefined]) {
        const response = await appFetch(app, target, { cookie: who });
        expectHeaders(response, `${kind} ${target} ${who ? "signed in" : "signed out"} (${response.status})`);
        expect(response.status, target).toBeLessThan(500);
        const text = await response.text();
        for (const secret of secrets()) if (text.includes(secret)) leaks.push(`${target}: ${secret.slice(0, 8)}…`);
      }
    }
    expect(leaks).toEqual([]);
  });

  it("a cross-site request to every mutating route is refused and changes nothing", async () => {
    const before = await shopFingerprint([shop.shopId], Object.values(shop.actors).map((a) => a.userId));
    for (const { pattern } of appPaths.filter((p) => p.kind === "route")) {
      for (const method of MUTATING) {
        const response = await fetch(`${app.url}${fill(pattern)}`, {
          method, headers: { origin: FOREIGN, cookie, "content-type": "application/json" }, body: JSON.stringify({ id: randomUUID(), name: "cross-site" }), redirect: "manual",
        });
        const what = `${method} ${pattern}: ${response.status}`;
        // 405: the route has no such method. The payment webhook takes no session and no Origin: it is refused without its signature.
        expect(pattern === "/api/payments/webhook" ? [400, 405] : [403, 405], what).toContain(response.status);
        expectHeaders(response, what);
      }
    }
    expect(await shopFingerprint([shop.shopId], Object.values(shop.actors).map((a) => a.userId))).toBe(before);
  });

  it("a cross-site call of every server action is refused and changes nothing", async () => {
    const before = await shopFingerprint([shop.shopId], Object.values(shop.actors).map((a) => a.userId));
    const actions = builtActions();
    expect(actions.length).toBeGreaterThan(30);
    for (const action of actions) {
      const response = await callActionOverHttp(app.url, "/jobs", action.id, { name: "Cross-site customer", email: "", phone: "", notes: "" }, { cookie, origin: FOREIGN });
      const text = await response.text();
      const what = `${action.exportedName}: ${response.status} ${text.slice(0, 120)}`;
      expect(response.status, what).toBeGreaterThanOrEqual(400);
      expect(text, what).not.toMatch(/"ok":true/);
    }
    expect(await shopFingerprint([shop.shopId], Object.values(shop.actors).map((a) => a.userId))).toBe(before);
    // The same call from our own origin does work: the refusal above is the origin check, not a broken call.
    const own = await callActionOverHttp(app.url, "/customers", actionId("createCustomerAction"), { name: "Same-site customer", email: "", phone: "", notes: "" }, { cookie });
    expect(await own.text()).toMatch(/"ok":true/);
  });

  it("no client file of the build holds a secret value or a password hash", () => {
    const files: string[] = [];
    const walk = (dir: string) => {
      for (const name of readdirSync(dir)) {
        const full = path.join(dir, name);
        if (statSync(full).isDirectory()) walk(full);
        else if (/\.(js|css|html|rsc|json|txt|map)$/.test(name)) files.push(full);
      }
    };
    walk(path.join(DIST, "static"));
    walk(path.join(DIST, "server/app")); // prerendered pages are sent as they are
    const served = files.filter((f) => f.includes(`${path.sep}static${path.sep}`) || /\.(html|rsc)$/.test(f));
    expect(served.length).toBeGreaterThan(20);
    const leaks = served.flatMap((file) => {
      const text = readFileSync(file, "utf8");
      return secrets().filter((s) => text.includes(s)).map((s) => `${path.relative(DIST, file)}: ${s.slice(0, 8)}…`);
    });
    expect(leaks).toEqual([]);
  });
});
