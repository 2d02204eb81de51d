// Zod building blocks of the library (stones and machines): notes and the reason every change needs.
// Numbers and lengths: src/shared/fields.ts.
import { z } from "zod";
import { integerIn } from "@/shared/fields";

export const notes = z.string().trim().max(500, "Notes must be at most 500 characters.").default("");

/** Why a change was made: required for every change of the library (issue 6). */
export const reason = z
  .string({ error: "Say why you are making this change." })
  .trim()
  .min(3, "Say why you are making this change (at least 3 characters).")
  .max(500, "Keep the reason under 500 characters.");

/** A reason a caller may leave out (a new row): checked like any reason, else the default. */
export function optionalReason(value: unknown, fallback: string): string {
  return z.object({ reason: reason.optional() }).parse({ reason: value ?? undefined }).reason ?? fallback;
}

export const expectedVersion = integerIn("Version", { min: 1, max: 1_000_000 });

/** The length fields of the library forms: a bare number in them is in the user's size unit. */
export const STONE_LENGTH_FIELDS = ["stoneLengthUm", "stoneWidthUm", "startHeightUm", "wearLimitHeightUm", "currentHeightUm"] as const;
export const RATE_LENGTH_FIELDS = ["referenceBoreLengthUm", "referenceDiameterUm"] as const;
export const MACHINE_LENGTH_FIELDS = ["maxStrokeLengthUm", "headStoneLengthUm"] as const;
