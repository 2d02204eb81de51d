// Lets a command-line script (the seed) load modules that import "server-only" without the
// react-server condition, which would also swap react-dom/server for a stub and break mail rendering.
import { register } from "node:module";

const hook = `export async function resolve(specifier, context, next) {
  if (specifier === "server-only") return { url: "data:text/javascript,", shortCircuit: true };
  return next(specifier, context);
}`;
register(`data:text/javascript,${encodeURIComponent(hook)}`);
