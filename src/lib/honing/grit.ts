import { GRIT_TABLES } from "./grit-tables";
import type { GritRow, GritScale } from "./grit-tables";

export type { GritScale, GritRow } from "./grit-tables";

export interface Grit {
  scale: GritScale;
  number: number;
}

export interface GritScaleInfo {
  id: GritScale;
  label: string;
  standard: string;
  measure: string;
  /** How the scale is written, e.g. "F400", "JIS #400". */
  example: string;
}

/** The scales a stone's grit may be given in; never a bare number [C, trade-facts §3.4]. */
export const GRIT_SCALES: readonly GritScaleInfo[] = [
  { id: "FEPA-F", label: "FEPA F", standard: "FEPA F ≅ ISO 8486 (bonded)", measure: "sieve band midpoint (macro), ds50 (micro)", example: "F400" },
  { id: "JIS", label: "JIS", standard: "JIS R 6001 precision microgrits", measure: "d50", example: "JIS #400" },
  { id: "ANSI", label: "ANSI/CAMI", standard: "ANSI / CAMI (coated)", measure: "average particle size", example: "ANSI 400" },
  { id: "FEPA-P", label: "FEPA P", standard: "FEPA P ≅ ISO 6344 (coated)", measure: "average particle size", example: "P400" },
  { id: "D", label: "Diamond D", standard: "FEPA / ISO 6106 superabrasive", measure: "sieve apertures midpoint", example: "D54" },
  { id: "B", label: "CBN B", standard: "FEPA / ISO 6106 superabrasive", measure: "sieve apertures midpoint", example: "B54" },
];

/** Valid grit numbers per scale, smallest first. */
const numbersOf = (scale: GritScale) => GRIT_TABLES[scale].map((r) => r.number).sort((a, b) => a - b);

export const GRIT_NUMBERS: Record<GritScale, readonly number[]> = {
  "FEPA-F": numbersOf("FEPA-F"), JIS: numbersOf("JIS"), ANSI: numbersOf("ANSI"),
  "FEPA-P": numbersOf("FEPA-P"), D: numbersOf("D"), B: numbersOf("B"),
};

/** The valid grit numbers of one scale. */
export function validGritNumbers(scale: GritScale): readonly number[] {
  return GRIT_NUMBERS[scale];
}

/** The table row of a grit, or null when the scale has no such number. */
export function gritRow(grit: Grit): GritRow | null {
  return GRIT_TABLES[grit.scale].find((r) => r.number === grit.number) ?? null;
}

/** Mean grain size in µm from the published tables (JIS [V S11], FEPA [V S12/M], P and CAMI [V S13/M], D/B [V S14]). */
export function gritGrainSizeUm(grit: Grit): number | null {
  return gritRow(grit)?.grainSizeUm ?? null;
}

const PATTERNS: ReadonlyArray<readonly [GritScale, RegExp]> = [
  ["JIS", /^jis\s*#?\s*(\d+)$/],
  ["JIS", /^#\s*(\d+)\s*\(?jis\)?$/],
  ["FEPA-F", /^(?:fepa[\s-]*)?f\s*-?\s*(\d+)$/],
  ["FEPA-P", /^(?:fepa[\s-]*)?p\s*-?\s*(\d+)$/],
  ["ANSI", /^(?:ansi|cami)(?:\s*\/\s*(?:ansi|cami))?\s*#?\s*(\d+)$/],
  ["D", /^d\s*(\d+)$/],
  ["B", /^b\s*(\d+)$/],
];

export type ParseGritResult =
  | { ok: true; grit: Grit }
  | { ok: false; code: "GRIT_SCALE_MISSING" | "GRIT_NOT_IN_SCALE" | "GRIT_UNREADABLE"; error: string };

const BARE = /^#?\s*(\d+)(?:\s*grit)?$/;

/** Reads "F400", "JIS #400", "P400", "ANSI 400", "D54"; refuses a bare "400", whose size depends on the scale [C, §3.4]. */
export function parseGrit(text: string): ParseGritResult {
  const t = String(text ?? "").trim().toLowerCase().replace(/\s+/g, " ");
  if (BARE.test(t)) {
    return { ok: false, code: "GRIT_SCALE_MISSING", error: `"${text.trim()}" has no scale: JIS #400 is about 30 µm, P400 about 35 µm. Write e.g. "JIS #400", "F400", "P400", "ANSI 400" or "D54".` };
  }
  for (const [scale, pattern] of PATTERNS) {
    const match = pattern.exec(t);
    if (!match) continue;
    const number = Number(match[1]);
    if (GRIT_NUMBERS[scale].includes(number)) return { ok: true, grit: { scale, number } };
    return { ok: false, code: "GRIT_NOT_IN_SCALE", error: `${scale} has no grit ${number}. Valid: ${GRIT_NUMBERS[scale].join(", ")}.` };
  }
  return { ok: false, code: "GRIT_UNREADABLE", error: `"${text.trim().slice(0, 24)}" is not a grit. Write a scale and number, e.g. "JIS #400" or "F400".` };
}

/** Writes a grit the way parseGrit reads it. */
export function formatGrit(grit: Grit): string {
  if (grit.scale === "JIS") return `JIS #${grit.number}`;
  if (grit.scale === "FEPA-F") return `F${grit.number}`;
  if (grit.scale === "FEPA-P") return `P${grit.number}`;
  if (grit.scale === "ANSI") return `ANSI ${grit.number}`;
  return `${grit.scale}${grit.number}`;
}
