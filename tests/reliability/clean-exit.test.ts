// Issue 18 §7: on SIGTERM the server (as `npm start` runs it, NEXT_MANUAL_SIG_HANDLE set) stops its
// outbox loop after the mail it is sending, closes its MariaDB connections properly (the server counts
// no aborted client) and exits 0; every queued mail is sent exactly once, by the next start at the latest.
import { randomUUID } from "node:crypto";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/server/db";
import { emailOutbox } from "@/server/db/schema";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { appFetch, startApp, type AppServer } from "./support/app-server";
import { PRIVATE_DB, PRIVATE_MAIL } from "./support/private-db";

const PORT = Number(process.env.RELIABILITY_APP_PORT ?? 3128);
const AS_NPM_START = { NEXT_MANUAL_SIG_HANDLE: "true", OUTBOX_POLL_MS: "200" };
let shop: TestShop;
let root: mysql.Connection;
const apps: AppServer[] = [];

beforeAll(async () => {
  shop = await createShopWithMembers("clean exit");
  root = await mysql.createConnection({ host: "127.0.0.1", port: PRIVATE_DB.port, user: "borewise", password: "borewise-dev", database: PRIVATE_DB.name });
});

afterAll(async () => {
  await Promise.all(apps.map((app) => app.stop()));
  await root?.end();
  const { pool } = await import("@/server/db");
  await pool.end().catch(() => undefined);
});

async function abortedClients(): Promise<number> {
  const [rows] = await root.query("SHOW GLOBAL STATUS LIKE 'Aborted_clients'");
  return Number((rows as Array<{ Value: string }>)[0]!.Value);
}

const rowsOf = (addresses: string[]) =>
  db.select({ status: emailOutbox.status, lockedUntil: emailOutbox.lockedUntil }).from(emailOutbox).where(and(eq(emailOutbox.shopId, shop.shopId), inArray(emailOutbox.toAddress, addresses)));

describe("clean exit on SIGTERM", () => {
  it("finishes the mail it is sending, closes its connections, exits 0, and loses no queued mail", async () => {
    const app = await startApp(PORT, AS_NPM_START);
    apps.push(app);
    expect((await appFetch(app, "/api/health")).status).toBe(200);
    const abortedBefore = await abortedClients();
    const tag = randomUUID().slice(0, 8);
    const addresses = Array.from({ length: 40 }, (_, i) => `exit-${tag}-${i}@example.test`);
    await db.insert(emailOutbox).values(addresses.map((to) => ({ id: randomUUID(), shopId: shop.shopId, kind: "test.clean_exit", toAddress: to, subject: `Clean exit ${tag}`, html: "<p>demo</p>", text: "demo", nextAttemptAt: new Date() })));
    // Signal while the loop is part-way through the queue.
    for (let i = 0; i < 100 && !(await rowsOf(addresses)).some((r) => r.status === "sent"); i++) await new Promise((r) => setTimeout(r, 50));
    const exited = new Promise<number | null>((resolve) => app.child.once("exit", (code) => resolve(code)));
    app.child.kill("SIGTERM");
    const code = await Promise.race([exited, new Promise<"hung">((r) => setTimeout(() => r("hung"), 30_000))]);
    expect(code).toBe(0);
    expect(await abortedClients()).toBe(abortedBefore);
    const left = await rowsOf(addresses);
    expect(left.filter((r) => r.status === "failed")).toEqual([]);
    // Nothing is left under a send's lease: what was not sent is free for the next start.
    expect(left.filter((r) => r.status === "pending" && r.lockedUntil && r.lockedUntil > new Date())).toEqual([]);

    const next = await startApp(PORT, AS_NPM_START);
    apps.push(next);
    for (let i = 0; i < 100 && (await rowsOf(addresses)).some((r) => r.status !== "sent"); i++) await new Promise((r) => setTimeout(r, 200));
    expect((await rowsOf(addresses)).map((r) => r.status)).toEqual(addresses.map(() => "sent"));
    const caught = (await (await fetch(`http://127.0.0.1:${PRIVATE_MAIL.httpPort}/messages`)).json()) as Array<{ to: string[] }>;
    for (const address of addresses) expect(caught.filter((m) => m.to.includes(address)), address).toHaveLength(1);
  });
});
