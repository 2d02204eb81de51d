// How the wizard shows lengths for the viewer's unit system (DESIGN.md §5): sizes in mm or in, small
// lengths (stock, clearance) in µm or thou. Formatting only: every value comes from the server.
import { formatLength, type LengthUnit } from "@/lib/honing";

export type UnitSystem = "metric" | "inch";
export type Units = { system: UnitSystem; size: LengthUnit; small: LengthUnit };

export const unitsFor = (system: UnitSystem): Units =>
  system === "inch" ? { system, size: "in", small: "thou" } : { system, size: "mm", small: "um" };

export const size = (um: number | null | undefined, u: Units) => (um == null || !Number.isFinite(um) ? "—" : formatLength(um, u.size));
export const small = (um: number | null | undefined, u: Units) => (um == null || !Number.isFinite(um) ? "—" : formatLength(um, u.small));
/** Lengths of the set-up (stone, stroke, stops): mm with one decimal, or inches. */
export const setup = (um: number | null | undefined, u: Units) =>
  um == null || !Number.isFinite(um) ? "—" : formatLength(um, u.system === "inch" ? "in" : "mm", { decimals: u.system === "inch" ? 3 : 1 });
export const fixed = (value: number | null | undefined, decimals = 1) => (value == null || !Number.isFinite(value) ? "—" : value.toFixed(decimals));
