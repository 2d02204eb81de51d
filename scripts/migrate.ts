// Applies the SQL migrations in drizzle/ to the database named by DB_NAME (src/env.ts defaults).
import mysql from "mysql2/promise";
import { drizzle } from "drizzle-orm/mysql2";
import { migrate } from "drizzle-orm/mysql2/migrator";
import { env } from "../src/env";

async function main() {
  const connection = await mysql.createConnection({
    host: env.DB_HOST,
    port: env.DB_PORT,
    user: env.DB_USER,
    password: env.DB_PASSWORD,
    database: env.DB_NAME,
    timezone: "Z",
    multipleStatements: true,
  });
  try {
    await migrate(drizzle(connection), { migrationsFolder: "drizzle" });
    console.log(`migrate: ${env.DB_NAME} is up to date`);
  } finally {
    await connection.end();
  }
}

main().catch((error) => {
  console.error("migrate: failed:", error);
  process.exit(1);
});
