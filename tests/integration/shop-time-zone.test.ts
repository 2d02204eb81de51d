// The shop's time zone: the owner saves it through the settings action (the form's schema, checked on
// the server), an unknown zone is refused and changes nothing, and what the shop sends out reads in it.
import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { emailOutbox, quotes, shops } from "@/server/db/schema";
import { setShopTimeZoneAction } from "@/app/(shop)/settings/actions";
import { createQuote, quoteForLink, sendQuote } from "@/server/billing/quotes";
import { getShopTimeZone, updateShopTimeZone } from "@/server/shop-settings/time-zone";
import { listDashboardJobs } from "@/server/jobs/queries";
import { dateTimeText } from "@/shared/time";
import { asUser, callAction } from "../support/session";
import { createShopWithMembers } from "../support/fixtures";
import { baseRequest, createPlanJob, createPlanShop } from "./plans-fixtures";
import { savePlanDraft } from "@/server/plans/mutations";
import { priceShop } from "./billing-fixtures";
import { expectAppError } from "./jobs-support";
import { createFloorPlan } from "./floor-fixtures";
import { insertRuns } from "./run-log-fixtures";
import { listRunLog } from "@/server/run-log/queries";
import { runLogSchema } from "@/shared/runs/log-schema";

const stored = async (shopId: string) => (await db.select({ timeZone: shops.timeZone }).from(shops).where(eq(shops.id, shopId)))[0]!.timeZone;

describe("shop time zone setting", () => {
  it("starts at UTC, is saved by the owner and refused to everyone else", async () => {
    const shop = await createShopWithMembers("time zone");
    expect(await getShopTimeZone({ shopId: shop.shopId })).toBe("UTC");
    await asUser(shop.actors.owner);
    expect(await callAction(setShopTimeZoneAction, { timeZone: "Europe/Berlin" })).toMatchObject({ ok: true });
    expect(await stored(shop.shopId)).toBe("Europe/Berlin");
    await asUser(shop.actors.lead);
    expect(await callAction(setShopTimeZoneAction, { timeZone: "America/Chicago" })).toMatchObject({ ok: false });
    await expectAppError(updateShopTimeZone({ actor: shop.actors.machinist, input: { timeZone: "America/Chicago" } }), "forbidden");
    expect(await stored(shop.shopId)).toBe("Europe/Berlin");
  });

  it.each(["Mars/Olympus", "", "utc", "europe/berlin", "x".repeat(200), "UTC+2"])("refuses %j with a message and changes nothing", async (timeZone) => {
    const shop = await createShopWithMembers("time zone refused");
    await updateShopTimeZone({ actor: shop.actors.owner, input: { timeZone: "America/Chicago" } });
    await asUser(shop.actors.owner);
    const result = await callAction(setShopTimeZoneAction, { timeZone });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.fieldErrors?.timeZone?.join(" ")).toMatch(/time zone/);
    expect(await stored(shop.shopId)).toBe("America/Chicago");
  });

  it("one shop's setting leaves every other shop's as it was", async () => {
    const [a, b] = await Promise.all([createShopWithMembers("time zone a"), createShopWithMembers("time zone b")]);
    await updateShopTimeZone({ actor: a.actors.owner, input: { timeZone: "Asia/Tokyo" } });
    expect(await stored(b.shopId)).toBe("UTC");
  });
});

describe("what the shop sends reads in its time zone", () => {
  it("the quote mail and the customer's quote page give the link's end in the shop's local time", async () => {
    const shop = await createPlanShop("time zone quote");
    await priceShop(shop.actors.owner);
    await updateShopTimeZone({ actor: shop.actors.owner, input: { timeZone: "America/Chicago" } });
    const job = await createPlanJob(shop.actors.machinist, 4);
    await savePlanDraft({ actor: shop.actors.machinist, input: baseRequest(shop, job.jobId) });
    const id = randomUUID();
    await createQuote({ actor: shop.actors.machinist, input: { id, customerName: "Zone customer (demo)", customerEmail: `tz-${id}@example.test`, jobId: job.jobId, lines: [{ description: "Deck check (demo)", quantity: "1", unitPrice: "40", taxRate: "0" }] } });
    await sendQuote({ actor: shop.actors.machinist, quoteId: id });
    const [row] = await db.select({ expires: quotes.tokenExpiresAt }).from(quotes).where(eq(quotes.id, id));
    const local = dateTimeText(row!.expires!, "America/Chicago");
    expect(local).toMatch(/ C[DS]T$/); // Chicago is UTC−6 or −5: never the UTC text
    const [mail] = await db.select({ html: emailOutbox.html, text: emailOutbox.text }).from(emailOutbox).where(and(eq(emailOutbox.shopId, shop.shopId), eq(emailOutbox.kind, "quote")));
    expect(mail!.text.replace(/\s+/g, " ")).toContain(`expires at ${local}`);
    expect(mail!.text).not.toContain(dateTimeText(row!.expires!, "UTC"));
    const token = /\/quote\/([0-9a-f]{40})/.exec(mail!.html)![1]!;
    expect((await quoteForLink(token))!.timeZone).toBe("America/Chicago");
  });

  it("the dashboard's due window counts from the shop's today, not UTC's", async () => {
    const shop = await createShopWithMembers("time zone dashboard");
    // 03:00 UTC on 1 June is still 31 May in Chicago: seven days on is 7 June there, 8 June in UTC.
    const today = new Date("2026-06-01T03:00:00Z");
    expect((await listDashboardJobs({ actor: shop.actors.owner, days: 7, today })).until).toBe("2026-06-08");
    await updateShopTimeZone({ actor: shop.actors.owner, input: { timeZone: "America/Chicago" } });
    expect((await listDashboardJobs({ actor: shop.actors.owner, days: 7, today })).until).toBe("2026-06-07");
  });
});

describe("the run log's From and To are the shop's days", () => {
  it("a run at 03:00 UTC on 1 June counts on 31 May in Chicago", async () => {
    const shop = await createShopWithMembers("time zone run log");
    const floor = await createFloorPlan(shop);
    const { machinist, lead } = shop.actors;
    await insertRuns(shop.shopId, floor, ["2026-05-31T12:00:00Z", "2026-06-01T03:00:00Z", "2026-06-01T12:00:00Z"].map((at) => ({ loggedBy: machinist.userId, doneAt: new Date(at) })));
    const onDay = async (day: string) => (await listRunLog({ actor: lead, query: runLogSchema.parse({ from: day, to: day }) })).rows.map((r) => r.doneAt);
    expect(await onDay("2026-06-01")).toEqual(["2026-06-01T12:00:00.000Z", "2026-06-01T03:00:00.000Z"]);
    await updateShopTimeZone({ actor: shop.actors.owner, input: { timeZone: "America/Chicago" } });
    expect(await onDay("2026-05-31")).toEqual(["2026-06-01T03:00:00.000Z", "2026-05-31T12:00:00.000Z"]);
    expect(await onDay("2026-06-01")).toEqual(["2026-06-01T12:00:00.000Z"]);
  });
});
