import { HoningInputError } from "./errors";
import { DEFAULT_FINISHED_TOLERANCES } from "./geometry";
import { boreOverTarget, describeBore } from "./plan-bore";
import type { BoreState } from "./plan-bore";
import { buildHoneStage, stageSettings } from "./plan-stage";
import { chooseStones, invalidStoneRates } from "./plan-stones";
import { validatePlanOptions } from "./plan-validate";
import type { ChosenStones } from "./plan-stones";
import type { BoreStage, HonePlan, HoneStage, PlanHoneInput, PlanStage, StockSummary } from "./plan-types";
import { finishedBore } from "./sizing";
import type { FinishedBore } from "./sizing";
import { splitStock } from "./stages";
import type { CuttingStone } from "./stages";
import { cleanupStockOf } from "./strokes";
import { DEFAULT_TAPER_TOLERANCE_UM, taperToCorrect } from "./taper";
import type { PlanIssue } from "./warnings";

/** Plateau stock default: 2 µm, inside the 1–3 µm typical range [C]. */
export const DEFAULT_PLATEAU_STOCK_UM = 2;
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
  assemble({ sizing, geometry: bore?.geometry ?? null, stock: null, stages: [], taperCorrection: null, finalCheck: null, issues });

function cuttingStone(input: PlanHoneInput, stone: ChosenStones["coarse"], diameterUm: number): CuttingStone | null {
  if (!stone) return null;
  const { removal } = stageSettings(input, stone, diameterUm);
  return { id: stone.id, removalUm: removal.removalPerDoubleStrokeUm, uncertaintyFraction: stone.rate.uncertaintyFraction, cleanupUm: cleanupStockOf(stone.rate).cleanupUm };
}

/** Optional boring stage: bore-to = target − (the sequence's minimum stocks + margin) [V S17, DESIGN §5.1]. */
function boringStep(input: PlanHoneInput, sizing: FinishedBore, bore: BoreState, stones: ChosenStones) {
  const incoming = cleanupStockOf(input.incomingSurface ?? {});
  const noBoring = { stage: null, startUm: bore.minUm, incomingUm: incoming.cleanupUm, marksOf: "incoming surface", issues: [] as PlanIssue[] };
  if (!input.boring) return noBoring;
  const boringCleanup = cleanupStockOf({ cleanupStockUm: input.boring.cleanupStockUm, rzUm: input.boring.surfaceRzUm });
  const coarseCleanup = stones.coarse && stones.finish ? cleanupStockOf(stones.coarse.rate).cleanupUm : 0;
  const plateau = stones.plateau ? (input.plateauStockUm ?? DEFAULT_PLATEAU_STOCK_UM) : 0;
  const allowance = boringCleanup.cleanupUm + coarseCleanup + plateau + input.boring.marginUm;
  const boreToUm = sizing.targetUm - allowance;
  if (bore.minUm >= boreToUm) {
    noBoring.issues.push({ code: "BORING_NOT_NEEDED", severity: "warning", boreToUm, smallestReadingUm: bore.minUm, message: "The bore is already at or past the bore-to size: hone only." });
    return noBoring;
  }
  const stage: BoreStage = {
    kind: "bore", boreToUm, stockUm: boreToUm - bore.minUm, diameterBeforeUm: bore.minUm, honingAllowanceUm: allowance,
    rule: "bore-to = target − honing allowance; allowance = boring clean-up + coarse clean-up + plateau + margin [V S17; C]",
  };
  return { stage, startUm: boreToUm, incomingUm: boringCleanup.cleanupUm, marksOf: "boring", issues: [] as PlanIssue[] };
}

function stockLimitIssue(honingUm: number, limitUm: number): PlanIssue[] {
  if (honingUm <= limitUm) return [];
  return [{ code: "STOCK_ABOVE_HONING_LIMIT", severity: "error", stockUm: honingUm, limitUm, message: `Honing ${honingUm.toFixed(0)} µm is more than the ${limitUm.toFixed(0)} µm limit: bore first.` }];
}

