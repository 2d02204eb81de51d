import type { ReadingLevel } from "./types";

/** The expected bore at one reading level: both directions and their mean, µm. */
export interface LevelDiameter {
  level: string;
  aUm: number;
  bUm: number;
  diameterUm: number;
}

/** A bore along its length, one entry per reading level from the deck down. */
export type Profile = LevelDiameter[];

const level = (name: string, aUm: number, bUm: number): LevelDiameter => ({ level: name, aUm, bUm, diameterUm: (aUm + bUm) / 2 });

export const profileOf = (levels: readonly ReadingLevel[]): Profile => levels.map((l) => level(l.name, l.aUm, l.bUm));

export const uniformProfile = (names: readonly string[], diameterUm: number): Profile => names.map((n) => level(n, diameterUm, diameterUm));

/** The profile after `strokes` double strokes removing `byLevelUm[i]` each at level i [D]. */
export function afterStrokes(profile: Profile, byLevelUm: readonly number[], strokes: number): Profile {
  return profile.map((l, i) => {
    const removed = strokes * (byLevelUm[i] ?? 0);
    return level(l.level, l.aUm + removed, l.bUm + removed);
  });
}

export const tightestUm = (profile: Profile): number => Math.min(...profile.map((l) => Math.min(l.aUm, l.bUm)));
export const largestUm = (profile: Profile): number => Math.max(...profile.map((l) => Math.max(l.aUm, l.bUm)));

/** Worst taper: max − min over the levels, per direction, the larger of the two [D, trade-facts §6.3]. */
export function profileTaperUm(profile: Profile): number {
  const spread = (key: "aUm" | "bUm") => Math.max(...profile.map((l) => l[key])) - Math.min(...profile.map((l) => l[key]));
  return Math.max(spread("aUm"), spread("bUm"));
}

/** The end whose mean is smaller, or null when the ends are equal. */
export function tightEndOf(profile: Profile): "top" | "bottom" | null {
  if (profile.length < 2) return null;
  const top = profile[0]!.diameterUm;
  const bottom = profile[profile.length - 1]!.diameterUm;
  if (Math.abs(top - bottom) < 1e-9) return null;
  return top < bottom ? "top" : "bottom";
}

/**
 * Double strokes (not rounded) until every reading reaches the goal: the level that needs the most
 * decides. Infinity when a level below the goal is never touched.
 */
export function strokesToReach(profile: Profile, byLevelUm: readonly number[], goalUm: number): number {
  let need = 0;
  profile.forEach((l, i) => {
    const short = goalUm - Math.min(l.aUm, l.bUm);
    if (short <= 0) return;
    const rate = byLevelUm[i] ?? 0;
    need = Math.max(need, rate > 0 ? short / rate : Infinity);
  });
  return need;
}
