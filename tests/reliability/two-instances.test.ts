// Issue 18 §1: two `next start` instances against one database. A session made on one works on the
// other; the same run submission sent to both is written once; the outbox of both sends each mail once.
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/server/db";
import { emailOutbox, runs, users } from "@/server/db/schema";
import { hashPassword } from "@/server/auth/password";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { createFloorPlan, honeStages, runBody } from "../integration/floor-fixtures";
import { appFetch, startApp, type AppServer } from "./support/app-server";
import { actionId, callActionOverHttp, sessionCookieFrom } from "./support/actions";
import { PRIVATE_MAIL } from "./support/private-db";

const PORTS = [Number(process.env.RELIABILITY_APP_PORT ?? 3128), Number(process.env.RELIABILITY_APP_PORT_B ?? 3138)];
const CATCHER = `http://127.0.0.1:${PRIVATE_MAIL.httpPort}`;
const PASSWORD = "two instances, one database";
let apps: AppServer[];
let shop: TestShop;

beforeAll(async () => {
  shop = await createShopWithMembers("two instances");
  await db.update(users).set({ passwordHash: await hashPassword(PASSWORD) }).where(eq(users.id, shop.actors.machinist.userId));
  // The outbox loop polls every 15 s; a shorter poll keeps the test short (same code path).
  apps = await Promise.all(PORTS.map((port) => startApp(port, { OUTBOX_POLL_MS: "1000" })));
});

afterAll(async () => {
  await Promise.all((apps ?? []).map((app) => app.stop()));
  const { pool } = await import("@/server/db");
  await pool.end().catch(() => undefined);
});

describe("two app instances, one database", () => {
  it("a session made on one instance works on the other", async () => {
    const [a, b] = apps as [AppServer, AppServer];
    const signIn = await callActionOverHttp(a.url, "/sign-in", actionId("signInAction"), { email: shop.emails.machinist, password: PASSWORD, next: "/jobs" });
    const cookie = sessionCookieFrom(signIn);
    expect(cookie, `sign-in answered ${signIn.status} ${(await signIn.text()).slice(0, 300)}`).toBeTruthy();
    const onB = await appFetch(b, "/api/jobs", { cookie: cookie! });
    expect(onB.status).toBe(200);
    const page = await appFetch(b, "/jobs", { cookie: cookie! });
    expect(page.status).toBe(200);
    expect(await appFetch(b, "/api/jobs")).toHaveProperty("status", 401);
  });

  it("the same submission sent to both is written once and both answers agree", async () => {
    const { planId, plan } = await createFloorPlan(shop, 1);
    const stagePosition = honeStages(plan.cylinders[0]!.plan.stages)[0]!.position;
    const { createSessionFor } = await import("@/server/auth/session");
    const { SESSION_COOKIE_NAME } = await import("@/server/auth/cookie");
    const { token } = await createSessionFor(shop.actors.lead.userId, { activeShopId: shop.shopId });
    const cookie = `${SESSION_COOKIE_NAME}=${token}`;
    for (let round = 0; round < 5; round++) {
      const body = runBody(planId, { id: randomUUID(), stagePosition, block: "dwell", strokesDone: 2 });
      const answers = await Promise.all([...apps, ...apps].map((app) => appFetch(app, "/api/floor/runs", { method: "POST", body, cookie })));
      expect(answers.map((r) => r.status)).toEqual([200, 200, 200, 200]);
      const views = await Promise.all(answers.map((r) => r.json()));
      for (const view of views) expect(view).toEqual(views[0]);
      expect(await db.select({ id: runs.id }).from(runs).where(eq(runs.id, body.id as string))).toHaveLength(1);
    }
  });

  it("the outbox loops of both instances send each queued mail once", async () => {
    const tag = randomUUID().slice(0, 8);
    const addresses = Array.from({ length: 12 }, (_, i) => `outbox-${tag}-${i}@example.test`);
    await db.insert(emailOutbox).values(addresses.map((to) => ({
      id: randomUUID(), shopId: shop.shopId, kind: "test.two_instances", toAddress: to, subject: `Two instances ${tag}`, html: "<p>demo</p>", text: "demo", nextAttemptAt: new Date(),
    })));
    let rows: Array<{ status: string }> = [];
    for (let i = 0; i < 60; i++) {
      rows = await db.select({ status: emailOutbox.status }).from(emailOutbox).where(and(eq(emailOutbox.shopId, shop.shopId), inArray(emailOutbox.toAddress, addresses)));
      if (rows.every((r) => r.status === "sent")) break;
      await new Promise((r) => setTimeout(r, 500));
    }
    expect(rows.map((r) => r.status)).toEqual(addresses.map(() => "sent"));
    const caught = (await (await fetch(`${CATCHER}/messages`)).json()) as Array<{ to: string[] }>;
    for (const address of addresses) expect(caught.filter((m) => m.to.includes(address)), address).toHaveLength(1);
  });
});
