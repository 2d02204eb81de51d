import { requireNonNegative } from "./errors";
import type { StoneRateInput } from "./plan-types";
import { cleanupStockOf } from "./strokes";

/**
 * Roughness a finish boring cut leaves, Rz 6 µm [from memory: a sharp tool's finish cut on grey iron].
 * With 2 × 3 × Rz of clean-up it gives an allowance inside the 0.05–0.10 mm rebuild shops bore under
 * the finished size [C, trade-facts §3.3]. A shop setting overrides it.
 */
export const DEFAULT_BORING_RZ_UM = 6;
/** Stock a worn, glazed bore needs before its surface is all new metal: 10 µm [from memory]; a shop setting. */
export const DEFAULT_AS_RECEIVED_CLEANUP_UM = 10;
/** Above this much honing stock the plan bores first: 0.10 mm, the top of trade-facts §3.3's range [C]; a shop setting. */
export const DEFAULT_BORE_ABOVE_STOCK_UM = 100;
export const DEFAULT_BORING_MARGIN_UM = 10;
/** Plateau stock default: 2 µm, inside the 1–3 µm typical range [C]. */
export const DEFAULT_PLATEAU_STOCK_UM = 2;

/** The plateau stock a sequence takes: none without a plateau stone. */
export const plateauStockOf = (hasPlateauStone: boolean, stockUm = DEFAULT_PLATEAU_STOCK_UM): number => (hasPlateauStone ? stockUm : 0);

export const ALLOWANCE_RULE =
  "honing allowance = boring clean-up (2 × 3 × Rz) + coarse clean-up (when finish stones follow) + plateau + margin [V S17 bore-to = target − allowance; C]";

export interface HoningAllowanceInput {
  /** The coarse and finish rows the plan would use; null when the role has no stone. */
  coarse: Pick<StoneRateInput, "cleanupStockUm" | "rzUm" | "cleanupRzMultiple"> | null;
  finish: Pick<StoneRateInput, "cleanupStockUm" | "rzUm" | "cleanupRzMultiple"> | null;
  plateauStockUm: number;
  boringRzUm?: number;
  boringCleanupStockUm?: number;
  marginUm: number;
}

export interface HoningAllowance {
  allowanceUm: number;
  boringCleanupUm: number;
  coarseCleanupUm: number;
  plateauUm: number;
  marginUm: number;
  rule: string;
}

/** What must be left after boring for the stone sequence to clean up every mark before it [DESIGN §5.1]. */
export function honingAllowance(input: HoningAllowanceInput): HoningAllowance {
  requireNonNegative("plateauStockUm", input.plateauStockUm);
  requireNonNegative("marginUm", input.marginUm);
  if (input.boringRzUm !== undefined) requireNonNegative("boringRzUm", input.boringRzUm);
  const boringCleanupUm = cleanupStockOf({ cleanupStockUm: input.boringCleanupStockUm, rzUm: input.boringRzUm ?? DEFAULT_BORING_RZ_UM }).cleanupUm;
  const coarseCleanupUm = input.coarse && input.finish ? cleanupStockOf(input.coarse).cleanupUm : 0;
  const allowanceUm = boringCleanupUm + coarseCleanupUm + input.plateauStockUm + input.marginUm;
  return { allowanceUm, boringCleanupUm, coarseCleanupUm, plateauUm: input.plateauStockUm, marginUm: input.marginUm, rule: ALLOWANCE_RULE };
}
