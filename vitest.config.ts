import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

export default defineConfig({
  resolve: {
    alias: {
      "@": fileURLToPath(new URL("./src", import.meta.url)),
      "server-only": fileURLToPath(new URL("./tests/support/server-only.ts", import.meta.url)),
    },
  },
  test: {
    environment: "node",
    include: ["src/**/*.test.{ts,tsx}", "tests/integration/**/*.test.{ts,tsx}", "eslint/**/*.test.ts"],
    setupFiles: ["./tests/support/setup.ts"],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    env: { NODE_ENV: "test", DB_NAME: process.env.DB_TEST_NAME ?? "borewise_test", TZ: "UTC" },
    benchmark: { include: ["tests/bench/**/*.bench.ts"] },
  },
});
