import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { machines } from "@/server/db/schema";
import type { Role } from "@/shared/auth/roles";
import * as machinesRoute from "@/app/api/machines/route";
import * as machineRoute from "@/app/api/machines/[machineId]/route";
import { createMachineAction } from "@/app/(shop)/machines/actions";
import { createMachine, setMachineActive, updateMachine } from "@/server/machines/mutations";
import { getMachine, listMachines } from "@/server/machines/queries";
import { createStone } from "@/server/stones/mutations";
import { createShopWithMembers } from "../support/fixtures";
import { asUser, callAction, makeRequest, signOutTestUser } from "../support/session";
import { fieldErrorsOf, machineInput, stoneInput } from "./stones-fixtures";

const params = <P>(p: P) => ({ params: Promise.resolve(p) });
const shopMachines = (shopId: string) => db.select().from(machines).where(eq(machines.shopId, shopId));

describe("machines", () => {
  it("the lead adds, edits and retires a machine; everyone in the shop reads it", async () => {
    const shop = await createShopWithMembers("machines-crud");
    const { machineId } = await createMachine({ actor: shop.actors.lead, input: machineInput({ name: "Bay 9 hone", drive: "crank", maxStrokeLengthUm: "8 in" }) });
    expect(await getMachine({ actor: shop.actors.apprentice, machineId })).toMatchObject({ name: "Bay 9 hone", drive: "crank", maxStrokeLengthUm: 203_200, active: true }); // 1 in = 25.4 mm [V S24]
    await updateMachine({ actor: shop.actors.owner, input: { ...machineInput({ name: "Bay 9 hone", pressureUnit: "N", pressureMin: 50, pressureMax: 900 }), machineId } });
    expect(await getMachine({ actor: shop.actors.machinist, machineId })).toMatchObject({ pressureUnit: "N", pressureMin: 50, pressureMax: 900 });
    await setMachineActive({ actor: shop.actors.lead, input: { machineId, active: false } });
    expect((await listMachines({ actor: shop.actors.apprentice })).map((m) => [m.name, m.active])).toEqual([["Bay 9 hone", false]]);
  });

  it("feed pressures typed with their unit are stored in the machine's unit", async () => {
    const shop = await createShopWithMembers("machines-pressure-units");
    const { machineId } = await createMachine({ actor: shop.actors.lead, input: machineInput({ name: "Bay 4 hone", pressureUnit: "bar", pressureMin: "29 psi", pressureMax: "1.2 MPa" }) });
    // 29 psi = 1.9995 bar (1 psi = 6 894.757 Pa exactly, 1959 yard and pound agreement); 1.2 MPa = 12 bar (SI)
    expect(await getMachine({ actor: shop.actors.lead, machineId })).toMatchObject({ pressureMin: 2, pressureMax: 12 });
  });

  it.each([
    [{ spindleRpmMin: 500, spindleRpmMax: 100 }, "spindleRpmMax"],
    [{ spindleRpmMax: 99_999 }, "spindleRpmMax"],
    [{ doubleStrokesPerMinMin: 0 }, "doubleStrokesPerMinMin"],
    [{ doubleStrokesPerMinMin: 100, doubleStrokesPerMinMax: 50 }, "doubleStrokesPerMinMax"],
    [{ maxStrokeLengthUm: 5_000 }, "maxStrokeLengthUm"],
    [{ pressureUnit: "bar", pressureMax: 500 }, "pressureMax"],
    [{ pressureMin: 20, pressureMax: 10 }, "pressureMax"],
    [{ pressureUnit: "psi" }, "pressureUnit"],
    [{ headStoneLengthUm: 250_000, maxStrokeLengthUm: 220_000 }, "headStoneLengthUm"],
    [{ drive: "hydraulic" }, "drive"],
    [{ name: " " }, "name"],
  ])("refuses %j with a field error on %s and writes nothing", async (override, field) => {
    const shop = await createShopWithMembers("machines-limits");
    const errors = await fieldErrorsOf(createMachine({ actor: shop.actors.lead, input: machineInput(override) }));
    expect(Object.keys(errors)).toContain(field);
    expect(await shopMachines(shop.shopId)).toEqual([]);
  });

  it("a machine's maximum stroke must be longer than every active stone", async () => {
    const shop = await createShopWithMembers("machines-fit");
    await createStone({ actor: shop.actors.lead, input: stoneInput({ code: "LONG", stoneLengthUm: 150_000 }) });
    const errors = await fieldErrorsOf(createMachine({ actor: shop.actors.lead, input: machineInput({ maxStrokeLengthUm: 140_000, headStoneLengthUm: 75_000 }) }));
    expect(errors.maxStrokeLengthUm?.[0]).toMatch(/LONG is 150 mm \(5\.91 in\) long/); // 1 in = 25.4 mm [V S24]
  });

  it("a duplicate name is a field error", async () => {
    const shop = await createShopWithMembers("machines-dup");
    await createMachine({ actor: shop.actors.lead, input: machineInput({ name: "Twin" }) });
    expect(await fieldErrorsOf(createMachine({ actor: shop.actors.lead, input: machineInput({ name: "Twin" }) }))).toHaveProperty("name");
  });

  it("role × action matrix: readers read, editors write; 401 signed out; 404 for another shop", async () => {
    const shop = await createShopWithMembers("machines-matrix");
    const other = await createShopWithMembers("machines-matrix-other");
    const { machineId } = await createMachine({ actor: shop.actors.lead, input: machineInput() });
    const expected: Record<Role, number> = { owner: 201, lead: 201, machinist: 403, apprentice: 403 };
    for (const role of Object.keys(expected) as Role[]) {
      await asUser(shop.actors[role]);
      expect((await machinesRoute.GET(makeRequest("/api/machines"), params({}))).status).toBe(200);
      const post = await machinesRoute.POST(makeRequest("/api/machines", { method: "POST", body: machineInput() }), params({}));
      expect([role, post.status]).toEqual([role, expected[role]]);
      const put = await machineRoute.PUT(makeRequest("/m", { method: "PUT", body: machineInput({ notes: role }) }), params({ machineId }));
      expect([role, put.status]).toEqual([role, expected[role] === 201 ? 200 : 403]);
    }
    await asUser(shop.actors.machinist);
    expect(await callAction(createMachineAction, machineInput())).toMatchObject({ ok: false });
    await asUser(other.actors.lead);
    expect((await machineRoute.GET(makeRequest("/m"), params({ machineId }))).status).toBe(404);
    expect((await machineRoute.PUT(makeRequest("/m", { method: "PUT", body: machineInput() }), params({ machineId }))).status).toBe(404);
    signOutTestUser();
    expect((await machinesRoute.GET(makeRequest("/api/machines"), params({}))).status).toBe(401);
  });
});
