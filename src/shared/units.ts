// Display units per user (DESIGN.md §5): metric shows sizes in mm and small lengths in µm; inch shows
// sizes in inches and small lengths in thou. The one place lengths are formatted for a screen, a
// message or a mail; every value comes from the server.
import { formatLength, parseLength, type LengthUnit } from "@/lib/honing";

export const UNIT_SYSTEMS = ["metric", "inch"] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];
export type DisplayUnits = { system: UnitSystem; size: LengthUnit; small: LengthUnit };

export function displayUnits(system: UnitSystem): DisplayUnits {
  return system === "inch" ? { system, size: "in", small: "thou" } : { system, size: "mm", small: "um" };
}
export const METRIC: DisplayUnits = displayUnits("metric");

const known = (v: number | null | undefined): v is number => v != null && Number.isFinite(v);

/** A diameter or length in the user's size unit (mm 3 decimals, in 4). */
export const size = (um: number | null | undefined, u: DisplayUnits) => (known(um) ? formatLength(um, u.size) : "—");
/** Stock, taper, out-of-round and clearance in the user's small unit (µm 1 decimal, thou 2). */
export const small = (um: number | null | undefined, u: DisplayUnits) => (known(um) ? formatLength(um, u.small) : "—");
/** Lengths of the set-up (stone, stroke, stops): mm with one decimal, or inches. */
export const setup = (um: number | null | undefined, u: DisplayUnits) =>
  known(um) ? formatLength(um, u.system === "inch" ? "in" : "mm", { decimals: u.system === "inch" ? 3 : 1 }) : "—";
/** The set-up length unit of a display system: mm or in. */
export const setupUnit = (u: Pick<DisplayUnits, "system">): LengthUnit => (u.system === "inch" ? "in" : "mm");
/**
 * A stop position from the deck, in words: "12.5 mm above the deck" or "110.0 mm below the deck". The plan
 * measures down into the bore from the deck, so a negative figure is above it. The one formatter of stops.
 */
export function fromDeck(um: number | null | undefined, unit: LengthUnit): string {
  if (!known(um)) return "—";
  const text = formatLength(Math.abs(um), unit, unit === "mm" ? { decimals: 1 } : unit === "in" ? { decimals: 3 } : undefined);
  if (um === 0) return "at the deck";
  return `${text} ${um < 0 ? "above" : "below"} the deck`;
}
/** What is left of a stone above its wear limit, in words: "3.00 mm left (limit 2.00 mm)". */
export function heightLeft(currentUm: number | null | undefined, limitUm: number | null | undefined, units: DisplayUnits, mmDecimals = 2): string {
  return `${length(currentUm, units, mmDecimals)} left (limit ${length(limitUm, units, mmDecimals)})`;
}
export const fixed = (value: number | null | undefined, decimals = 1) => (known(value) ? value.toFixed(decimals) : "—");

/**
 * A stone or machine length in the user's size unit. `mmDecimals` is the metric resolution; inches get
 * two more decimals (0.1 mm ≈ 0.004 in), at most the 4 the trade writes inches with.
 */
export function length(um: number | null | undefined, units: DisplayUnits, mmDecimals = 1): string {
  if (!known(um)) return "—";
  const decimals = units.size === "in" ? Math.min(mmDecimals + 2, 4) : mmDecimals;
  return formatLength(um, units.size, { decimals });
}
/** Removal, roughness and clean-up stock: always µm, the unit rate rows are entered in and the trade quotes them in. */
export const micro = (um: number | null | undefined, decimals = 2) => (um == null ? "—" : `${trim(um, decimals)} µm`);
export const plain = (n: number | null | undefined, decimals = 3) => (n == null ? "" : trim(n, decimals));
function trim(n: number, decimals: number): string {
  return String(Number(n.toFixed(decimals)));
}

const BARE_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;

/**
 * A form's length text read in the user's unit, for the shared schemas (whose bare numbers mean mm):
 * a length becomes µm rounded to the database's 0.1 µm, so an untouched field compares equal to what
 * is stored; text that is not a length keeps its words (and gains the user's unit if bare) so the
 * schema refuses it with the same reason the field showed.
 */
export function readLengthText(value: unknown, units: DisplayUnits): unknown {
  if (typeof value !== "string" || value.trim() === "") return value;
  const text = BARE_NUMBER.test(value.trim()) ? `${value.trim()} ${units.size}` : value;
  const parsed = parseLength(text, units.size);
  return parsed.ok ? Math.round(parsed.um * 10) / 10 : text;
}
