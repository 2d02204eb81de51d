/**
 * Shared types of the honing computation. All lengths are micrometres (µm) unless the name
 * says otherwise; speeds are m/min; angles are degrees.
 *
 * Source tags (reference/trade-facts.md): [V] published and read, [M] from memory,
 * [C] common practice, [D] derived.
 */

export type SourceTag = "V" | "M" | "C" | "D";

/** Which way a diameter was read: A = thrust, B = pin axis (90° apart). */
export type Direction = "A" | "B";

/** One level of a reading set, listed from the deck (top) down to the bottom. */
export interface ReadingLevel {
  name: string;
  aUm: number;
  bUm: number;
}

export type StoneRole = "coarse" | "finish" | "plateau";
export type HoneStageKind = StoneRole;
export type StrokeDrive = "constant" | "crank";

export type LengthUnit = "mm" | "in" | "thou" | "um";
