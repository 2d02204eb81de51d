/// <reference types="vite/client" />
// Issue 18 §2: generated form data and objects to every exported server action (every export of
// src/app/**/*actions.ts, found by glob) as a signed-in member of each role: never an internal error,
// nothing changed when refused, never another shop's data in the answer.
import fc from "fast-check";
import { isRedirectError } from "next/dist/client/components/redirect-error";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { asUser, setClientIp, uniqueTestIp } from "../support/session";
import { bodyArbitrary, schemaKeys, shopFingerprint, shopRowIds } from "../support/fuzz";
import { createFloorPlan } from "./floor-fixtures";
import { ROLES } from "@/shared/auth/roles";

type Action = (previous: null, payload: FormData | Record<string, unknown>) => Promise<{ ok: boolean; message?: string }>;
const actionModules = import.meta.glob<Record<string, unknown>>("/src/app/**/*actions.ts", { eager: true });
const sharedModules = import.meta.glob<Record<string, unknown>>(["/src/shared/**/*.ts", "!/src/shared/**/*.test.ts"], { eager: true });
const RUNS_PER_ACTION = Number(process.env.FUZZ_RUNS ?? 10);
const INTERNAL = "Something went wrong. Nothing was changed.";

const actions = Object.entries(actionModules).flatMap(([file, exports]) =>
  Object.entries(exports).filter((e): e is [string, Action] => typeof e[1] === "function").map(([name, action]) => ({ name: `${file.replace(/^\/src\/app\//, "")} ${name}`, action })),
);

let shop: TestShop;
let other: TestShop;
let otherMarkers: string[];
let arbitraries: ReturnType<typeof bodyArbitrary>;
let userIds: string[];
const outcomes = { ok: 0, refused: 0, redirected: 0 };
afterAll(() => console.info(`fuzz actions: ${JSON.stringify(outcomes)}`));

beforeAll(async () => {
  [shop, other] = await Promise.all([createShopWithMembers("fuzz actions"), createShopWithMembers("fuzz actions other")]);
  await Promise.all([createFloorPlan(shop, 2), createFloorPlan(other, 2)]);
  const otherIds = await shopRowIds(other.shopId);
  otherMarkers = [...otherIds, ...Object.values(other.emails)];
  arbitraries = bodyArbitrary(schemaKeys(sharedModules), [...(await shopRowIds(shop.shopId)), ...otherIds]);
  userIds = [...Object.values(shop.actors), ...Object.values(other.actors)].map((x) => x.userId);
  setClientIp(uniqueTestIp());
}, 120_000);

describe("every server action", () => {
  it("finds the actions", () => expect(actions.length).toBeGreaterThan(30));

  it.each(actions)("$name: no internal error, no change when refused, no other shop's data", async ({ action, name }) => {
    const a = arbitraries;
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...ROLES), fc.oneof(fc.tuple(fc.constant("form" as const), a.form), fc.tuple(fc.constant("object" as const), a.json)), async (role, [kind, body]) => {
        await asUser(shop.actors[role]);
        let payload: FormData | Record<string, unknown>;
        if (kind === "form") {
          payload = new FormData();
          for (const [k, v] of Object.entries(body as Record<string, string>)) payload.append(k, v);
        } else payload = body as Record<string, unknown>;
        const before = await shopFingerprint([shop.shopId, other.shopId], userIds);
        let result: { ok: boolean; message?: string };
        try {
          result = await action(null, payload);
        } catch (error) {
          if (isRedirectError(error)) return void outcomes.redirected++;
          throw error;
        }
        const label = `${name} as ${role}: ${JSON.stringify(result).slice(0, 300)}`;
        expect(result.message, label).not.toBe(INTERNAL);
        const text = JSON.stringify(result);
        const sent = JSON.stringify(body);
        for (const marker of otherMarkers) if (!sent.includes(marker)) expect(text.includes(marker), `${label} shows ${marker}`).toBe(false);
        if (result.ok) return void outcomes.ok++;
        outcomes.refused++;
        expect(await shopFingerprint([shop.shopId, other.shopId], userIds), `${label} changed rows`).toBe(before);
      }),
      { seed: 18, numRuns: RUNS_PER_ACTION, endOnFailure: true },
    );
  });
});
