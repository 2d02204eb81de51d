import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { startTcpProxy, type TcpProxy } from "../support/tcp-proxy";

// The app reaches MariaDB through a proxy this test can cut, so "database down" is real to the app
// (connections refused and dropped) while the shared test database keeps serving other tests.
let proxy: TcpProxy;
let GET: () => Promise<Response>;

beforeAll(async () => {
  proxy = await startTcpProxy(Number(process.env.DB_PORT ?? 3407));
  vi.stubEnv("DB_PORT", String(proxy.port));
  vi.stubEnv("DB_CONNECT_TIMEOUT_MS", "1000");
  vi.resetModules();
  ({ GET } = await import("@/app/api/health/route"));
});

afterAll(async () => {
  const { pool } = await import("@/server/db");
  await pool.end();
  await proxy.close();
  vi.unstubAllEnvs();
});

describe("GET /api/health", () => {
  it("answers 200 when the database is reachable", async () => {
    const response = await GET();
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ ok: true, database: "up" });
  });

  it("answers 503 saying only that the database is down (no error code for the public), without crashing", async () => {
    await proxy.cut();
    const response = await GET();
    expect(response.status).toBe(503);
    expect(await response.json()).toEqual({ ok: false, database: "down" });
  });

  it("recovers when the database is back, without restarting the app", async () => {
    await proxy.restore();
    const response = await GET();
    expect(response.status).toBe(200);
  });
});
