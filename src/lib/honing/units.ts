import { requireFinite } from "./errors";
import type { LengthUnit } from "./types";

/** 1 in = 25.4 mm exactly (1959 international yard) [V S24]. */
export const UM_PER_INCH = 25_400;
export const UM_PER_THOU = 25.4;
export const UM_PER_MM = 1_000;

/** Largest length any field accepts: 2 m. Anything bigger is a typing slip, not a bore. */
export const MAX_LENGTH_UM = 2_000_000;

const UM_PER_UNIT: Record<LengthUnit, number> = {
  mm: UM_PER_MM,
  in: UM_PER_INCH,
  thou: UM_PER_THOU,
  um: 1,
};

const UNIT_WORDS: ReadonlyArray<readonly [LengthUnit, readonly string[]]> = [
  ["mm", ["mm", "millimetre", "millimetres", "millimeter", "millimeters"]],
  ["um", ["µm", "μm", "um", "micron", "microns", "micrometre", "micrometres", "micrometer", "micrometers"]],
  ["in", ["in", "in.", "inch", "inches", '"', "″", "''"]],
  ["thou", ["thou", "thou.", "mil", "mils", "thousandths"]],
];

const NUMBER_WITH_UNIT = /^([+-]?)(\d+(?:\.\d*)?|\.\d+)\s*(.*)$/;

export type ParseLengthResult = { ok: true; um: number } | { ok: false; error: string };

/** Removes float noise from a unit conversion (e.g. 93.92 × 1000); exact for inputs of ≤ 15 digits. */
function clean(value: number): number {
  return Number(value.toPrecision(15));
}

/** Converts a value in `unit` to µm; 1 in = 25.4 mm exactly [V S24]. */
export function toUm(value: number, unit: LengthUnit): number {
  requireFinite("value", value);
  return clean(value * UM_PER_UNIT[unit]);
}

/** Converts µm to `unit`; 1 in = 25.4 mm exactly [V S24]. */
export function fromUm(um: number, unit: LengthUnit): number {
  requireFinite("um", um);
  return clean(um / UM_PER_UNIT[unit]);
}

function unitFromWord(word: string): LengthUnit | null {
  const lower = word.toLowerCase();
  for (const [unit, words] of UNIT_WORDS) if (words.includes(lower)) return unit;
  return null;
}

function describe(text: string): string {
  return text.length > 24 ? `${text.slice(0, 24)}…` : text;
}

/** Parses "93.92 mm", "3.6977 in", "2.8 thou", "70 µm" or a bare number in `defaultUnit` into µm (DESIGN §5). */
export function parseLength(text: string, defaultUnit: LengthUnit): ParseLengthResult {
  const trimmed = String(text ?? "").trim();
  if (trimmed === "") return { ok: false, error: "Enter a length, e.g. 86.05 mm or 3.3878 in." };
  if (/^\d+,\d+/.test(trimmed)) {
    return { ok: false, error: `Use a point for decimals: write "${describe(trimmed.replace(",", "."))}".` };
  }
  const match = NUMBER_WITH_UNIT.exec(trimmed);
  if (!match) {
    return { ok: false, error: `"${describe(trimmed)}" is not a length. Write a number with mm, in, thou or µm.` };
  }
  const [, sign = "", digits = "", unitText = ""] = match;
  const unit = unitText === "" ? defaultUnit : unitFromWord(unitText.trim());
  if (unit === null) {
    return { ok: false, error: `Unknown unit "${describe(unitText.trim())}". Use mm, in, thou or µm.` };
  }
  const value = Number(digits);
  if (!Number.isFinite(value)) return { ok: false, error: "That number is too large to be a length." };
  if (sign === "-" && value !== 0) return { ok: false, error: "A length cannot be negative." };
  const um = toUm(value, unit);
  if (um > MAX_LENGTH_UM) {
    // Past formatLength's ±10⁹ guard a figure cannot be shown, only refused.
    const shown = um < 1e9 ? formatLength(um, unit) : "That length";
    return { ok: false, error: `${shown} is more than 2 m; check the unit and the decimal point.` };
  }
  return { ok: true, um };
}

/**
 * An oversize step in the unit it is sold in: whole hundredths of an inch (0.010 in = 254 µm) read as
 * inches, everything else as millimetres, so 500 µm is "+0.50 mm", never "+0.020 in" [V S24, trade-facts §7].
 */
export function formatOversizeStep(um: number): string {
  if (!Number.isFinite(um)) return "—";
  if (um === 0) return "standard";
  const inchStep = Math.abs(um / 254 - Math.round(um / 254)) < 1e-9 && Math.abs(um / 250 - Math.round(um / 250)) > 1e-9;
  return inchStep ? `+${(um / UM_PER_INCH).toFixed(3)} in` : `+${(um / UM_PER_MM).toFixed(2)} mm`;
}

const DEFAULT_DECIMALS: Record<LengthUnit, number> = { mm: 3, in: 4, thou: 2, um: 1 };
const UNIT_LABEL: Record<LengthUnit, string> = { mm: "mm", in: "in", thou: "thou", um: "µm" };

/** Formats µm in the given unit with its label: mm 3 decimals, in 4, thou 2, µm 1 by default (DESIGN §5). */
export function formatLength(um: number, unit: LengthUnit, options: { decimals?: number } = {}): string {
  // A display function: a missing number shows as a dash rather than "NaN mm" or a broken page.
  if (!Number.isFinite(um)) return `— ${UNIT_LABEL[unit]}`;
  const decimals = options.decimals ?? DEFAULT_DECIMALS[unit];
  const text = fromUm(um, unit).toFixed(decimals);
  const noNegativeZero = /^-0\.?0*$/.test(text) ? text.slice(1) : text;
  return `${noNegativeZero} ${UNIT_LABEL[unit]}`;
}
