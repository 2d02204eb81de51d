// Billing inputs are checked where they enter the pure code, so a bad number names its field instead
// of turning into a wrong total.
export class BillingInputError extends Error {
  constructor(readonly field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = "BillingInputError";
  }
}

export function requireWhole(field: string, value: number, min: number, max: number): number {
  if (!Number.isSafeInteger(value)) throw new BillingInputError(field, "must be a whole number");
  if (value < min || value > max) throw new BillingInputError(field, `must be between ${min} and ${max}`);
  return value;
}

export function requireNumber(field: string, value: number, min: number, max: number): number {
  if (!Number.isFinite(value)) throw new BillingInputError(field, "must be a finite number");
  if (value < min || value > max) throw new BillingInputError(field, `must be between ${min} and ${max}`);
  return value;
}
