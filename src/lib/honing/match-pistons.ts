import { HoningInputError, requireFinite } from "./errors";
import { hungarian, maximumMatching } from "./assignment";

export interface MatchPistonsInput {
  pistons: ReadonlyArray<{ id: string; diameterUm: number }>;
  bores: ReadonlyArray<{ id: string; diameterUm: number }>;
  clearanceMinUm: number;
  clearanceMaxUm: number;
}

export interface PistonPair {
  boreId: string;
  pistonId: string;
  clearanceUm: number;
}

export type MatchPistonsResult =
  | {
      ok: true;
      pairs: PistonPair[];
      spreadUm: number;
      minClearanceUm: number;
      maxClearanceUm: number;
      /** Pistons left over when there are more pistons than bores. */
      sparePistonIds: string[];
      rule: string;
    }
  | {
      ok: false;
      reason: "NOT_ENOUGH_PISTONS" | "NO_FIT";
      /** Bores with no piston at all inside the band. */
      boresWithoutAnyFit: string[];
      /** Bores left without a piston by a largest possible in-band assignment. */
      unmatchedBoreIds: string[];
      largestMatchedCount: number;
      message: string;
    };

export const MATCH_RULE =
  "exact: every clearance (bore − piston) in [min, max]; minimise spread = max − min clearance; ties: least Σ(clearance − band middle)²";

const BIG_COST = 1e15;
const EPS = 1e-9;

interface Problem {
  clearance: number[][];
  bores: MatchPistonsInput["bores"];
  pistons: MatchPistonsInput["pistons"];
  inBand: (c: number) => boolean;
}

const windowAllowed = (pb: Problem, lo: number, hi: number) => pb.clearance.map((row) => row.map((c) => pb.inBand(c) && c >= lo - EPS && c <= hi + EPS));

/** Sliding window over the sorted in-band clearances: for each lower end the smallest feasible upper end. */
function minimalWindows(pb: Problem, values: number[]): Array<[number, number]> {
  const feasible = (i: number, j: number) => maximumMatching(windowAllowed(pb, values[i]!, values[j]!), pb.pistons.length).size === pb.bores.length;
  const windows: Array<[number, number]> = [];
  let j = 0;
  for (let i = 0; i < values.length; i++) {
    j = Math.max(j, i);
    while (j < values.length && !feasible(i, j)) j++;
    if (j === values.length) break;
    windows.push([values[i]!, values[j]!]);
  }
  const best = Math.min(...windows.map(([lo, hi]) => hi - lo));
  return windows.filter(([lo, hi]) => hi - lo <= best + EPS);
}

function bestInWindows(pb: Problem, windows: Array<[number, number]>, middle: number): number[] {
  let best: { cost: number; columns: number[] } | null = null;
  for (const [lo, hi] of windows) {
    const allowed = windowAllowed(pb, lo, hi);
    const cost = pb.clearance.map((row, r) => row.map((c, k) => (allowed[r]![k] ? (c - middle) ** 2 : BIG_COST)));
    const columns = hungarian(cost, pb.pistons.length);
    const total = columns.reduce((sum, k, r) => sum + cost[r]![k]!, 0);
    if (best === null || total < best.cost - EPS) best = { cost: total, columns };
  }
  return best!.columns;
}

function infeasible(pb: Problem): MatchPistonsResult {
  const allowed = pb.clearance.map((row) => row.map(pb.inBand));
  const { size, columnOfRow } = maximumMatching(allowed, pb.pistons.length);
  const notEnough = pb.pistons.length < pb.bores.length;
  return {
    ok: false,
    reason: notEnough ? "NOT_ENOUGH_PISTONS" : "NO_FIT",
    boresWithoutAnyFit: pb.bores.filter((_, r) => !allowed[r]!.some(Boolean)).map((b) => b.id),
    unmatchedBoreIds: pb.bores.filter((_, r) => columnOfRow[r] === -1).map((b) => b.id),
    largestMatchedCount: size,
    message: notEnough
      ? `${pb.bores.length} bores but only ${pb.pistons.length} pistons.`
      : `At most ${size} of ${pb.bores.length} bores can get a piston inside the clearance band.`,
  };
}

/** Most pistons or bores one matching takes. */
export const MAX_MATCH_COUNT = 48;

/** Assigns pistons to bores with every clearance in band and the smallest spread (exact, bottleneck + Hungarian) [D, DESIGN §5.6]. */
export function matchPistons(input: MatchPistonsInput): MatchPistonsResult {
  const { clearanceMinUm: min, clearanceMaxUm: max } = input;
  requireFinite("clearanceMinUm", min);
  requireFinite("clearanceMaxUm", max);
  if (min > max) throw new HoningInputError("clearanceMinUm", "must not exceed clearanceMaxUm");
  // The exact matching grows with the cube of the count: a block has at most 16 bores, a set a few spares.
  if (input.bores.length > MAX_MATCH_COUNT) throw new HoningInputError("bores", `at most ${MAX_MATCH_COUNT} bores`);
  if (input.pistons.length > MAX_MATCH_COUNT) throw new HoningInputError("pistons", `at most ${MAX_MATCH_COUNT} pistons`);
  input.bores.forEach((b, i) => requireFinite(`bores[${i}].diameterUm`, b.diameterUm));
  input.pistons.forEach((p, i) => requireFinite(`pistons[${i}].diameterUm`, p.diameterUm));
  const pb: Problem = {
    bores: input.bores,
    pistons: input.pistons,
    clearance: input.bores.map((b) => input.pistons.map((p) => b.diameterUm - p.diameterUm)),
    inBand: (c) => c >= min - EPS && c <= max + EPS,
  };
  if (pb.bores.length === 0) return { ok: true, pairs: [], spreadUm: 0, minClearanceUm: 0, maxClearanceUm: 0, sparePistonIds: pb.pistons.map((p) => p.id), rule: MATCH_RULE };
  const values = [...new Set(pb.clearance.flat().filter(pb.inBand))].sort((a, b) => a - b);
  if (pb.pistons.length < pb.bores.length || maximumMatching(windowAllowed(pb, -Infinity, Infinity), pb.pistons.length).size < pb.bores.length) return infeasible(pb);
  const columns = bestInWindows(pb, minimalWindows(pb, values), (min + max) / 2);
  const pairs = pb.bores.map((b, r) => ({ boreId: b.id, pistonId: pb.pistons[columns[r]!]!.id, clearanceUm: pb.clearance[r]![columns[r]!]! }));
  const clearances = pairs.map((p) => p.clearanceUm);
  const used = new Set(columns);
  return {
    ok: true, pairs, spreadUm: Math.max(...clearances) - Math.min(...clearances), minClearanceUm: Math.min(...clearances), maxClearanceUm: Math.max(...clearances),
    sparePistonIds: pb.pistons.filter((_, k) => !used.has(k)).map((p) => p.id), rule: MATCH_RULE,
  };
}
