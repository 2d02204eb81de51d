// Stones and machines in the user's unit (DESIGN.md §5): a bare number in a library form means the
// signed-in user's size unit, and an untouched edit form saves nothing new in either unit system.
import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { machines, stones, users } from "@/server/db/schema";
import type { Actor } from "@/shared/auth/policy";
import { createStoneAction, updateStoneAction } from "@/app/(shop)/stones/actions";
import { createMachineAction } from "@/app/(shop)/machines/actions";
import { viewerUnits } from "@/server/units";
import { readLengthText } from "@/shared/units";
import { stoneFieldSpecs } from "@/components/stones/field-specs";
import { getStoneDetail } from "@/server/stones/queries";
import { displayUnits } from "@/shared/units";
import { lengthText } from "@/components/length-text";
import type { LibraryField } from "@/components/stones/library-form";
import { createShopWithMembers } from "../support/fixtures";
import { asUser, callAction } from "../support/session";
import { machineInput, stoneInput, uniqueCode } from "./stones-fixtures";

const INCH = displayUnits("inch");
const METRIC = displayUnits("metric");

async function inchUser(actor: Actor) {
  await db.update(users).set({ unitSystem: "inch" }).where(eq(users.id, actor.userId));
}

/** What the browser posts for an untouched form: each field's initial text. */
function untouched(fields: LibraryField[]): Record<string, string> {
  return Object.fromEntries(fields.map((f) => [f.name, f.kind === "length" ? lengthText(f.defaultUm, f.lengthUnit ?? "mm") : f.defaultValue ?? ""]));
}

describe("reading a library form's length text", () => {
  it("reads a bare number in the user's unit and keeps a typed unit (1 in = 25.4 mm exactly [V S24])", () => {
    expect(readLengthText("4", INCH)).toBe(101_600);
    expect(readLengthText("4", METRIC)).toBe(4_000);
    expect(readLengthText("100 mm", INCH)).toBe(100_000);
    expect(readLengthText("3.937008", INCH)).toBe(100_000); // rounded to the database's 0.1 µm
    expect(readLengthText("", INCH)).toBe("");
    expect(readLengthText("abc", INCH)).toBe("abc");
    expect(readLengthText("80", INCH)).toBe("80 in"); // 2032 mm: refused by the schema with its unit
    expect(readLengthText(5_000, INCH)).toBe(5_000); // JSON numbers are µm already
  });
});

describe("library forms in the user's unit", () => {
  it("an inch user's bare numbers are inches; an untouched edit writes no new version", async () => {
    const shop = await createShopWithMembers("lib-units-inch");
    await inchUser(shop.actors.lead);
    expect(await viewerUnits(shop.actors.lead)).toEqual(INCH);
    await asUser(shop.actors.lead);
    const code = uniqueCode("IN");
    const created = await callAction(createStoneAction, {
      ...stoneInput({ code }), stoneLengthUm: "4", stoneWidthUm: "0.25", startHeightUm: "0.315", wearLimitHeightUm: "2 mm", currentHeightUm: "0.3",
    }).catch((e: Error) => e);
    expect(created).toMatchObject({ message: "NEXT_REDIRECT" });
    const [row] = await db.select().from(stones).where(eq(stones.code, code));
    expect(row).toMatchObject({ stoneLengthUm: 101_600, stoneWidthUm: 6_350, startHeightUm: 8_001, wearLimitHeightUm: 2_000, currentHeightUm: 7_620 });

    const { stone } = await getStoneDetail({ actor: shop.actors.lead, stoneId: row!.id });
    const form = untouched(stoneFieldSpecs(stone, INCH));
    expect(form.stoneLengthUm).toBe("4");
    const again = await callAction(updateStoneAction, { ...form, stoneId: stone.id, expectedVersion: stone.version, reason: "Saved without a change" });
    expect(again).toMatchObject({ ok: true, message: expect.stringContaining("Nothing changed") });
  });

  it("an untouched metric edit of an odd length writes nothing new either", async () => {
    const shop = await createShopWithMembers("lib-units-metric");
    await asUser(shop.actors.lead);
    const code = uniqueCode("MM");
    await callAction(createStoneAction, { ...stoneInput({ code }), stoneLengthUm: "100.05", stoneWidthUm: "6.35", startHeightUm: "8", wearLimitHeightUm: "2", currentHeightUm: "7.0125" }).catch(() => null);
    const [row] = await db.select().from(stones).where(eq(stones.code, code));
    expect(row).toMatchObject({ stoneLengthUm: 100_050, currentHeightUm: 7_012.5 });
    const { stone } = await getStoneDetail({ actor: shop.actors.lead, stoneId: row!.id });
    const form = untouched(stoneFieldSpecs(stone, METRIC));
    expect(form).toMatchObject({ stoneLengthUm: "100.05", currentHeightUm: "7.0125" });
    const again = await callAction(updateStoneAction, { ...form, stoneId: stone.id, expectedVersion: stone.version, reason: "Saved without a change" });
    expect(again).toMatchObject({ ok: true, message: expect.stringContaining("Nothing changed") });
  });

  it("a machine's bare lengths follow the user's unit; a slip past 2 m is refused with the reason", async () => {
    const shop = await createShopWithMembers("lib-units-machine");
    await inchUser(shop.actors.owner);
    await asUser(shop.actors.lead);
    const metricName = `Metric ${uniqueCode("M")}`;
    expect(await callAction(createMachineAction, { ...machineInput({ name: metricName }), maxStrokeLengthUm: "220", headStoneLengthUm: "100" })).toMatchObject({ ok: true });
    await asUser(shop.actors.owner);
    const inchName = `Inch ${uniqueCode("M")}`;
    expect(await callAction(createMachineAction, { ...machineInput({ name: inchName }), maxStrokeLengthUm: "8.5", headStoneLengthUm: "4" })).toMatchObject({ ok: true });
    const rows = await db.select().from(machines).where(eq(machines.shopId, shop.shopId));
    const byName = Object.fromEntries(rows.map((m) => [m.name, m]));
    expect(byName[metricName]).toMatchObject({ maxStrokeLengthUm: 220_000, headStoneLengthUm: 100_000 });
    expect(byName[inchName]).toMatchObject({ maxStrokeLengthUm: 215_900, headStoneLengthUm: 101_600 });
    const slip = await callAction(createMachineAction, { ...machineInput(), maxStrokeLengthUm: "80", headStoneLengthUm: "4" });
    expect(slip).toMatchObject({ ok: false, fieldErrors: { maxStrokeLengthUm: [expect.stringContaining("more than 2 m")] } });
  });
});
