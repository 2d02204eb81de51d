import "server-only";
import mysql from "mysql2/promise";
import { drizzle } from "drizzle-orm/mysql2";
import { env } from "@/env";
import * as schema from "./schema";

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

// Dev servers re-evaluate modules on every edit; one pool per process keeps connections bounded.
const globalForDb = globalThis as unknown as { borewisePool?: mysql.Pool };
export const pool = globalForDb.borewisePool ?? createPool();
if (env.NODE_ENV !== "production") globalForDb.borewisePool = pool;

export const db = drizzle(pool, { schema, mode: "planetscale" });
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
