import { defineConfig } from "vitest/config";
import { sharedResolve, sharedSetupFiles } from "./vitest.shared";

// `npm run test:cluster` (scripts/test-cluster.sh starts the three Galera nodes first): the vitest
// process writes its fixtures through node 1; the app instances each talk to their own node.
export default defineConfig({
  resolve: sharedResolve,
  test: {
    environment: "node",
    include: ["tests/cluster/**/*.test.ts"],
    setupFiles: sharedSetupFiles,
    fileParallelism: false,
    testTimeout: 300_000,
    hookTimeout: 180_000,
    env: { NODE_ENV: "test", DB_PORT: process.env.CLUSTER_BASE_PORT ?? "3431", DB_NAME: "borewise_cluster", DB_TEST_NAME: "borewise_cluster", TZ: "UTC" },
  },
});
