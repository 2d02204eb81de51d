import { DEFAULT_AS_RECEIVED_CLEANUP_UM, DEFAULT_BORING_RZ_UM, DEFAULT_PLATEAU_STOCK_UM, honingAllowance, plateauStockOf } from "./allowance";
import { HoningInputError } from "./errors";
import { DEFAULT_FINISHED_TOLERANCES } from "./geometry";
import { boreOverTarget, describeBore } from "./plan-bore";
import type { BoreState } from "./plan-bore";
import { finalIssues } from "./plan-final";
import { buildHoneStage } from "./plan-stage";
import { chooseStones, invalidStoneRates } from "./plan-stones";
import type { ChosenStones } from "./plan-stones";
import { validatePlanOptions } from "./plan-validate";
import type { BoreStage, DwellBlock, HonePlan, HoneStage, PlanHoneInput, PlanStage, StockSummary, StoneInput } from "./plan-types";
import { uniformProfile, type Profile } from "./profile";
import { levelDepthsUm } from "./removal";
import { runSequence, stageSettings, type StageSettings, type StageSpec } from "./sequence";
import { finishedBore } from "./sizing";
import type { FinishedBore } from "./sizing";
import { splitStock, type StageShare } from "./stages";
import type { CuttingStone } from "./stages";
import { cleanupStockOf } from "./strokes";
import { DEFAULT_TAPER_TOLERANCE_UM, planTaperCorrection, taperToCorrect } from "./taper";
import type { PlanIssue } from "./warnings";

export { DEFAULT_PLATEAU_STOCK_UM };
/** Honing stock "may be as much as 0.5 mm, but is usually much less" [V S1]. */
export const DEFAULT_MAX_HONING_STOCK_UM = 500;

function assemble(parts: Omit<HonePlan, "status" | "canRelease" | "errors" | "warnings">): HonePlan {
  const seen = new Set<string>();
  const issues = parts.issues.filter((i) => {
    const key = `${i.code}|${i.message}`;
    return seen.has(key) ? false : (seen.add(key), true);
  });
  const errors = issues.filter((i) => i.severity === "error");
  const blocked = parts.stages.length === 0;
  return { ...parts, issues, status: blocked ? "blocked" : "ok", canRelease: !blocked && errors.length === 0, errors, warnings: issues.filter((i) => i.severity !== "error") };
}

const blockedPlan = (issues: PlanIssue[], sizing: FinishedBore | null = null, bore: BoreState | null = null): HonePlan =>
  assemble({ sizing, geometry: bore?.geometry ?? null, stock: null, stages: [], taperCorrection: null, expectedFinal: null, finalCheck: null, issues });

const plateauOf = (input: PlanHoneInput, stones: ChosenStones) => plateauStockOf(stones.plateau !== null, input.plateauStockUm);

type SettingsOf = (stone: StoneInput) => StageSettings;

/** Each stone's full-stroke settings, worked out once per plan (the split and the stages share them). */
function settingsCache(input: PlanHoneInput, diameterUm: number, depths: number[]): SettingsOf {
  const cache = new Map<string, StageSettings>();
  return (stone) => cache.get(stone.id) ?? (cache.set(stone.id, stageSettings(input, stone, diameterUm, depths)), cache.get(stone.id)!);
}

function cuttingStone(settingsOf: SettingsOf, stone: ChosenStones["coarse"]): CuttingStone | null {
  if (!stone) return null;
  const { removal } = settingsOf(stone);
  return { id: stone.id, removalUm: removal.removalPerDoubleStrokeUm, uncertaintyFraction: stone.rate.uncertaintyFraction, cleanupUm: cleanupStockOf(stone.rate).cleanupUm };
}

interface HoningStart {
  stage: BoreStage | null;
  startUm: number;
  incomingUm: number;
  marksOf: string;
  issues: PlanIssue[];
}

