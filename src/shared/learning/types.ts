import type { BoreMaterial } from "@/lib/bore-materials";

/** One run's observation of its stone's rate, stored on the run when it is logged (runs.learning). */
export interface RunLearning {
  boreMaterial: BoreMaterial;
  rateRowId: string;
  /** The rate row version the plan stage used: learning counts only runs of the row's current version. */
  rateVersion: number;
  /** Mean diameter growth over the levels the full strokes sweep, from the reading before to the one after. */
  stockRemovedUm: number;
  /** The table's model for the same levels at the run's pressure, without any learned multiplier. */
  modelRatePerStrokeUm: number;
  /** The rate row's removal per double stroke the plan used (its reference conditions): q × this is the run's observed rate. */
  tableRateUm: number;
  /** The learned multiplier the state held just before this run (1: the table alone); absent on runs logged before it was kept. */
  multiplierBefore?: number;
  /** Replay order under its stone × material × machine (learned_rates.sequence after this run). */
  sequence: number;
}
