// The one way dates and times are shown: in the shop's time zone (an IANA name), with its
// abbreviation or UTC offset beside every time. Pages, mails and PDFs all format through here.
import { z } from "zod";
import { format } from "date-fns";
import { TZDate, tz, tzName } from "@date-fns/tz";

export const DEFAULT_TIME_ZONE = "UTC";
export const TIME_ZONE_MAX_LENGTH = 64;

type Instant = Date | string | number;

let known: { list: readonly string[]; set: ReadonlySet<string> } | null = null;

function zones() {
  // The engine's list leaves out "UTC" itself, the default of every shop.
  if (!known) {
    const list = [DEFAULT_TIME_ZONE, ...Intl.supportedValuesOf("timeZone").filter((n) => n !== DEFAULT_TIME_ZONE)];
    known = { list, set: new Set(list) };
  }
  return known;
}

/** Every zone a shop may choose: UTC first, then the engine's IANA names. */
export const timeZoneNames = (): readonly string[] => zones().list;

export const isTimeZone = (name: string): boolean => zones().set.has(name);

/** A stored name the engine no longer knows is read as UTC rather than failing a page. */
export const knownTimeZone = (name: string | null | undefined): string => (name && isTimeZone(name) ? name : DEFAULT_TIME_ZONE);

export const timeZoneSchema = z
  .string({ error: "Choose a time zone." })
  .trim()
  .min(1, "Choose a time zone.")
  .max(TIME_ZONE_MAX_LENGTH, `A time zone name is at most ${TIME_ZONE_MAX_LENGTH} characters.`)
  .refine(isTimeZone, "Choose a time zone from the list.");

export const shopTimeZoneSchema = z.object({ timeZone: timeZoneSchema });
export type ShopTimeZoneInput = z.infer<typeof shopTimeZoneSchema>;

const instant = (at: Instant): Date => {
  const d = at instanceof Date ? at : new Date(at);
  if (Number.isNaN(d.getTime())) throw new RangeError(`Not a date and time: ${String(at)}`);
  return d;
};

/** "CEST", "CDT", "UTC", or "UTC+5:30" where the zone has no letters in English. */
export function zoneAbbreviation(at: Instant, zone: string): string {
  const short = tzName(zone, instant(at), "short");
  return short.replace(/^GMT(?=[+-]|$)/, "UTC");
}

/** "2026-03-29 03:15 CEST": the wall-clock time in the zone, to the minute, with its abbreviation. */
export function dateTimeText(at: Instant, zone: string): string {
  const d = instant(at);
  return `${format(d, "yyyy-MM-dd HH:mm", { in: tz(zone) })} ${zoneAbbreviation(d, zone)}`;
}

/** "2026-03-29": the calendar day in the zone (the shop's day, which may differ from UTC's). */
export const dateText = (at: Instant, zone: string): string => format(instant(at), "yyyy-MM-dd", { in: tz(zone) });

/** "2026-03-29 03:15": the wall-clock time without the zone, for a column whose header names it. */
export const clockText = (at: Instant, zone: string): string => format(instant(at), "yyyy-MM-dd HH:mm", { in: tz(zone) });

/** The shop's calendar day today. */
export const todayIn = (zone: string, now: Instant = Date.now()): string => dateText(now, zone);

/** The instant a calendar day ("YYYY-MM-DD") begins in the zone: midnight, or the first time after a DST gap. */
export function dayStart(day: string, zone: string): Date {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  if (!m) throw new RangeError(`Not a day: ${day}`);
  return new Date(new TZDate(Number(m[1]), Number(m[2]) - 1, Number(m[3]), zone).getTime());
}

/** The calendar day `days` after "YYYY-MM-DD" (calendar arithmetic: no zone, so no DST hour to lose). */
export function addDays(day: string, days = 1): string {
  const d = /^\d{4}-\d{2}-\d{2}$/.test(day) ? new Date(`${day}T00:00:00Z`) : new Date(Number.NaN);
  if (Number.isNaN(d.getTime())) throw new RangeError(`Not a day: ${day}`);
  return new Date(d.getTime() + days * 86_400_000).toISOString().slice(0, 10);
}
