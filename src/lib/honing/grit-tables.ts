import type { SourceTag } from "./types";

export type GritScale = "FEPA-F" | "JIS" | "ANSI" | "FEPA-P" | "D" | "B";

export interface GritRow {
  number: number;
  /** Mean grain size, µm (see the scale's measure). */
  grainSizeUm: number;
  /** ± tolerance where the table gives one (JIS). */
  toleranceUm?: number;
  /** Sieve band the size comes from (FEPA F macrogrits, D/B). */
  bandUm?: readonly [number, number];
  usMesh?: string;
  tag: SourceTag;
  source: string;
}

const jis = (number: number, d50: number, tol: number): GritRow => ({ number, grainSizeUm: d50, toleranceUm: tol, tag: "V", source: "JIS R 6001:1987 d50 [V S11]" });

/** JIS R 6001:1987 precision microgrits, d50 [V S11]. */
const JIS: GritRow[] = [
  jis(240, 57.0, 3.0), jis(280, 48.0, 3.0), jis(320, 40.0, 2.5), jis(360, 35.0, 2.0),
  jis(400, 30.0, 2.0), jis(500, 25.0, 2.0), jis(600, 20.0, 1.5), jis(700, 17.0, 1.3),
  jis(800, 14.0, 1.0), jis(1000, 11.5, 1.0), jis(1200, 9.5, 0.8), jis(1500, 8.0, 0.6),
  jis(2000, 6.7, 0.6), jis(2500, 5.5, 0.5), jis(3000, 4.0, 0.5), jis(4000, 3.0, 0.4),
];

const geometricMidpoint = (lo: number, hi: number) => Math.sqrt(lo * hi);
const band = (number: number, lo: number, hi: number, tag: SourceTag, source: string, usMesh?: string): GritRow => ({
  number, grainSizeUm: geometricMidpoint(lo, hi), bandUm: [lo, hi], tag, source, ...(usMesh && { usMesh }),
});
const fepaMacro = (n: number, lo: number, hi: number) => band(n, lo, hi, "D", "FEPA F 42-D-1986 80 % sieve band, geometric midpoint [V S12, D]");
const fepaMicro = (number: number, ds50: number): GritRow => ({ number, grainSizeUm: ds50, tag: "M", source: "FEPA F microgrit ds50, from memory [M]" });

/** FEPA F: macrogrits from the sieve table [V S12] (midpoint [D]); microgrits ds50 from memory [M]. */
const FEPA_F: GritRow[] = [
  fepaMacro(80, 150, 212), fepaMacro(100, 106, 150), fepaMacro(120, 90, 125),
  fepaMacro(150, 63, 106), fepaMacro(180, 63, 90), fepaMacro(220, 53, 75),
  fepaMicro(230, 53.0), fepaMicro(240, 44.5), fepaMicro(280, 36.5), fepaMicro(320, 29.2),
  fepaMicro(360, 22.8), fepaMicro(400, 17.3), fepaMicro(500, 12.8), fepaMicro(600, 9.3),
  fepaMicro(800, 6.5), fepaMicro(1000, 4.5), fepaMicro(1200, 3.0),
];

const avg = (number: number, um: number, tag: SourceTag, source: string): GritRow => ({ number, grainSizeUm: um, tag, source });
const pV = (n: number, um: number) => avg(n, um, "V", "coated-abrasive average particle size [V S13]");
const pM = (n: number, um: number) => avg(n, um, "M", "coated-abrasive average particle size, from memory [M]");

/** FEPA P coated abrasives, average particle size [V S13 / M]. */
const FEPA_P: GritRow[] = [
  pV(60, 269), pV(80, 201), pV(100, 162), pV(120, 125), pM(180, 82), pM(220, 68), pM(240, 58.5),
  pM(320, 46.2), pM(400, 35.0), pM(600, 25.8), pM(800, 21.8), pM(1000, 18.3), pM(1200, 15.3),
];

/** ANSI/CAMI coated abrasives, average particle size [V S13 / M]. */
const ANSI: GritRow[] = [pV(60, 268), pV(80, 192), pV(100, 141), pM(220, 68), pM(320, 36), pM(400, 23.6), pM(600, 16.0)];

const SUPER_BANDS: ReadonlyArray<readonly [number, number, number, string]> = [
  [181, 150, 180, "80/100"], [151, 125, 150, "100/120"], [126, 106, 125, "120/140"], [107, 90, 106, "140/170"],
  [91, 75, 90, "170/200"], [76, 63, 75, "200/230"], [64, 53, 63, "230/270"], [54, 45, 53, "270/325"], [46, 38, 45, "325/400"],
];
const superRows = (): GritRow[] =>
  SUPER_BANDS.map(([n, lo, hi, mesh]) => band(n, lo, hi, "D", "FEPA/ISO 6106 sieve apertures, geometric midpoint [V S14, D]", mesh)).sort((a, b) => a.number - b.number);

export const GRIT_TABLES: Record<GritScale, readonly GritRow[]> = {
  "FEPA-F": FEPA_F, JIS, ANSI, "FEPA-P": FEPA_P, D: superRows(), B: superRows(),
};
