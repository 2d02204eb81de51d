import { execFileSync } from "node:child_process";
import type { TEST_SHOPS, TestShopName } from "./test-shops";

export type TestShopResult<N extends TestShopName> = Awaited<ReturnType<(typeof TEST_SHOPS)[N]>>;

/**
 * Makes a spec's fresh shop (tests/e2e/pages/test-shops.ts) against the test database, in a tsx child
 * process so the runner itself never opens the database; every user gets `password`.
 */
export function setUpTestShop<N extends TestShopName>(name: N, password: string): TestShopResult<N> {
  const script = `import("./tests/e2e/pages/test-shops.ts").then((m) => m.runTestShop(${JSON.stringify(name)}))`;
  const out = execFileSync("npx", ["tsx", "--conditions=react-server", "-e", script], {
    env: { ...process.env, DB_NAME: process.env.DB_TEST_NAME ?? "borewise_test", E2E_PASSWORD: password },
    encoding: "utf8",
  });
  return JSON.parse(out.trim().split("\n").pop()!);
}
