// Display units per user (DESIGN.md §5): metric shows sizes in mm and small lengths in µm; inch shows
// sizes in inches and small lengths in thou. Shared by the server and the client (no "server-only").
import { formatLength, type LengthUnit } from "@/lib/honing";

export type UnitSystem = "metric" | "inch";
export type DisplayUnits = { size: LengthUnit; small: LengthUnit };

export function displayUnits(system: UnitSystem): DisplayUnits {
  return system === "inch" ? { size: "in", small: "thou" } : { size: "mm", small: "um" };
}

/** A diameter or length in the user's size unit (mm 3 decimals, in 4). */
export const fmtSize = (um: number, units: DisplayUnits) => formatLength(um, units.size);
/** Stock, taper, out-of-round and clearance in the user's small unit (µm 1 decimal, thou 2). */
export const fmtSmall = (um: number, units: DisplayUnits) => formatLength(um, units.small);
