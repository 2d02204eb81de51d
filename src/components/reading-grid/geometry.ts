import { boreGeometry, type BoreGeometry } from "@/lib/honing";

export type Tolerances = { taperToleranceUm: number; outOfRoundToleranceUm: number };
export type GridLevel = { name: string; aUm: number | null; bUm: number | null };

/** Geometry of the levels that have both directions so far (live while typing); null until one does. */
export function liveGeometry(levels: GridLevel[]): BoreGeometry | null {
  const complete = levels.filter((l): l is { name: string; aUm: number; bUm: number } => l.aUm !== null && l.bUm !== null && l.aUm > 0 && l.bUm > 0);
  if (complete.length === 0) return null;
  return boreGeometry({ levels: complete });
}

/** Out-of-round of one level, from the same rule as the whole set. */
export function levelOutOfRound(level: GridLevel): number | null {
  if (level.aUm === null || level.bUm === null || level.aUm <= 0 || level.bUm <= 0) return null;
  return boreGeometry({ levels: [{ name: level.name, aUm: level.aUm, bUm: level.bUm }] }).outOfRoundUm;
}

/** Taper of one direction over the levels typed so far. */
export function directionTaper(levels: GridLevel[], direction: "A" | "B"): number | null {
  const key = direction === "A" ? "aUm" : "bUm";
  const values = levels.map((l) => l[key]).filter((v): v is number => v !== null && v > 0);
  if (values.length < 2) return null;
  // A and B mirrored so boreGeometry's per-direction taper reads this direction alone.
  return boreGeometry({ levels: values.map((v, i) => ({ name: String(i), aUm: v, bUm: v })) }).taperByDirection.A;
}
