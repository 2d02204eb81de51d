import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { preferCachedOnServerError } from "./server-error-fallback";

const page = (status: number, body = "network") => new Response(body, { status });

describe("preferCachedOnServerError", () => {
  it("keeps every answer below 500, cached copy or not, without looking in the cache", async () => {
    await fc.assert(fc.asyncProperty(fc.integer({ min: 200, max: 499 }).filter((s) => s !== 204 && s !== 205 && s !== 304), async (status) => {
      let looked = false;
      const answer = await preferCachedOnServerError(page(status), async () => { looked = true; return page(200, "cached"); });
      expect(answer.status).toBe(status);
      expect(looked).toBe(false);
    }));
  });

  it("answers a 5xx with the cached page when the tablet has one, else with the server's answer", async () => {
    await fc.assert(fc.asyncProperty(fc.integer({ min: 500, max: 599 }), fc.boolean(), async (status, hasCopy) => {
      const answer = await preferCachedOnServerError(page(status), async () => (hasCopy ? page(200, "cached") : undefined));
      expect(answer.status).toBe(hasCopy ? 200 : status);
      expect(await answer.text()).toBe(hasCopy ? "cached" : "network");
    }));
  });
});
