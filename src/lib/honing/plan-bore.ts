import { HoningInputError, requireNonNegative, requirePositive } from "./errors";
import { boreGeometry, readingPoints } from "./geometry";
import type { BoreGeometry, ReadingPoint } from "./geometry";
import type { BoreStateInput } from "./plan-types";
import type { FinishedBore } from "./sizing";
import { profileOf, uniformProfile, type Profile } from "./profile";
import type { BoreOverTargetChoice, PlanIssue } from "./warnings";

export interface BoreState {
  geometry: BoreGeometry | null;
  /** The bore along its length; one typed size or stock stands for every level. */
  profile: Profile;
  minUm: number;
  maxUm: number;
  points: ReadingPoint[];
  levels: string[];
}

const DEFAULT_LEVELS = ["top", "middle", "bottom"];
const MAX_LEVELS = 20;

/** Reduces any of the three bore inputs to its smallest and largest diameter [DESIGN §5.3]. */
export function describeBore(bore: BoreStateInput, sizing: FinishedBore): BoreState {
  if (bore.kind === "readings") {
    const geometry = boreGeometry({ levels: bore.levels });
    if (bore.levels.length > MAX_LEVELS) throw new HoningInputError("bore.levels", `at most ${MAX_LEVELS} levels`);
    return { geometry, profile: profileOf(bore.levels), minUm: geometry.minUm, maxUm: geometry.maxUm, points: readingPoints(bore.levels), levels: bore.levels.map((l) => l.name) };
  }
  if (bore.kind === "diameter") {
    requirePositive("bore.diameterUm", bore.diameterUm);
    const point: ReadingPoint = { level: "measured", levelIndex: 0, direction: "A", diameterUm: bore.diameterUm };
    return { geometry: null, profile: uniformProfile(DEFAULT_LEVELS, bore.diameterUm), minUm: bore.diameterUm, maxUm: bore.diameterUm, points: [point], levels: DEFAULT_LEVELS };
  }
  if (bore.kind === "stock") {
    requireNonNegative("bore.stockUm", bore.stockUm);
    const d = sizing.targetUm - bore.stockUm;
    if (d <= 0) throw new HoningInputError("bore.stockUm", "is more than the whole finished bore");
    return { geometry: null, profile: uniformProfile(DEFAULT_LEVELS, d), minUm: d, maxUm: d, points: [], levels: DEFAULT_LEVELS };
  }
  throw new HoningInputError("bore.kind", "must be readings, diameter or stock");
}

function choicesFor(readingUm: number, sizing: FinishedBore): BoreOverTargetChoice[] {
  const choices: BoreOverTargetChoice[] = [
    { kind: "NEXT_OVERSIZE" },
    { kind: "OTHER_PISTON", pistonAtLeastUm: readingUm - sizing.clearanceTargetUm - sizing.performanceAllowanceUm },
  ];
  if (readingUm <= sizing.maxUm) choices.push({ kind: "LARGER_CLEARANCE", newTargetUm: readingUm });
  return choices;
}

/** Any reading above the target cannot be honed to size: say where and by how much [DESIGN §5.3]. */
export function boreOverTarget(state: BoreState, sizing: FinishedBore): PlanIssue[] {
  const over = state.points.filter((p) => p.diameterUm > sizing.targetUm).sort((a, b) => b.diameterUm - a.diameterUm);
  const worst = over[0];
  return over.map((p) => ({
    code: "BORE_OVER_TARGET" as const,
    severity: "error" as const,
    level: p.level,
    direction: p.direction,
    readingUm: p.diameterUm,
    targetUm: sizing.targetUm,
    overByUm: p.diameterUm - sizing.targetUm,
    bandMaxUm: sizing.maxUm,
    choices: choicesFor(worst!.diameterUm, sizing),
    message: `At ${p.level} ${p.direction} the bore is already ${(p.diameterUm - sizing.targetUm).toFixed(1)} µm over the target.`,
  }));
}
