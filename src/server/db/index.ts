import "server-only";
import mysql from "mysql2/promise";
import { drizzle } from "drizzle-orm/mysql2";
import { env } from "@/env";
import * as schema from "./schema";
import { databaseSeemsDown, noteDatabaseAnswered, noteDatabaseError } from "./availability";

function createPool() {
  return mysql.createPool({
    host: env.DB_HOST,
    port: env.DB_PORT,
    user: env.DB_USER,
    password: env.DB_PASSWORD,
    database: env.DB_NAME,
    connectionLimit: env.DB_POOL_SIZE,
    // A bounded queue: under overload callers get an error instead of waiting without end.
    queueLimit: env.DB_QUEUE_LIMIT,
    waitForConnections: true,
    enableKeepAlive: true,
    keepAliveInitialDelay: 10_000,
    connectTimeout: env.DB_CONNECT_TIMEOUT_MS,
    timezone: "Z",
    decimalNumbers: true,
  });
}

// One pool per process: dev servers re-evaluate modules on every edit, and a production server loads
// this module once per bundle (instrumentation, routes), so the pool lives on globalThis. That keeps
// connections bounded and lets the shutdown (src/server/shutdown.ts) close every one of them.
const globalForDb = globalThis as unknown as { borewisePool?: mysql.Pool };
export const pool = (globalForDb.borewisePool ??= watched(createPool()));

function noted<T>(promise: Promise<T>): Promise<T> {
  return promise.then(
    (value) => {
      noteDatabaseAnswered();
      return value;
    },
    (error: unknown) => {
      noteDatabaseError(error);
      throw error;
    },
  );
}

// Every way in (plain queries and the connections transactions take) records whether MariaDB answered,
// so pages can answer 503 while it is down (src/proxy.ts) without asking it on every request.
function watched(target: mysql.Pool): mysql.Pool {
  const query = target.query.bind(target);
  const execute = target.execute.bind(target);
  const getConnection = target.getConnection.bind(target);
  target.query = ((...args: Parameters<typeof query>) => noted(query(...args))) as typeof target.query;
  target.execute = ((...args: Parameters<typeof execute>) => noted(execute(...args))) as typeof target.execute;
  target.getConnection = () => noted(getConnection());
  return target;
}

/** For page requests: whether MariaDB is down, asking it (SELECT 1, bounded) at most once a second. */
export function databaseDown(timeoutMs = 2000): Promise<boolean> {
  return databaseSeemsDown(() => pool.query({ sql: "SELECT 1", timeout: timeoutMs }));
}

export const db = drizzle(pool, { schema, mode: "planetscale" });
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
