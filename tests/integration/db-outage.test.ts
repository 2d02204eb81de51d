// Issue 15 §5: when MariaDB goes away the API answers 503 with Retry-After and says whether the change
// may have been saved; when it comes back the same process serves again (the pool recovers by itself).
// The app reaches MariaDB through a proxy this test cuts, so the shared server keeps serving other tests.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { startTcpProxy, type TcpProxy } from "../support/tcp-proxy";
import type { makeRequest as MakeRequest } from "../support/session";

let proxy: TcpProxy;
type Route = (request: Request, context: { params: Promise<Record<string, never>> }) => Promise<Response>;
let GET: Route;
let POST: Route;
let makeRequest: typeof MakeRequest;
const context = { params: Promise.resolve({}) };

beforeAll(async () => {
  proxy = await startTcpProxy(Number(process.env.DB_PORT ?? 3407));
  vi.stubEnv("DB_PORT", String(proxy.port));
  vi.stubEnv("DB_CONNECT_TIMEOUT_MS", "1000");
  vi.resetModules();
  const session = await import("../support/session");
  const { createShopWithMembers } = await import("../support/fixtures");
  ({ GET } = (await import("@/app/api/jobs/route")) as unknown as { GET: Route });
  // A write: the floor's run submission (the job forms go through server actions).
  ({ POST } = (await import("@/app/api/floor/runs/route")) as unknown as { POST: Route });
  makeRequest = session.makeRequest;
  const shop = await createShopWithMembers("outage");
  await session.asUser(shop.actors.machinist);
});

afterAll(async () => {
  const { pool } = await import("@/server/db");
  await pool.end();
  await proxy.close();
  vi.unstubAllEnvs();
});

describe("database outage", () => {
  it("serves while the database is up", async () => {
    expect((await GET(makeRequest("/api/jobs"), context)).status).toBe(200);
  });

  it("answers 503 with Retry-After and an honest message while it is down", async () => {
    await proxy.cut();
    const read = await GET(makeRequest("/api/jobs"), context);
    expect(read.status).toBe(503);
    expect(read.headers.get("retry-after")).toBe("5");
    expect((await read.json()).message).toMatch(/^The database cannot be reached right now\. (Nothing was saved|Your change may or may not have been saved)/);
    const write = await POST(makeRequest("/api/floor/runs", { method: "POST", body: { id: "00000000-0000-4000-8000-000000000000" } }), context);
    expect(write.status).toBe(503);
    expect((await write.json()).error).toBe("unavailable");
  });

  it("serves again once the database is back, without a restart", async () => {
    await proxy.restore();
    let status = 0;
    for (let i = 0; i < 20 && status !== 200; i++) {
      status = (await GET(makeRequest("/api/jobs"), context)).status;
      if (status !== 200) await new Promise((r) => setTimeout(r, 250));
    }
    expect(status).toBe(200);
  });
});
