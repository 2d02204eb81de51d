import { fileURLToPath } from "node:url";

// What every vitest config (unit + integration, reliability, cluster) shares: the `@` alias, the
// empty `server-only` module and the common setup file.
export const sharedResolve = {
  alias: {
    "@": fileURLToPath(new URL("./src", import.meta.url)),
    "server-only": fileURLToPath(new URL("./tests/support/server-only.ts", import.meta.url)),
  },
};
export const sharedSetupFiles = ["./tests/support/setup.ts"];
