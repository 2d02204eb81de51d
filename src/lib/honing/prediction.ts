import { requireFinite } from "./errors";

/** Median of |predicted − actual| over the runs that have a prediction; null with none. */
export function medianAbsoluteError(pairs: ReadonlyArray<{ predicted: number; actual: number }>): number | null {
  const errors = pairs.map((p, i) => {
    requireFinite(`pairs[${i}].predicted`, p.predicted);
    requireFinite(`pairs[${i}].actual`, p.actual);
    return Math.abs(p.predicted - p.actual);
  }).sort((a, b) => a - b);
  if (errors.length === 0) return null;
  const mid = Math.floor(errors.length / 2);
  return errors.length % 2 === 1 ? errors[mid]! : (errors[mid - 1]! + errors[mid]!) / 2;
}
