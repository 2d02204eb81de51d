import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { safeNext } from "./safe-next";

const APP = "https://app.borewise.test";
const origin = new URL(APP).origin;

describe("safeNext", () => {
  it("keeps our own paths with their query", () => {
    expect(safeNext("/jobs/42?tab=plan", APP)).toBe("/jobs/42?tab=plan");
    expect(safeNext("/", APP)).toBe("/");
  });

  it("sends the tab trick and its relatives to the app, never elsewhere", () => {
    for (const bad of ["/\t/evil.example", "/\n/evil.example", "/\r//evil.example", "//evil.example", "/\\evil.example", "\\\\evil.example",
      "https://evil.example", "javascript:alert(1)", " /x", "/%09/evil.example/../", "evil.example", "/\u0000/evil.example", "/\u007f/x", "/.//evil.example", "/a/..//evil.example"]) {
      const next = safeNext(bad, APP);
      expect(new URL(next, origin).origin, JSON.stringify(bad)).toBe(origin);
      expect(next.startsWith("//")).toBe(false);
    }
    expect(safeNext("/\t/evil.example", APP)).toBe("/");
  });

  it("never yields a target off our origin, whatever the input (property)", () => {
    const piece = fc.constantFrom("/", "\\", "\t", "\n", "\r", "//", "evil.example", "@", ":", "%2f", "%5c", ".", "..", "?", "#", "http:", " ", "\u0000", "a");
    const crafted = fc.array(piece, { maxLength: 8 }).map((parts) => parts.join(""));
    fc.assert(fc.property(fc.oneof(crafted, fc.string({ maxLength: 60 })), (input) => {
      const next = safeNext(input, APP);
      const resolved = new URL(next, origin);
      // What the browser would do with a Location of `next` on our page: same origin, and an absolute path.
      return resolved.origin === origin && next.startsWith("/") && !next.startsWith("//") && !/[\u0000-\u001f\\]/.test(next);
    }), { numRuns: 5000 });
  });
});
