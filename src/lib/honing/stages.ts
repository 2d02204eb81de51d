import { requireNonNegative } from "./errors";
import { estimateStrokes } from "./strokes";
import type { HoneStageKind } from "./types";
import type { PlanIssue } from "./warnings";

/** What the split needs to know about one cutting stage's stone. */
export interface CuttingStone {
  removalUm: number;
  uncertaintyFraction: number;
  /** Stock the next stage must remove to clean up this stone's marks. */
  cleanupUm: number;
  id: string;
}

export interface StageSplitInput {
  honingStockUm: number;
  /** Cleanup the first honing stage owes the surface before it (boring marks, incoming surface). */
  incomingCleanupUm: number;
  incomingMarksOf: string;
  coarse: CuttingStone | null;
  finish: CuttingStone | null;
  /** Plateau stock, or null when no plateau stone is available. */
  plateauStockUm: number | null;
  /** A dwell runs on the coarse stone: keep coarse stones even when they save no strokes. */
  preferCoarse?: boolean;
}

export interface StageShare {
  kind: HoneStageKind;
  stoneId: string | null;
  stockUm: number;
  cleanupRequiredUm: number;
  marksOf: string;
}

export interface StageSplit {
  shares: StageShare[];
  issues: PlanIssue[];
  rule: string;
}

export const SPLIT_RULE =
  "plateau: small fixed stock [C]; last cutting stage: the clean-up stock of the one before; coarse: the rest, skipped when it saves no strokes [DESIGN §5.3]";

const strokesFor = (stockUm: number, stone: CuttingStone) => estimateStrokes(stockUm, stone.removalUm, stone.uncertaintyFraction).nominal;

/** Decides whether coarse stones are worth using: only if they clean up the incoming marks and save strokes [D]. */
function coarseWorthIt(input: StageSplitInput, cuttingStockUm: number, coarse: CuttingStone, finish: CuttingStone): string | null {
  const coarseStock = cuttingStockUm - coarse.cleanupUm;
  if (coarseStock <= 0) return "the stock is no more than the coarse stones' own clean-up";
  if (coarseStock < input.incomingCleanupUm) return `coarse stock would not clean up the ${input.incomingMarksOf} marks`;
  if (input.preferCoarse) return null;
  const withCoarse = strokesFor(coarseStock, coarse) + strokesFor(coarse.cleanupUm, finish);
  const finishOnly = strokesFor(cuttingStockUm, finish);
  if (withCoarse >= finishOnly) return `finish stones alone take ${finishOnly} strokes, with coarse ${withCoarse}`;
  return null;
}

/** A stage with less stock than the marks before it need [C, DESIGN §5.3]. */
export function stockBelowCleanup(stage: HoneStageKind, marksOf: string, stockUm: number, cleanupUm: number): PlanIssue {
  return {
    code: "STOCK_BELOW_CLEANUP", severity: "error", stage, marksOf, stockUm, cleanupUm, shortByUm: cleanupUm - stockUm,
    message: `The ${stage} stage has ${stockUm.toFixed(1)} µm of stock but the ${marksOf} marks need ${cleanupUm.toFixed(1)} µm to clean up.`,
  };
}

/** Splits the honing stock into coarse, finish and plateau shares per DESIGN §5.3 [C rules, D arithmetic]. */
export function splitStock(input: StageSplitInput): StageSplit {
  requireNonNegative("honingStockUm", input.honingStockUm);
  requireNonNegative("incomingCleanupUm", input.incomingCleanupUm);
  if (input.plateauStockUm !== null) requireNonNegative("plateauStockUm", input.plateauStockUm);
  const issues: PlanIssue[] = [];
  const plateau = input.plateauStockUm === null ? 0 : Math.min(input.plateauStockUm, input.honingStockUm);
  const cutting = Math.max(0, input.honingStockUm - plateau);
  const shares: StageShare[] = [];
  const { coarse, finish } = input;
  const skipReason = coarse && finish ? coarseWorthIt(input, cutting, coarse, finish) : null;
  if (coarse && finish && skipReason === null) {
    shares.push({ kind: "coarse", stoneId: coarse.id, stockUm: cutting - coarse.cleanupUm, cleanupRequiredUm: input.incomingCleanupUm, marksOf: input.incomingMarksOf });
    shares.push({ kind: "finish", stoneId: finish.id, stockUm: coarse.cleanupUm, cleanupRequiredUm: coarse.cleanupUm, marksOf: coarse.id });
  } else {
    const only = finish ?? coarse;
    if (only) {
      shares.push({ kind: finish ? "finish" : "coarse", stoneId: only.id, stockUm: cutting, cleanupRequiredUm: input.incomingCleanupUm, marksOf: input.incomingMarksOf });
    }
    if (skipReason !== null) {
      issues.push({ code: "COARSE_SKIPPED", severity: "info", reason: skipReason, message: `Coarse stones skipped: ${skipReason}.` });
    }
  }
  const first = shares[0];
  if (first && first.stockUm < input.incomingCleanupUm) issues.push(stockBelowCleanup(first.kind, input.incomingMarksOf, first.stockUm, input.incomingCleanupUm));
  if (input.plateauStockUm !== null) {
    shares.push({ kind: "plateau", stoneId: null, stockUm: plateau, cleanupRequiredUm: 0, marksOf: "peaks only (valleys kept)" });
  }
  return { shares, issues, rule: SPLIT_RULE };
}
