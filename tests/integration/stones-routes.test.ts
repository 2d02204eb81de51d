import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { rateRows, stones } from "@/server/db/schema";
import type { Role } from "@/shared/auth/roles";
import * as stonesRoute from "@/app/api/stones/route";
import * as stoneRoute from "@/app/api/stones/[stoneId]/route";
import * as rateRoute from "@/app/api/stones/[stoneId]/rates/[rateRowId]/route";
import * as historyRoute from "@/app/api/stones/[stoneId]/history/route";
import * as versionRoute from "@/app/api/stones/[stoneId]/history/[versionId]/route";
import * as nearRoute from "@/app/api/stones/near-wear-limit/route";
import { updateRateRowAction, createStoneAction } from "@/app/(shop)/stones/actions";
import { createShopWithMembers, type TestShop } from "../support/fixtures";
import { asUser, callAction, makeRequest, signOutTestUser } from "../support/session";
import { rateInput, stoneInput, stoneWithRate } from "./stones-fixtures";

const params = <P>(p: P) => ({ params: Promise.resolve(p) });
const EDITORS: Role[] = ["owner", "lead"];
const READERS: Role[] = ["machinist", "apprentice"];
const expectStatus = (allowed: number): Array<[Role, number]> => [...EDITORS.map((r): [Role, number] => [r, allowed]), ...READERS.map((r): [Role, number] => [r, 403])];

let shop: TestShop;
let other: TestShop;
let ids: { stoneId: string; rateRowId: string };
beforeAll(async () => {
  shop = await createShopWithMembers("stones-routes");
  other = await createShopWithMembers("stones-routes-other");
  ids = await stoneWithRate(shop.actors.lead, { code: "R-1" });
});

describe("role × action matrix: stone library routes", () => {
  it.each([...EDITORS, ...READERS])("%s reads the list, a stone, its history and the wear list (200)", async (role) => {
    await asUser(shop.actors[role]);
    expect((await stonesRoute.GET(makeRequest("/api/stones"), params({}))).status).toBe(200);
    expect((await stoneRoute.GET(makeRequest(`/api/stones/${ids.stoneId}`), params({ stoneId: ids.stoneId }))).status).toBe(200);
    expect((await historyRoute.GET(makeRequest("/h"), params({ stoneId: ids.stoneId }))).status).toBe(200);
    expect((await nearRoute.GET(makeRequest("/n"), params({}))).status).toBe(200);
  });

  it.each(expectStatus(201))("%s creating a stone gets %i", async (role, status) => {
    await asUser(shop.actors[role]);
    const response = await stonesRoute.POST(makeRequest("/api/stones", { method: "POST", body: stoneInput({ code: `RM-${role}` }) }), params({}));
    expect(response.status).toBe(status);
  });

  it.each(expectStatus(200))("%s editing a rate row gets %i", async (role, status) => {
    await asUser(shop.actors[role]);
    const [row] = await db.select().from(rateRows).where(eq(rateRows.id, ids.rateRowId));
    const body = { ...rateInput(ids.stoneId, { notes: `by ${role}` }), expectedVersion: row!.version, reason: `Matrix check by ${role}` };
    const response = await rateRoute.PUT(makeRequest("/r", { method: "PUT", body }), params(ids));
    expect(response.status).toBe(status);
  });

  it("a signed-out visitor gets 401; a cross-site post gets 403; another shop's member gets 404", async () => {
    signOutTestUser();
    expect((await stonesRoute.GET(makeRequest("/api/stones"), params({}))).status).toBe(401);
    await asUser(shop.actors.lead);
    const crossSite = await stonesRoute.POST(makeRequest("/api/stones", { method: "POST", body: stoneInput(), origin: "https://evil.example" }), params({}));
    expect(crossSite.status).toBe(403);
    await asUser(other.actors.lead);
    expect((await stoneRoute.GET(makeRequest("/s"), params({ stoneId: ids.stoneId }))).status).toBe(404);
    const body = { ...rateInput(ids.stoneId), expectedVersion: 1, reason: "Not my shop" };
    expect((await rateRoute.PUT(makeRequest("/r", { method: "PUT", body }), params(ids))).status).toBe(404);
  });

  it("bad input is a 400 with field errors and writes nothing", async () => {
    await asUser(shop.actors.lead);
    const before = await db.select().from(stones).where(eq(stones.shopId, shop.shopId));
    const response = await stonesRoute.POST(makeRequest("/api/stones", { method: "POST", body: stoneInput({ grit: "400", stoneLengthUm: 1 }) }), params({}));
    expect(response.status).toBe(400);
    const json = (await response.json()) as { fieldErrors: Record<string, string[]> };
    expect(Object.keys(json.fieldErrors)).toEqual(expect.arrayContaining(["grit", "stoneLengthUm"]));
    expect(await db.select().from(stones).where(eq(stones.shopId, shop.shopId))).toHaveLength(before.length);
    const notJson = await stonesRoute.POST(makeRequest("/api/stones", { method: "POST", body: "{not json" }), params({}));
    expect(notJson.status).toBe(400);
  });

  it("restoring through the route makes a new version", async () => {
    await asUser(shop.actors.lead);
    const { stoneId } = await stoneWithRate(shop.actors.lead, { code: "R-restore" });
    const history = (await (await historyRoute.GET(makeRequest("/h"), params({ stoneId }))).json()) as { history: Array<{ id: string; subject: string }> };
    const versionId = history.history.find((h) => h.subject === "stone")!.id;
    await asUser(shop.actors.apprentice);
    expect((await versionRoute.POST(makeRequest("/v", { method: "POST", body: { reason: "No" } }), params({ stoneId, versionId }))).status).toBe(403);
    await asUser(shop.actors.lead);
    const ok = await versionRoute.POST(makeRequest("/v", { method: "POST", body: { reason: "Back to the first figures" } }), params({ stoneId, versionId }));
    expect(ok.status).toBe(200);
    expect(await ok.json()).toMatchObject({ subject: "stone", changed: false }); // nothing differs from version 1 yet
  });
});

describe("server actions", () => {
  it("the apprentice's action is refused; the lead's rate edit needs a reason and then writes a version", async () => {
    await asUser(shop.actors.apprentice);
    expect(await callAction(createStoneAction, stoneInput())).toMatchObject({ ok: false, message: expect.stringContaining("does not allow") });
    await asUser(shop.actors.lead);
    const { stoneId, rateRowId } = await stoneWithRate(shop.actors.lead, { code: "R-action" });
    const { stoneId: _stone, ...rate } = rateInput(stoneId, { removalPerDoubleStrokeUm: "1.7", rkUm: "", referenceBoreLengthUm: "140 mm" });
    void _stone;
    const fields = { ...rate, rateRowId, expectedVersion: 1 } as Record<string, string | number>;
    const refused = await callAction(updateRateRowAction, { ...fields, reason: "" });
    expect(refused).toMatchObject({ ok: false, fieldErrors: { reason: [expect.any(String)] } });
    const saved = await callAction(updateRateRowAction, { ...fields, reason: "Measured on three blocks" }).catch((e: Error) => e);
    expect(saved).toMatchObject({ message: "NEXT_REDIRECT" });
    const [row] = await db.select().from(rateRows).where(eq(rateRows.id, rateRowId));
    expect(row).toMatchObject({ removalPerDoubleStrokeUm: 1.7, version: 2 });
  });
});
