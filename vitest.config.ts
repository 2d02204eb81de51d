import { defineConfig } from "vitest/config";
import { sharedResolve, sharedSetupFiles } from "./vitest.shared";

export default defineConfig({
  resolve: sharedResolve,
  test: {
    environment: "node",
    include: ["src/**/*.test.{ts,tsx}", "tests/integration/**/*.test.{ts,tsx}", "eslint/**/*.test.ts"],
    setupFiles: sharedSetupFiles,
    testTimeout: 30_000,
    hookTimeout: 60_000,
    env: { NODE_ENV: "test", DB_NAME: process.env.DB_TEST_NAME ?? "borewise_test", TZ: "UTC" },
    benchmark: { include: ["tests/bench/**/*.bench.ts"] },
  },
});
