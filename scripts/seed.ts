// Seeds the invented demo shop into an empty database and keeps its sign-in details in
// .data/demo-sign-ins.txt for `npm start` to print. Run with scripts/server-only-allowed.mjs so modules
// that import "server-only" load outside Next.js (the seed logs runs, whose notices render mail).
import { mkdirSync, writeFileSync } from "node:fs";
import { seedDemoIfEmpty } from "../src/server/demo/seed";
import { pool } from "../src/server/db";

async function main() {
  const { seeded, signIns } = await seedDemoIfEmpty();
  if (!seeded) {
    console.log("seed: database already seeded");
    return;
  }
  console.log("seed: demo shop created (invented demo data)");
  if (signIns.length > 0) {
    mkdirSync(".data", { recursive: true });
    const lines = signIns.map((s) => `  ${s.role.padEnd(11)} ${s.email}  password: ${s.password}`);
    writeFileSync(".data/demo-sign-ins.txt", `${lines.join("\n")}\n`);
  }
}

main()
  .catch((error) => {
    console.error("seed: failed:", error);
    process.exitCode = 1;
  })
  .finally(() => pool.end());
