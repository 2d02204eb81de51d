/// <reference types="vite/client" />
// Issue 18 §2: every zod schema exported from src/shared answers arbitrary input with a result, never
// a throw (a refine or transform that assumes its input's shape would throw inside safeParse). The
// schemas are found by walking the modules' exports, so a new schema is covered without a new line here.
import fc from "fast-check";
import { z } from "zod";
import { describe, expect, it } from "vitest";

const modules = import.meta.glob<Record<string, unknown>>(["./**/*.ts", "!./**/*.test.ts"], { eager: true });

const schemas = Object.entries(modules).flatMap(([file, exports]) =>
  Object.entries(exports)
    .filter((entry): entry is [string, z.ZodType] => entry[1] instanceof z.ZodType)
    .map(([name, schema]) => ({ name: `${file.replace(/^\.\//, "")} ${name}`, schema })),
);

// Shapes a form or a JSON body could take, beside fully arbitrary values.
const formLike = fc.dictionary(fc.string({ maxLength: 12 }), fc.oneof(fc.string({ maxLength: 40 }), fc.constantFrom("", " ", "1e309", "-0", "NaN", "93.92 mm", "2.8 thou", "\u0000", "0x10", "Infinity")), { maxKeys: 8 });
const anyInput = fc.oneof(fc.anything({ maxDepth: 3, withBigInt: true, withDate: true, withMap: true, withSet: true, withNullPrototype: true, withTypedArray: true, withSparseArray: true }), formLike, fc.json().map((text) => JSON.parse(text) as unknown));

describe("every shared zod schema", () => {
  it("finds the schemas", () => {
    expect(schemas.length).toBeGreaterThan(20);
  });

  it.each(schemas)("$name: safeParse never throws", ({ schema }) => {
    fc.assert(
      fc.property(anyInput, (input) => {
        const result = schema.safeParse(input);
        expect(typeof result.success).toBe("boolean");
      }),
      { seed: 18, numRuns: 300 },
    );
  });
});
