import { defineConfig } from "drizzle-kit";

// drizzle-kit reads only this file: keep the defaults in step with src/env.ts.
export default defineConfig({
  dialect: "mysql",
  schema: "./src/server/db/schema.ts",
  out: "./drizzle",
  dbCredentials: {
    host: process.env.DB_HOST ?? "127.0.0.1",
    port: Number(process.env.DB_PORT ?? 3407),
    user: process.env.DB_USER ?? "borewise",
    password: process.env.DB_PASSWORD ?? "borewise-dev",
    database: process.env.DB_NAME ?? "borewise",
  },
});
