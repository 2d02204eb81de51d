import { HoningInputError, requireNonNegative, requirePositive } from "./errors";
import type { Direction, ReadingLevel } from "./types";

export interface ReadingPoint {
  level: string;
  levelIndex: number;
  direction: Direction;
  diameterUm: number;
}

export interface BoreGeometry {
  minUm: number;
  maxUm: number;
  spreadUm: number;
  minAt: ReadingPoint;
  maxAt: ReadingPoint;
  /** Worst taper: max − min over the levels, in the direction where it is largest. */
  taperUm: number;
  taperDirection: Direction;
  taperByDirection: Record<Direction, number>;
  /** Worst out-of-round: |A − B| at the level where it is largest. */
  outOfRoundUm: number;
  outOfRoundLevel: string;
  /** The end (first or last level) whose mean diameter is smaller; null when equal or one level. */
  tightEnd: "top" | "bottom" | null;
  /** Mean of A and B at the top level minus the same at the bottom level. */
  endToEndUm: number;
  levelMeansUm: number[];
  rule: string;
}

export const GEOMETRY_RULE =
  "out-of-round = |A − B| per level; taper = max − min over levels per direction; worst of each [D, trade-facts §6.3]";

/** Flattens a reading set into level × direction points (A = thrust, B = pin axis) [DESIGN §5.2]. */
export function readingPoints(levels: readonly ReadingLevel[]): ReadingPoint[] {
  return levels.flatMap((level, levelIndex) => [
    { level: level.name, levelIndex, direction: "A" as const, diameterUm: level.aUm },
    { level: level.name, levelIndex, direction: "B" as const, diameterUm: level.bUm },
  ]);
}

function validateLevels(levels: readonly ReadingLevel[]): void {
  if (levels.length === 0) throw new HoningInputError("levels", "at least one level is needed");
  levels.forEach((level, i) => {
    requirePositive(`levels[${i}].aUm`, level.aUm);
    requirePositive(`levels[${i}].bUm`, level.bUm);
  });
}

function extreme(points: ReadingPoint[], pick: (a: number, b: number) => boolean): ReadingPoint {
  return points.reduce((best, p) => (pick(p.diameterUm, best.diameterUm) ? p : best));
}

function taperOf(levels: readonly ReadingLevel[], key: "aUm" | "bUm"): number {
  const values = levels.map((l) => l[key]);
  return Math.max(...values) - Math.min(...values);
}

function tightEndOf(meansUm: number[]): "top" | "bottom" | null {
  if (meansUm.length < 2) return null;
  const top = meansUm[0]!;
  const bottom = meansUm[meansUm.length - 1]!;
  if (top === bottom) return null;
  return top < bottom ? "top" : "bottom";
}

/** Size spread, taper per direction and out-of-round per level from a reading set, worst of each [D, §6.3]. */
export function boreGeometry(input: { levels: readonly ReadingLevel[] }): BoreGeometry {
  const { levels } = input;
  validateLevels(levels);
  const points = readingPoints(levels);
  const minAt = extreme(points, (a, b) => a < b);
  const maxAt = extreme(points, (a, b) => a > b);
  const taperByDirection = { A: taperOf(levels, "aUm"), B: taperOf(levels, "bUm") };
  const taperDirection: Direction = taperByDirection.B > taperByDirection.A ? "B" : "A";
  const worstRound = levels.reduce((best, l) => (Math.abs(l.aUm - l.bUm) > Math.abs(best.aUm - best.bUm) ? l : best));
  const levelMeansUm = levels.map((l) => (l.aUm + l.bUm) / 2);
  return {
    minUm: minAt.diameterUm,
    maxUm: maxAt.diameterUm,
    spreadUm: maxAt.diameterUm - minAt.diameterUm,
    minAt,
    maxAt,
    taperUm: taperByDirection[taperDirection],
    taperDirection,
    taperByDirection,
    outOfRoundUm: Math.abs(worstRound.aUm - worstRound.bUm),
    outOfRoundLevel: worstRound.name,
    tightEnd: tightEndOf(levelMeansUm),
    endToEndUm: levelMeansUm[0]! - levelMeansUm[levelMeansUm.length - 1]!,
    levelMeansUm,
    rule: GEOMETRY_RULE,
  };
}

export interface GeometryTolerances {
  taperUm: number;
  outOfRoundUm: number;
}

/** Finished-bore defaults: taper 10 µm, out-of-round 5 µm [C, DESIGN §5.2]; the shop's settings override. */
export const DEFAULT_FINISHED_TOLERANCES: GeometryTolerances = { taperUm: 10, outOfRoundUm: 5 };

/** Pass/fail of taper and out-of-round against the shop's tolerances [C, DESIGN §5.2]. */
export function geometryVerdict(
  geometry: Pick<BoreGeometry, "taperUm" | "outOfRoundUm">,
  tolerances: GeometryTolerances = DEFAULT_FINISHED_TOLERANCES,
): { taperOk: boolean; outOfRoundOk: boolean; ok: boolean } {
  requireNonNegative("taperUm", geometry.taperUm);
  requireNonNegative("outOfRoundUm", geometry.outOfRoundUm);
  requireNonNegative("tolerances.taperUm", tolerances.taperUm);
  requireNonNegative("tolerances.outOfRoundUm", tolerances.outOfRoundUm);
  const taperOk = geometry.taperUm <= tolerances.taperUm;
  const outOfRoundOk = geometry.outOfRoundUm <= tolerances.outOfRoundUm;
  return { taperOk, outOfRoundOk, ok: taperOk && outOfRoundOk };
}
