// Runs every row of tests/support/matrix.ts as every caller (issue 4 "role × action matrix").
import { beforeAll, describe, expect, it } from "vitest";
import { CALLERS, MATRIX_CASES, expectedOutcome, type MatrixContext } from "../support/matrix";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { asUser, signOutTestUser } from "../support/session";

let shop: TestShop;
let otherShop: TestShop;

beforeAll(async () => {
  shop = await createShopWithMembers("matrix");
  otherShop = await createShopWithMembers("matrix-other");
});

describe.each(MATRIX_CASES)("$name", (testCase) => {
  it.each(CALLERS)("as %s", async (caller) => {
    signOutTestUser();
    let callerUserId: string | null = null;
    if (caller === "other-shop") callerUserId = (await asUser(otherShop.actors.owner), otherShop.actors.owner.userId);
    else if (caller !== "signed-out") callerUserId = (await asUser(shop.actors[caller]), shop.actors[caller].userId);
    const context: MatrixContext = { shop, otherShop, callerUserId };
    expect(await testCase.call(context)).toBe(expectedOutcome(testCase, caller));
  });
});
