import { defineConfig } from "vitest/config";
import { sharedResolve, sharedSetupFiles } from "./vitest.shared";

// tests/reliability: faults against real `next start` servers and the suite's own MariaDB (started by
// global-setup.ts on RELIABILITY_DB_PORT, default 3418). Files run one after another: one of them
// kills that database.
const dbPort = process.env.RELIABILITY_DB_PORT ?? "3418";
const dbName = process.env.RELIABILITY_DB_NAME ?? "borewise_reliability";

export default defineConfig({
  resolve: sharedResolve,
  test: {
    environment: "node",
    include: ["tests/reliability/**/*.test.ts"],
    setupFiles: sharedSetupFiles,
    globalSetup: ["./tests/reliability/support/global-setup.ts"],
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 180_000,
    env: { NODE_ENV: "test", DB_PORT: dbPort, DB_NAME: dbName, DB_TEST_NAME: dbName, TZ: "UTC" },
  },
});
