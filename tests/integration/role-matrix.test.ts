// Runs every row of tests/support/matrix.ts as every caller (issue 4 "role × action matrix").
import { beforeAll, describe, expect, it, vi } from "vitest";

// Sending an invoice asks the payment service for its link: this file's own fake, on its own port.
const FAKE_PORT = vi.hoisted(() => {
  const port = 13_800 + Math.floor(Math.random() * 700);
  process.env.PAYMENT_API_BASE = `http://127.0.0.1:${port}`;
  return port;
});

import { CALLERS, MATRIX_CASES, expectedOutcome, type MatrixContext } from "../support/matrix";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { asUser, signOutTestUser } from "../support/session";
import { paymentFakeForFile } from "../support/payment-fake";

paymentFakeForFile(FAKE_PORT);

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