function honeStages(input: PlanHoneInput, stones: ChosenStones, bore: BoreState, start: { startUm: number; incomingUm: number; marksOf: string; bored: boolean }, sizing: FinishedBore) {
  const honingUm = sizing.targetUm - start.startUm;
  // The largest level gets only the full strokes, so the clean-up rules apply to the stock left after the dwell.
  const taper = start.bored ? null : taperToCorrect(bore.geometry, input.taperToleranceUm ?? DEFAULT_TAPER_TOLERANCE_UM);
  const dwellUm = Math.min(taper?.stockUm ?? 0, honingUm);
  const split = splitStock({
    honingStockUm: honingUm - dwellUm, incomingCleanupUm: start.incomingUm, incomingMarksOf: start.marksOf,
    coarse: cuttingStone(input, stones.coarse, start.startUm), finish: cuttingStone(input, stones.finish, start.startUm),
    plateauStockUm: stones.plateau ? (input.plateauStockUm ?? DEFAULT_PLATEAU_STOCK_UM) : null,
  });
  const issues = [...split.issues];
  const stages: HoneStage[] = [];
  const heights = new Map(input.stones.map((s) => [s.id, s.currentHeightUm]));
  let diameterUm = start.startUm;
  for (const share of split.shares) {
    const stone = stones[share.kind]!;
    const built = buildHoneStage({
      input, share, stone, diameterBeforeUm: diameterUm, heightBeforeUm: heights.get(stone.id) ?? stone.currentHeightUm,
      taper: stages.length === 0 && taper ? { end: taper.end, stockUm: dwellUm } : null,
    });
    stages.push(built.stage);
    issues.push(...built.issues);
    heights.set(stone.id, built.stage.stoneWear.heightAfterUm);
    diameterUm = built.stage.expectedDiameterAfterUm;
  }
  issues.push(...finishStepIssue(stages, sizing));
  return { stages, issues };
}

/** The last cutting stage must be able to stop inside the band: one stroke ≤ room above the target [D]. */
function finishStepIssue(stages: HoneStage[], sizing: FinishedBore): PlanIssue[] {
  const last = [...stages].reverse().find((s) => s.kind !== "plateau");
  const roomUm = sizing.maxUm - sizing.targetUm;
  if (!last || last.removal.removalPerDoubleStrokeUm <= roomUm || roomUm <= 0) return [];
  return [{
    code: "FINISH_STEP_TOO_COARSE", severity: "warning", stage: last.kind, removalPerDoubleStrokeUm: last.removal.removalPerDoubleStrokeUm, roomUm,
    message: `One ${last.kind} stroke removes more than the ${roomUm.toFixed(1)} µm between target and band limit: lower the pressure near the end.`,
  }];
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

function buildPlan(input: PlanHoneInput): HonePlan {
  validatePlanOptions(input);
  const sizing = finishedBore(input.piston);
  const bore = describeBore(input.bore, sizing);
  const blocking = [...boreOverTarget(bore, sizing), ...invalidStoneRates(input.stones)];
  const stones = chooseStones(input.stones);
  if (!stones.coarse && !stones.finish) blocking.push({ code: "NO_HONING_STONE", severity: "error", message: "No coarse or finish stone is available." });
  if (blocking.length > 0) return blockedPlan(blocking, sizing, bore);
  const boring = boringStep(input, sizing, bore, stones);
  const honing = honeStages(input, stones, bore, { ...boring, bored: boring.stage !== null }, sizing);
  const stages: PlanStage[] = boring.stage ? [boring.stage, ...honing.stages] : honing.stages;
  const honingUm = sizing.targetUm - boring.startUm;
  return assemble({
    sizing, geometry: bore.geometry, stock: stockSummary(sizing, bore, boring.stage, boring.startUm), stages,
    taperCorrection: honing.stages[0]?.dwell ?? null,
    finalCheck: {
      targetUm: sizing.targetUm, minUm: sizing.minUm, maxUm: sizing.maxUm, levels: bore.levels,
      taperToleranceUm: input.taperToleranceUm ?? DEFAULT_TAPER_TOLERANCE_UM,
      outOfRoundToleranceUm: input.outOfRoundToleranceUm ?? DEFAULT_FINISHED_TOLERANCES.outOfRoundUm,
    },
    issues: [...boring.issues, ...stockLimitIssue(honingUm, input.maxHoningStockUm ?? DEFAULT_MAX_HONING_STOCK_UM), ...honing.issues],
  });
}