/** The boring stage when the plan bores: bore-to = target − the sequence's allowance [V S17, DESIGN §5.1]. */
function boringStep(input: PlanHoneInput, sizing: FinishedBore, bore: BoreState, stones: ChosenStones): HoningStart {
  const incoming = cleanupStockOf(input.incomingSurface ?? { cleanupStockUm: DEFAULT_AS_RECEIVED_CLEANUP_UM });
  const noBoring: HoningStart = { stage: null, startUm: bore.minUm, incomingUm: incoming.cleanupUm, marksOf: "incoming surface", issues: [] };
  const boring = input.boring;
  if (!boring) return noBoring;
  if (boring.onlyAboveStockUm !== undefined && sizing.targetUm - bore.minUm <= boring.onlyAboveStockUm) return noBoring;
  const allowance = honingAllowance({
    coarse: stones.coarse?.rate ?? null, finish: stones.finish?.rate ?? null, plateauStockUm: plateauOf(input, stones),
    boringRzUm: boring.surfaceRzUm ?? DEFAULT_BORING_RZ_UM, boringCleanupStockUm: boring.cleanupStockUm, marginUm: boring.marginUm,
  });
  const boreToUm = sizing.targetUm - allowance.allowanceUm;
  if (bore.minUm >= boreToUm) {
    noBoring.issues.push({ code: "BORING_NOT_NEEDED", severity: "warning", boreToUm, smallestReadingUm: bore.minUm, message: "The bore is already at or past the bore-to size: hone only." });
    return noBoring;
  }
  const stage: BoreStage = { kind: "bore", boreToUm, stockUm: boreToUm - bore.minUm, diameterBeforeUm: bore.minUm, honingAllowanceUm: allowance.allowanceUm, rule: allowance.rule };
  return { stage, startUm: boreToUm, incomingUm: allowance.boringCleanupUm, marksOf: "boring", issues: [] };
}

function stockLimitIssue(honingUm: number, limitUm: number): PlanIssue[] {
  if (honingUm <= limitUm) return [];
  return [{ code: "STOCK_ABOVE_HONING_LIMIT", severity: "error", stockUm: honingUm, limitUm, message: `Honing ${honingUm.toFixed(0)} µm is more than the ${limitUm.toFixed(0)} µm limit: bore first.` }];
}

/** Stage goals from the split: each stage brings every level to the target less the stock of the stages after it. */
function stageSpecs(settingsOf: SettingsOf, stones: ChosenStones, shares: StageShare[], targetUm: number): StageSpec[] {
  return shares.map((share, i) => {
    const stone = stones[share.kind]!;
    const settings = settingsOf(stone);
    const later = shares.slice(i + 1).reduce((sum, s) => sum + s.stockUm, 0);
    const last = i === shares.length - 1;
    const rate = settings.removal.removalPerDoubleStrokeUm;
    // The plateau's stock is "about" its figure: the nearest whole count, at least one stroke.
    const fixed = share.kind === "plateau" && rate > 0 ? Math.max(1, Math.round(share.stockUm / rate)) : 0;
    return { kind: share.kind, stone, settings, goalUm: targetUm - later, stopShort: !last, minStrokes: fixed, owedUm: share.kind === "plateau" ? 0 : share.cleanupRequiredUm };
  });
}

function honeStages(input: PlanHoneInput, stones: ChosenStones, bore: BoreState, start: HoningStart, sizing: FinishedBore) {
  const honingUm = sizing.targetUm - start.startUm;
  const tolerance = input.taperToleranceUm ?? DEFAULT_TAPER_TOLERANCE_UM;
  const startProfile: Profile = start.stage ? uniformProfile(bore.levels, start.startUm) : bore.profile;
  const depths = levelDepthsUm(startProfile.length, input.boreLengthUm);
  const settingsOf = settingsCache(input, start.startUm, depths);
  // The largest level gets only the full strokes, so the clean-up rules apply to the stock left after the dwell.
  const taperEstimate = start.stage ? null : taperToCorrect(bore.geometry, tolerance);
  const dwellUm = Math.min(taperEstimate?.stockUm ?? 0, honingUm);
  const split = splitStock({
    honingStockUm: honingUm - dwellUm, incomingCleanupUm: start.incomingUm, incomingMarksOf: start.marksOf, preferCoarse: dwellUm > 0,
    coarse: cuttingStone(settingsOf, stones.coarse), finish: cuttingStone(settingsOf, stones.finish),
    plateauStockUm: stones.plateau ? plateauOf(input, stones) : null,
  });
  const specs = stageSpecs(settingsOf, stones, split.shares, sizing.targetUm);
  const first = specs[0];
  const dwell: DwellBlock | null = first
    ? planTaperCorrection({ input, stone: first.stone, full: first.settings, start: startProfile, specs, depthsUm: depths, boreDiameterUm: start.startUm, toleranceUm: tolerance })
    : null;
  const runs = runSequence(dwell ? dwell.expectedByLevel : startProfile, specs);
  const issues: PlanIssue[] = [...split.issues, ...(dwell?.speeds.issues ?? [])];
  const stages: HoneStage[] = [];
  const heights = new Map(input.stones.map((s) => [s.id, s.currentHeightUm]));
  runs.forEach((run, i) => {
    const stone = run.spec.stone;
    const built = buildHoneStage({ input, share: split.shares[i]!, run, before: i === 0 ? startProfile : run.before, heightBeforeUm: heights.get(stone.id) ?? stone.currentHeightUm, dwell: i === 0 ? dwell : null });
    stages.push(built.stage);
    issues.push(...built.issues);
    heights.set(stone.id, built.stage.stoneWear.heightAfterUm);
  });
  const expectedFinal = runs.at(-1)?.after ?? startProfile;
  issues.push(...finalIssues({ input, stages, runs, sizing, expectedFinal, dwell, toleranceUm: tolerance, geometry: start.stage ? null : bore.geometry, splitIssues: split.issues }));
  return { stages, dwell, expectedFinal, issues };
}

