// The layer rule reports each planted violation (tests/fixtures/layers, left out of the normal lint
// run) and stays quiet on the allowed imports beside them.
import path from "node:path";
import { ESLint } from "eslint";
import { describe, expect, it } from "vitest";

const root = path.resolve(import.meta.dirname, "..");
const fixtures = path.join(root, "tests/fixtures/layers/src");

async function layerMessages() {
  const eslint = new ESLint({ cwd: root, ignore: false, overrideConfig: { linterOptions: { reportUnusedDisableDirectives: "off" } } });
  const results = await eslint.lintFiles([fixtures]);
  return Object.fromEntries(
    results.map((r) => [path.relative(fixtures, r.filePath), r.messages.filter((m) => m.ruleId === "borewise/layers").map((m) => m.message)]),
  );
}

describe("borewise/layers", () => {
  it("reports every planted violation once and nothing on the allowed imports", async () => {
    const found = await layerMessages();
    expect(found).toEqual({
      "lib/imports-server.ts": ["src/lib must not import from src/server ('@/server/db'): layers point one way (app → components → server → shared/lib)."],
      "lib/imports-components-relative.ts": ["src/lib must not import from src/components ('../components/ui/button'): layers point one way (app → components → server → shared/lib)."],
      "lib/imports-shared.ts": [],
      "shared/imports-server.ts": ["src/shared must not import from src/server ('@/server/errors'): layers point one way (app → components → server → shared/lib)."],
      "shared/reexports-app.ts": ["src/shared must not import from src/app ('@/app/page'): layers point one way (app → components → server → shared/lib)."],
      "server/imports-component.ts": ["src/server must not import from src/components ('@/components/length-input'): layers point one way (app → components → server → shared/lib)."],
      "server/imports-app-relative.ts": ["src/server must not import from src/app ('../app/nav-actions'): layers point one way (app → components → server → shared/lib)."],
      "server/imports-shared.ts": [],
      "components/imports-server-value.tsx": ["Client code imports only types from src/server ('@/server/jobs/queries'): move what both sides need to src/shared, or use `import type`."],
      "components/imports-server-type.tsx": [],
      "app/x/client-form.tsx": ["Client code imports only types from src/server ('../../server/errors'): move what both sides need to src/shared, or use `import type`."],
      "app/x/page.tsx": [],
    });
  });
});
