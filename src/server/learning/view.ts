import "server-only";
import { multiplierFromState, type LearnedState } from "@/lib/honing";

// What the screens and the planning library read of a learned state: the multiplier, its 90 %
// interval and the runs behind it. A state without any run is the table itself, so it reads as none.

export type LearnedView = {
  multiplier: number;
  low: number;
  high: number;
  runsUsed: number;
  runsIgnored: number;
  /** Relative half-width of the interval, the stroke range's spread once there are runs (≤ 0.95). */
  uncertaintyFraction: number;
  lastLoggedAt: string | null;
};

export function learnedView(state: LearnedState | null | undefined): LearnedView | null {
  if (!state || state.runsUsed + state.runsIgnored === 0) return null;
  const m = multiplierFromState(state);
  const spread = Math.max(m.high / m.multiplier - 1, 1 - m.low / m.multiplier);
  return {
    multiplier: m.multiplier, low: m.low, high: m.high, runsUsed: m.runsUsed, runsIgnored: m.runsIgnored,
    uncertaintyFraction: Math.min(Math.max(spread, 0), 0.95), lastLoggedAt: state.lastLoggedAt,
  };
}
