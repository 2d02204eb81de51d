// Replays the run log into learned_rates for every shop (or one: `npm run learning:rebuild -- <shopId>`),
// giving the same numbers the logging transactions stored (src/server/learning/rebuild.ts). Run with the
// react-server condition so modules that import "server-only" load outside Next.js.
import { shops } from "../src/server/db/schema";
import { db, pool } from "../src/server/db";
import { rebuildShopLearning } from "../src/server/learning/rebuild";

async function main() {
  const only = process.argv[2];
  const ids = only ? [only] : (await db.select({ id: shops.id }).from(shops)).map((s) => s.id);
  const started = performance.now();
  let keys = 0;
  let runs = 0;
  for (const id of ids) {
    const done = await rebuildShopLearning(id);
    keys += done.keys;
    runs += done.runs;
  }
  console.log(`learning:rebuild: ${ids.length} shop(s), ${keys} stone × material × machine, ${runs} runs learned from, ${((performance.now() - started) / 1000).toFixed(2)} s`);
}

main()
  .catch((error) => {
    console.error("learning:rebuild: failed:", error);
    process.exitCode = 1;
  })
  .finally(() => pool.end());
