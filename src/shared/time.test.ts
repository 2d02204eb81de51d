// Check values: the EU rule (clocks go forward at 01:00 UTC on the last Sunday of March and back at
// 01:00 UTC on the last Sunday of October) and the US rule (forward at 02:00 local on the second Sunday
// of March, back at 02:00 local on the first Sunday of November), as kept in the IANA tz database.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { addDays, dateText, dateTimeText, dayStart, isTimeZone, knownTimeZone, shopTimeZoneSchema, timeZoneNames, todayIn, zoneAbbreviation } from "./time";

describe("dateTimeText across DST changes (IANA tz database rules)", () => {
  it.each([
    // Europe/Berlin spring forward 2026-03-29 01:00 UTC: 01:59 CET, then 03:00 CEST.
    ["2026-03-29T00:59:00Z", "Europe/Berlin", "2026-03-29 01:59 UTC+1"],
    ["2026-03-29T01:00:00Z", "Europe/Berlin", "2026-03-29 03:00 UTC+2"],
    // Europe/Berlin fall back 2026-10-25 01:00 UTC: 02:59 CEST, then 02:00 CET again.
    ["2026-10-25T00:59:00Z", "Europe/Berlin", "2026-10-25 02:59 UTC+2"],
    ["2026-10-25T01:00:00Z", "Europe/Berlin", "2026-10-25 02:00 UTC+1"],
    // America/Chicago spring forward 2026-03-08 02:00 CST (08:00 UTC).
    ["2026-03-08T07:59:00Z", "America/Chicago", "2026-03-08 01:59 CST"],
    ["2026-03-08T08:00:00Z", "America/Chicago", "2026-03-08 03:00 CDT"],
    // America/Chicago fall back 2026-11-01 02:00 CDT (07:00 UTC): 01:59 CDT, then 01:00 CST.
    ["2026-11-01T06:59:00Z", "America/Chicago", "2026-11-01 01:59 CDT"],
    ["2026-11-01T07:00:00Z", "America/Chicago", "2026-11-01 01:00 CST"],
    ["2026-11-01T07:00:00Z", "UTC", "2026-11-01 07:00 UTC"],
  ])("%s in %s reads %s", (at, zone, text) => {
    expect(dateTimeText(at, zone)).toBe(text);
  });

  it("the same wall-clock hour twice on a fall-back night is told apart by its abbreviation", () => {
    const first = dateTimeText("2026-11-01T06:30:00Z", "America/Chicago");
    const second = dateTimeText("2026-11-01T07:30:00Z", "America/Chicago");
    expect(first.slice(0, 16)).toBe(second.slice(0, 16));
    expect(first).not.toBe(second);
  });

  it("takes a Date, an ISO string and milliseconds alike, and refuses what is not a time", () => {
    const at = Date.parse("2026-06-15T12:34:56Z");
    expect(dateTimeText(new Date(at), "Asia/Kolkata")).toBe("2026-06-15 18:04 UTC+5:30");
    expect(dateTimeText(at, "Asia/Kolkata")).toBe(dateTimeText(new Date(at).toISOString(), "Asia/Kolkata"));
    expect(() => dateTimeText("yesterday", "UTC")).toThrow(RangeError);
  });
});

describe("the shop's calendar day", () => {
  it("differs from UTC's near midnight", () => {
    expect(dateText("2026-06-01T03:00:00Z", "America/Chicago")).toBe("2026-05-31");
    expect(dateText("2026-06-01T03:00:00Z", "UTC")).toBe("2026-06-01");
    expect(dateText("2026-05-31T22:30:00Z", "Europe/Berlin")).toBe("2026-06-01");
    expect(todayIn("Europe/Berlin", Date.parse("2026-12-31T23:30:00Z"))).toBe("2027-01-01");
  });

  it("begins at local midnight, also on the days the clocks change", () => {
    expect(dayStart("2026-03-29", "Europe/Berlin").toISOString()).toBe("2026-03-28T23:00:00.000Z");
    expect(dayStart("2026-03-30", "Europe/Berlin").toISOString()).toBe("2026-03-29T22:00:00.000Z");
    expect(dayStart("2026-11-01", "America/Chicago").toISOString()).toBe("2026-11-01T05:00:00.000Z");
    expect(dayStart("2026-11-02", "America/Chicago").toISOString()).toBe("2026-11-02T06:00:00.000Z");
    expect(dayStart("2026-06-01", "UTC").toISOString()).toBe("2026-06-01T00:00:00.000Z");
    expect(() => dayStart("2026-6-1", "UTC")).toThrow(RangeError);
  });

  it("a day's start reads as that day at 00:00 or the first minute after a gap, in every zone (property)", () => {
    const zones = timeZoneNames();
    fc.assert(
      fc.property(fc.integer({ min: 0, max: zones.length - 1 }), fc.integer({ min: Date.UTC(2000, 0, 1), max: Date.UTC(2037, 11, 31) }), (z, ms) => {
        const zone = zones[z]!;
        const day = new Date(ms).toISOString().slice(0, 10);
        const start = dayStart(day, zone);
        expect(dateText(start, zone)).toBe(day);
        // One minute earlier is the day before: nothing of the day is left out of a From filter.
        expect(dateText(start.getTime() - 60_000, zone)).toBe(addDays(day, -1));
      }),
      { numRuns: 300, seed: 17 },
    );
  });

  it("adds calendar days without a zone", () => {
    expect(addDays("2026-03-28", 1)).toBe("2026-03-29");
    expect(addDays("2026-12-31")).toBe("2027-01-01");
    expect(addDays("2028-02-28", 1)).toBe("2028-02-29");
    expect(addDays("2026-03-01", -1)).toBe("2026-02-28");
    expect(() => addDays("soon")).toThrow(RangeError);
  });
});

describe("the time-zone setting's schema", () => {
  it("accepts every listed zone, UTC first", () => {
    const zones = timeZoneNames();
    expect(zones[0]).toBe("UTC");
    expect(new Set(zones).size).toBe(zones.length);
    for (const zone of zones) expect(shopTimeZoneSchema.safeParse({ timeZone: zone }).success).toBe(true);
    expect(zones).toEqual(expect.arrayContaining(["Europe/Berlin", "America/Chicago"]));
  });

  it.each(["", "Mars/Olympus", "utc", "Europe/berlin", "x".repeat(65), "Europe/Berlin; drop table shops"])("refuses %j", (timeZone) => {
    const result = shopTimeZoneSchema.safeParse({ timeZone });
    expect(result.success).toBe(false);
  });

  it("reads an unknown stored name as UTC", () => {
    expect(knownTimeZone("Mars/Olympus")).toBe("UTC");
    expect(knownTimeZone(null)).toBe("UTC");
    expect(knownTimeZone("America/Chicago")).toBe("America/Chicago");
    expect(isTimeZone("America/Chicago")).toBe(true);
  });

  it("every listed zone has an abbreviation or an offset", () => {
    for (const zone of timeZoneNames()) expect(zoneAbbreviation("2026-07-01T00:00:00Z", zone)).toMatch(/^([A-Z]{2,5}|UTC[+-]\d{1,2}(:\d{2})?)$/);
  });
});
