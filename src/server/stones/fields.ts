// Zod building blocks shared by the stone and machine schemas. No "server-only": the forms import the
// same schemas and limits, so client and server refuse the same input.
import { z } from "zod";
import { parseLength, type LengthUnit } from "@/lib/honing";

const mm = (um: number) => `${+(um / 1000).toFixed(3)} mm`;

/**
 * A length in µm: a JSON number is µm; a form's text is a length with a unit ("75 mm", "2.95 in"),
 * a bare number being in `defaultUnit`. Both end in the same physical limits.
 */
export function lengthUm(label: string, minUm: number, maxUm: number, defaultUnit: LengthUnit = "mm") {
  const limits = `${label} must be ${mm(minUm)} to ${mm(maxUm)}.`;
  return z
    .unknown()
    .transform((value, ctx) => {
      if (typeof value === "number") return value;
      if (value === undefined || value === null || (typeof value === "string" && value.trim() === "")) {
        ctx.issues.push({ code: "custom", message: `Enter the ${label.toLowerCase()}.`, input: value });
        return z.NEVER;
      }
      const parsed = parseLength(typeof value === "string" ? value : "", defaultUnit);
      if (parsed.ok) return parsed.um;
      ctx.issues.push({ code: "custom", message: `${label}: ${parsed.error}`, input: value });
      return z.NEVER;
    })
    .pipe(z.number().finite(limits).min(minUm, limits).max(maxUm, limits));
}

/** A plain number (rpm, µm of roughness, bar...) from JSON or from a form's text field. */
export function numberIn(label: string, min: number, max: number, unit = "") {
  const suffix = unit ? ` ${unit}` : "";
  const limits = `${label} must be ${min} to ${max}${suffix}.`;
  return z
    .unknown()
    .transform((value, ctx) => {
      const n = typeof value === "number" ? value : typeof value === "string" && value.trim() !== "" ? Number(value.trim()) : NaN;
      if (Number.isFinite(n)) return n;
      const empty = value === undefined || (typeof value === "string" && value.trim() === "");
      ctx.issues.push({ code: "custom", message: empty ? `Enter ${label.toLowerCase()}.` : `${label} must be a number.`, input: value });
      return z.NEVER;
    })
    .pipe(z.number().min(min, limits).max(max, limits));
}

export function integerIn(label: string, min: number, max: number, unit = "") {
  return numberIn(label, min, max, unit).pipe(z.number().int(`${label} must be a whole number.`));
}

/** An optional number: an empty form field means "not known". */
export function optionalNumberIn(label: string, min: number, max: number, unit = "") {
  return z.preprocess((v) => (v === "" || v === null ? undefined : v), numberIn(label, min, max, unit).optional());
}

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

export const id = z.string().trim().min(1).max(36);

export const expectedVersion = integerIn("Version", 1, 1_000_000);

/** A checkbox: present ("on"/"true") or absent. */
export const checkbox = z.preprocess((v) => v === true || v === "on" || v === "true", z.boolean());
