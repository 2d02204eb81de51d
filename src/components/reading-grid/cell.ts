import { parseLength, type LengthUnit } from "@/lib/honing";
import { readingLevelSchema, readingOutOfRange } from "@/shared/readings/schema";

export type CellReading = { um: number | null; error: string | null };

/**
 * One grid cell's text as the server would take it: a value only when the server's schema (and, with
 * the job's standard bore, its range check) accepts it, so a live figure never comes from a refused one.
 */
export function readCell(text: string | undefined, direction: "A" | "B", unit: LengthUnit, standardBoreUm?: number): CellReading {
  if (!text?.trim()) return { um: null, error: null };
  const parsed = parseLength(text, unit);
  if (!parsed.ok) return { um: null, error: parsed.error };
  const checked = readingLevelSchema.shape[direction === "A" ? "aUm" : "bUm"].safeParse(parsed.um);
  if (!checked.success) return { um: null, error: checked.error.issues[0]?.message ?? "Check the value." };
  const range = standardBoreUm === undefined ? null : readingOutOfRange(checked.data, standardBoreUm);
  return range ? { um: null, error: range } : { um: checked.data, error: null };
}
