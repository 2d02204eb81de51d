// The zod field builders with physical limits (src/shared/limits.ts), for every domain's schema; the
// forms import the same schemas, so client and server refuse the same input. Two families: the form
// fields (`lengthUm`, `numberIn`...) read a form's text or a JSON number; the JSON fields (`umWithin`,
// `valueWithin`) take only numbers, for bodies whose lengths the client already parsed.
import { z } from "zod";
import { UM_PER_INCH, parseLength, type LengthUnit } from "@/lib/honing";
import type { Limits } from "@/shared/limits";
import { parsePressure } from "./quantity";

export type { Limits };

/** A length limit in mm, as exact as it was written: "20 mm", "0.5 mm". */
export const mmText = (um: number) => `${+(um / 1000).toFixed(3)} mm`;

/** A length limit that reads right for metric and inch users alike: "300 mm (11.8 in)". */
export const mmAndInchText = (um: number) => (um === 0 ? mmText(0) : `${mmText(um)} (${+(um / UM_PER_INCH).toPrecision(3)} in)`);

/** A number inside `limits`; `outside` names the limits, `missing` answers anything that is not a number. */
export function numberWithin(limits: Limits, outside: string, missing?: string) {
  return z.number(missing === undefined ? undefined : { error: missing }).min(limits.min, outside).max(limits.max, outside);
}

/** A JSON length in µm inside `limits`, refused with the limits shown by `show` ("The standard bore must be between 20 mm and 400 mm."). */
export function umWithin(label: string, limits: Limits, show: (um: number) => string = mmText) {
  return numberWithin(limits, `The ${label} must be between ${show(limits.min)} and ${show(limits.max)}.`, `Enter the ${label}.`);
}

/** A JSON number inside `limits` ("The spindle speed must be between 10 and 3000 rpm."). */
export function valueWithin(label: string, limits: Limits, unit = "") {
  return numberWithin(limits, `The ${label} must be between ${limits.min} and ${limits.max}${unit}.`, `Enter the ${label}.`);
}

/**
 * A form's length in µm: a JSON number is µm; a form's text is a length with a unit ("75 mm", "2.95 in"),
 * a bare number being in `defaultUnit`. Both end in the same physical limits.
 */
export function lengthUm(label: string, limits: Limits, defaultUnit: LengthUnit = "mm") {
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
    .pipe(numberWithin(limits, `${label} must be ${mmAndInchText(limits.min)} to ${mmAndInchText(limits.max)}.`));
}

/** A plain number (rpm, µm of roughness, bar...) from JSON or from a form's text field. */
export function numberIn(label: string, limits: Limits, unit = "") {
  const suffix = unit ? ` ${unit}` : "";
  return z
    .unknown()
    .transform((value, ctx) => {
      const n = typeof value === "number" ? value : typeof value === "string" && value.trim() !== "" ? Number(value.trim()) : NaN;
      if (Number.isFinite(n)) return n;
      const empty = value === undefined || (typeof value === "string" && value.trim() === "");
      ctx.issues.push({ code: "custom", message: empty ? `Enter ${label.toLowerCase()}.` : `${label} must be a number.`, input: value });
      return z.NEVER;
    })
    .pipe(numberWithin(limits, `${label} must be ${limits.min} to ${limits.max}${suffix}.`));
}

export function integerIn(label: string, limits: Limits, unit = "") {
  return numberIn(label, limits, unit).pipe(z.number().int(`${label} must be a whole number.`));
}

/** An optional number: an empty form field means "not known". */
export function optionalNumberIn(label: string, limits: Limits, unit = "") {
  return z.preprocess((v) => (v === "" || v === null ? undefined : v), numberIn(label, limits, unit).optional());
}

/** An optional length: an empty form field means "not known". */
export function optionalLengthUm(label: string, limits: Limits, defaultUnit: LengthUnit = "mm") {
  return z.preprocess((v) => (v === "" || v === null ? undefined : v), lengthUm(label, limits, defaultUnit).optional());
}

/** A row id from a form or a JSON body. */
export const id = z.string().trim().min(1).max(36);

/** A checkbox: present ("on"/"true") or absent. */
export const checkbox = z.preprocess((v) => v === true || v === "on" || v === "true", z.boolean());

/**
 * Pressure fields may be typed with a unit ("130 psi", "900 kPa"): they are read into the unit the
 * form's `unitField` chose before `schema` checks them, so the form and the server accept the same text.
 */
export function withPressureUnits<T extends z.ZodType>(schema: T, fields: readonly string[], unitField: string) {
  return z.preprocess((raw, ctx) => {
    if (!raw || typeof raw !== "object") return raw;
    const values: Record<string, unknown> = { ...(raw as Record<string, unknown>) };
    const unit = values[unitField];
    if (unit !== "bar" && unit !== "dial" && unit !== "N") return values;
    for (const field of fields) {
      const text = values[field];
      if (typeof text !== "string" || !/[^\d\s.+-]/.test(text)) continue;
      const parsed = parsePressure(text, unit);
      if (parsed.ok) values[field] = parsed.value;
      else ctx.addIssue({ code: "custom", path: [field], message: parsed.error, input: text });
    }
    return values;
  }, schema);
}
