// Review fixes (issue 6): the reason of a new stone set from the API is checked like every reason.
import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { stoneVersions, stones } from "@/server/db/schema";
import * as stonesRoute from "@/app/api/stones/route";
import { createRateRow } from "@/server/stones/rate-mutations";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { asUser, makeRequest } from "../support/session";
import { fieldErrorsOf, rateInput, stoneInput } from "./stones-fixtures";

const noParams = { params: Promise.resolve({}) };
let shop: TestShop;
beforeAll(async () => {
  shop = await createShopWithMembers("stones-review");
});

async function postStone(body: Record<string, unknown>) {
  await asUser(shop.actors.lead);
  const response = await stonesRoute.POST(makeRequest("/api/stones", { method: "POST", body }), noParams);
  return { status: response.status, json: (await response.json()) as { stoneId?: string; fieldErrors?: Record<string, string[]> } };
}

const stonesWithCode = async (code: string) => db.select().from(stones).where(and(eq(stones.shopId, shop.shopId), eq(stones.code, code)));

describe("creating a stone set through the API with a reason", () => {
  it.each([
    ["too long", "x".repeat(501)],
    ["too short", "ok"],
    ["not text", 42],
  ])("a reason that is %s is a field error and writes nothing", async (_label, reason) => {
    const input = stoneInput();
    const { status, json } = await postStone({ ...input, reason });
    expect(status).toBe(400);
    expect(json.fieldErrors?.reason).toEqual(expect.any(Array));
    expect(await stonesWithCode(input.code)).toHaveLength(0);
  });

  it("a blank reason falls back to the default; a good one is kept in the first version", async () => {
    const blank = await postStone({ ...stoneInput(), reason: "  " });
    expect(blank.status).toBe(201);
    const [first] = await db.select().from(stoneVersions).where(eq(stoneVersions.stoneId, blank.json.stoneId!));
    expect(first?.reason).toBe("Added to the library");

    const given = await postStone({ ...stoneInput(), reason: "  Bought a second set for the liner jobs  " });
    expect(given.status).toBe(201);
    const [kept] = await db.select().from(stoneVersions).where(eq(stoneVersions.stoneId, given.json.stoneId!));
    expect(kept?.reason).toBe("Bought a second set for the liner jobs");
  });

  it("a rate row's creation reason is checked the same way", async () => {
    const { json } = await postStone(stoneInput());
    const errors = await fieldErrorsOf(createRateRow({ actor: shop.actors.lead, input: rateInput(json.stoneId!), reason: "y".repeat(600) }));
    expect(errors.reason).toEqual(expect.any(Array));
  });
});
