// Issue 18: a page read while MariaDB is down answers the plain 503 page (Retry-After, no stack), not
// Next's 500; once the database is back the same process serves the page again by itself.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createSessionFor } from "@/server/auth/session";
import { SESSION_COOKIE_NAME } from "@/server/auth/cookie";
import { createShopWithMembers } from "../support/fixtures";
import { startApp, type AppServer } from "./support/app-server";
import { dbScript } from "./support/private-db";
import { attempt, REQUEST_BOUND_MS } from "./support/load";

const APP_PORT = Number(process.env.RELIABILITY_APP_PORT ?? 3128);
const MESSAGE = "The workshop database is not answering; your last change may or may not have been saved: check before repeating it.";

let app: AppServer;
let cookie: string;

beforeAll(async () => {
  const shop = await createShopWithMembers("page-outage");
  const { token } = await createSessionFor(shop.actors.owner.userId, { activeShopId: shop.shopId, userAgent: "reliability" });
  cookie = `${SESSION_COOKIE_NAME}=${token}`;
  app = await startApp(APP_PORT);
});

afterAll(async () => {
  await app?.stop();
  dbScript("start");
  const { pool } = await import("@/server/db");
  await pool.end().catch(() => undefined);
});

describe("pages during a database outage", () => {
  it("answer 503 with Retry-After and a plain page while it is down, and 200 again once it is back", async () => {
    expect((await attempt(app.url, "/jobs", { cookie })).status).toBe(200);
    const pid = app.child.pid;
    dbScript("stop");
    try {
      for (const pathname of ["/jobs", "/stones", "/sign-in", "/jobs"]) {
        const page = await attempt(app.url, pathname, { cookie });
        expect(page.status, pathname).toBe(503);
        expect(page.retryAfter).toBe("5");
        expect(page.body).toContain("Database not answering");
        expect(page.leaksInternals).toBe(false);
        expect(page.ms).toBeLessThanOrEqual(REQUEST_BOUND_MS);
      }
      const full = await fetch(`${app.url}/jobs`, { headers: { cookie }, signal: AbortSignal.timeout(REQUEST_BOUND_MS) });
      expect(full.headers.get("content-security-policy")).toContain("frame-ancestors 'none'");
      expect(await full.text()).toContain(MESSAGE);
      // API routes keep their own 503 answer (JSON, saying whether the change was saved).
      const api = await attempt(app.url, "/api/jobs", { cookie });
      expect(api.status).toBe(503);
      expect(JSON.parse(api.body).error).toBe("unavailable");
    } finally {
      dbScript("start");
    }
    let status: number | string = 0;
    for (let i = 0; i < 40 && status !== 200; i++) {
      status = (await attempt(app.url, "/jobs", { cookie })).status;
      if (status !== 200) await new Promise((r) => setTimeout(r, 250));
    }
    expect(status).toBe(200);
    expect(app.child.pid).toBe(pid);
    expect(app.child.exitCode).toBeNull();
  });
});
