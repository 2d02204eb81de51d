// The layers of src/, checked on every import (DEVELOPERS.md, "Architecture"):
//   src/lib        imports nothing of ours but src/lib and src/shared;
//   src/shared     imports nothing from server, components or app;
//   src/server     imports nothing from components or app;
//   client code    (src/components and every "use client" file) imports only types from src/server.
// Imports are resolved ("@/…" and relative paths) before they are classified, so no spelling escapes.
import path from "node:path";

const LAYER = /[\\/]src[\\/](lib|shared|server|components|app)(?:[\\/]|$)/;

/** The layer a path lies in and the src folder it belongs to, or null outside src/. */
function locate(file) {
  const match = LAYER.exec(file);
  return match ? { layer: match[1], srcDir: file.slice(0, match.index + "/src".length) } : null;
}

function targetLayer(spec, file, srcDir) {
  if (spec.startsWith("@/")) return locate(path.join(srcDir, spec.slice(2)))?.layer ?? "root";
  if (spec.startsWith(".")) return locate(path.resolve(path.dirname(file), spec))?.layer ?? null;
  return null; // a package
}

const FORBIDDEN = {
  lib: (to) => to !== "lib" && to !== "shared",
  shared: (to) => to === "server" || to === "components" || to === "app",
  server: (to) => to === "components" || to === "app",
};

const isTypeOnly = (node) =>
  node.importKind === "type" ||
  node.exportKind === "type" ||
  (node.specifiers?.length > 0 && node.specifiers.every((s) => s.importKind === "type" || s.exportKind === "type"));

const layers = {
  meta: {
    type: "problem",
    schema: [],
    messages: {
      layer: "src/{{from}} must not import from src/{{to}} ('{{spec}}'): layers point one way (app → components → server → shared/lib).",
      clientValue: "Client code imports only types from src/server ('{{spec}}'): move what both sides need to src/shared, or use `import type`.",
    },
  },
  create(context) {
    const file = context.filename;
    const here = locate(file);
    if (!here) return {};
    let client = here.layer === "components";
    const check = (node, spec, typeOnly) => {
      if (typeof spec !== "string") return;
      const to = targetLayer(spec, file, here.srcDir);
      if (!to) return;
      if (FORBIDDEN[here.layer]?.(to)) context.report({ node, messageId: "layer", data: { from: here.layer, to, spec } });
      else if (client && to === "server" && !typeOnly) context.report({ node, messageId: "clientValue", data: { spec } });
    };
    return {
      Program(program) {
        client ||= program.body.some((s) => s.type === "ExpressionStatement" && s.directive === "use client");
      },
      ImportDeclaration: (node) => check(node, node.source.value, isTypeOnly(node)),
      ExportNamedDeclaration: (node) => node.source && check(node, node.source.value, isTypeOnly(node)),
      ExportAllDeclaration: (node) => check(node, node.source.value, node.exportKind === "type"),
      ImportExpression: (node) => node.source.type === "Literal" && check(node, node.source.value, false),
    };
  },
};

export const layersPlugin = { rules: { layers } };
