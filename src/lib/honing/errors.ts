/** Thrown when a caller passes numbers that contradict each other (a programming or validation slip). */
export class HoningInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = "HoningInputError";
    this.field = field;
  }
}

/** Input guard: a finite number (no rule of the trade; refuses NaN and ±Infinity). */
export function requireFinite(field: string, value: number): void {
  if (!Number.isFinite(value)) throw new HoningInputError(field, "must be a finite number");
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
}
