/** Thrown when a caller passes numbers that contradict each other (a programming or validation slip). */
export class HoningInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = "HoningInputError";
    this.field = field;
  }
}

/**
 * Largest magnitude any input may have: 10⁹ (a kilometre in µm, a billion strokes or rpm). No number of
 * this trade comes near it, and below it no product of two inputs can overflow to Infinity.
 */
export const MAX_INPUT_MAGNITUDE = 1e9;

/** Smallest value a positive input may have: 10⁻⁹ (a billionth of a µm); dividing by less overflows. */
export const MIN_POSITIVE_INPUT = 1e-9;

/** Input guard: a finite number within ±10⁹ (no rule of the trade; refuses NaN, ±Infinity and overflow). */
export function requireFinite(field: string, value: number): void {
  if (!Number.isFinite(value)) throw new HoningInputError(field, "must be a finite number");
  if (Math.abs(value) > MAX_INPUT_MAGNITUDE) throw new HoningInputError(field, "is beyond any physical value");
}

/** Input guard: a length or count that cannot be below zero. */
export function requireNonNegative(field: string, value: number): void {
  requireFinite(field, value);
  if (value < 0) throw new HoningInputError(field, "must not be negative");
}

/** Input guard: a diameter, length or speed that must be above zero. */
export function requirePositive(field: string, value: number): void {
  requireFinite(field, value);
  if (value <= 0) throw new HoningInputError(field, "must be greater than zero");
  if (value < MIN_POSITIVE_INPUT) throw new HoningInputError(field, "is too small to be a physical value");
}