function stockSummary(sizing: FinishedBore, bore: BoreState, boring: BoreStage | null, honingStartUm: number): StockSummary {
  return {
    totalUm: sizing.targetUm - bore.minUm, boringUm: boring?.stockUm ?? 0, honingUm: sizing.targetUm - honingStartUm, startDiameterUm: bore.minUm,
    rule: "stock = target − smallest reading, on diameter [DESIGN §5.3]",
  };
}

/** Plans one cylinder: sizing, stock, stages, strokes, set-up, crosshatch, wear and issues [DESIGN §5.1–5.5]. */
export function planHone(input: PlanHoneInput): HonePlan {
  try {
    return buildPlan(input);
  } catch (error) {
    if (!(error instanceof HoningInputError)) throw error;
    return blockedPlan([{ code: "INVALID_INPUT", severity: "error", field: error.field, message: error.message }]);
  }
}

function geometryLimits(input: PlanHoneInput, stones: ChosenStones): PlanIssue[] {
  const longest = [stones.coarse, stones.finish, stones.plateau].filter((s) => s !== null).reduce((a, s) => Math.max(a, s.stoneLengthUm), 0);
  if (longest <= input.boreLengthUm) return [];
  return [{ code: "STONE_LONGER_THAN_BORE", severity: "error", stoneLengthUm: longest, boreLengthUm: input.boreLengthUm,
    message: "A stone is longer than the bore: it cannot follow the bore's shape. Use shorter stones." }];
}

function buildPlan(input: PlanHoneInput): HonePlan {
  validatePlanOptions(input);
  const sizing = finishedBore(input.piston);
  const bore = describeBore(input.bore, sizing);
  const stones = chooseStones(input.stones);
  const blocking = [...boreOverTarget(bore, sizing), ...invalidStoneRates(input.stones)];
  if (!stones.coarse && !stones.finish) blocking.push({ code: "NO_HONING_STONE", severity: "error", message: "No coarse or finish stone is available." });
  if (blocking.length === 0) blocking.push(...geometryLimits(input, stones));
  if (blocking.length > 0) return blockedPlan(blocking, sizing, bore);
  const boring = boringStep(input, sizing, bore, stones);
  const honing = honeStages(input, stones, bore, boring, sizing);
  const stages: PlanStage[] = boring.stage ? [boring.stage, ...honing.stages] : honing.stages;
  const honingUm = sizing.targetUm - boring.startUm;
  return assemble({
    sizing, geometry: bore.geometry, stock: stockSummary(sizing, bore, boring.stage, boring.startUm), stages,
    taperCorrection: honing.dwell, expectedFinal: honing.expectedFinal,
    finalCheck: {
      targetUm: sizing.targetUm, minUm: sizing.minUm, maxUm: sizing.maxUm, levels: bore.levels,
      taperToleranceUm: input.taperToleranceUm ?? DEFAULT_TAPER_TOLERANCE_UM,
      outOfRoundToleranceUm: input.outOfRoundToleranceUm ?? DEFAULT_FINISHED_TOLERANCES.outOfRoundUm,
    },
    issues: [...boring.issues, ...stockLimitIssue(honingUm, input.maxHoningStockUm ?? DEFAULT_MAX_HONING_STOCK_UM), ...honing.issues],
  });
}
