import { HoningInputError, requireFinite, requirePositive } from "./errors";

/**
 * What the shop's own runs say about a stone's rate on one machine and bore material: a multiplier on
 * the rate table's removal per stroke (DESIGN §5.7).
 *
 * Model [D]: each run gives q = (stock removed / strokes done) / (removal per stroke the plan's model
 * predicted for that run's conditions); y = ln q is the true log multiplier μ plus noise of spread σ.
 * μ starts at 0 (the table is right) with the table's own uncertainty as its spread (τ = ln(1 + u)),
 * and is followed with a discounted Kalman filter: every run first lets the past fade (precision × λ,
 * so μ may drift: a stone glazes, a dressing resets it), then adds the run with precision 1/σ². With few
 * runs the answer stays near the table; the table's pull fades as λⁿ. σ is learned from the accepted
 * runs' prediction errors, starting from a prior spread.
 *
 * Outliers [D]: a run whose y lies more than OUTLIER_SPREADS predictive spreads from the estimate (a
 * misread gauge, a miscounted stroke) is ignored. Two ignored runs in a row that agree with each other
 * and lie on the same side are a real step (new stones, another operator), and learning restarts from them.
 *
 * Every update is O(1) from a fixed state; `learnMultiplier` is the same fold over the runs in time
 * order, so the stored state and a rebuild from the run log give identical numbers.
 */

export interface LearningRun {
  stockRemovedUm: number;
  strokes: number;
  /** Removal per double stroke the plan's model predicted for this run's pressure, angle and set-up. */
  modelRatePerStrokeUm: number;
  /** ISO time; runs are used in this order. */
  loggedAt: string;
}

export interface LearningOptions {
  /** The rate row's uncertainty fraction: how far the table may be off before any run (default 0.25). */
  tableUncertainty?: number;
  /** Per-run spread of ln q before the runs say otherwise (default 0.08). */
  priorRunSpread?: number;
  /** Share of the past's weight kept at each new run (default 0.75: about the last 4 runs count, so a step is followed within 10 runs; scripts/simulate-learning.ts). */
  forgetting?: number;
}

export interface LearnedState {
  /** Estimate of ln(multiplier). */
  mean: number;
  /** Precision of the estimate: 1 / variance. */
  precision: number;
  /** Discounted sum of squared prediction errors of accepted runs, and their discounted count. */
  squaredErrors: number;
  errorWeight: number;
  runsUsed: number;
  runsIgnored: number;
  /** The last ignored run's ln q, waiting for a second that agrees (a step in the true rate). */
  pending: number | null;
  lastLoggedAt: string | null;
  options: Required<LearningOptions>;
}

export interface LearnedMultiplier {
  multiplier: number;
  /** 90 % interval of the multiplier. */
  low: number;
  high: number;
  runsUsed: number;
  runsIgnored: number;
  rule: string;
}

export const LEARNING_DEFAULTS: Required<LearningOptions> = { tableUncertainty: 0.25, priorRunSpread: 0.08, forgetting: 0.75 };
/** Prior weight of the starting spread, in runs: σ follows the runs after a few. */
const PRIOR_SPREAD_RUNS = 2;
/** A run this many predictive spreads from the estimate is an outlier [D]. */
export const OUTLIER_SPREADS = 3.5;
/** The least spread the outlier rule assumes: a 5 % run-to-run spread is as good as bore gauges allow [from memory]. */
const MIN_SPREAD = 0.05;
/** z for a two-sided 90 % normal interval (1.645; any statistics table). */
const Z90 = 1.6449;

export const LEARNING_RULE =
  "learned multiplier: discounted Kalman filter on ln(actual ÷ model rate) from the table (spread ln(1+u)), past runs fading ×0.75 per run, outliers past 3.5 spreads ignored, two agreeing outliers restart [D]";

function checkedOptions(options: LearningOptions = {}): Required<LearningOptions> {
  const o = { ...LEARNING_DEFAULTS, ...options };
  requirePositive("tableUncertainty", o.tableUncertainty);
  requirePositive("priorRunSpread", o.priorRunSpread);
  requireFinite("forgetting", o.forgetting);
  if (!(o.forgetting > 0 && o.forgetting <= 1)) throw new HoningInputError("forgetting", "must be above 0 and at most 1");
  return o;
}

export function emptyLearnedState(options?: LearningOptions): LearnedState {
  const o = checkedOptions(options);
  const tau = Math.log(1 + o.tableUncertainty);
  return { mean: 0, precision: 1 / (tau * tau), squaredErrors: 0, errorWeight: 0, runsUsed: 0, runsIgnored: 0, pending: null, lastLoggedAt: null, options: o };
}

const runSpread = (s: LearnedState) => {
  const prior = s.options.priorRunSpread;
  return Math.sqrt((PRIOR_SPREAD_RUNS * prior * prior + s.squaredErrors) / (PRIOR_SPREAD_RUNS + s.errorWeight));
};

/** ln q of one run, refusing what no real run can give. */
export function observedLogMultiplier(run: LearningRun): number {
  requirePositive("stockRemovedUm", run.stockRemovedUm);
  requirePositive("strokes", run.strokes);
  requirePositive("modelRatePerStrokeUm", run.modelRatePerStrokeUm);
  if (Number.isNaN(Date.parse(run.loggedAt))) throw new HoningInputError("loggedAt", "is not a date and time");
  return Math.log(run.stockRemovedUm / run.strokes / run.modelRatePerStrokeUm);
}

function accept(s: LearnedState, y: number, restart: boolean): LearnedState {
  const sigma = runSpread(s);
  const fade = s.options.forgetting;
  const start = restart ? emptyLearnedState(s.options) : s;
  const prior = restart ? { mean: start.mean, precision: 0 } : { mean: s.mean, precision: fade * s.precision };
  const precision = prior.precision + 1 / (sigma * sigma);
  const mean = (prior.precision * prior.mean + y / (sigma * sigma)) / precision;
  const error = y - s.mean;
  return {
    ...s, mean, precision,
    squaredErrors: restart ? 0 : fade * s.squaredErrors + error * error,
    errorWeight: restart ? 0 : fade * s.errorWeight + 1,
    runsUsed: s.runsUsed + 1, pending: null,
  };
}

/** One run into the state, O(1): the stored state moves on in the same transaction that logs the run. */
export function updateLearnedState(state: LearnedState, run: LearningRun): LearnedState {
  const y = observedLogMultiplier(run);
  const spread = Math.max(Math.sqrt(runSpread(state) ** 2 + 1 / state.precision), MIN_SPREAD);
  const limit = OUTLIER_SPREADS * spread;
  const next = { ...state, lastLoggedAt: run.loggedAt };
  if (Math.abs(y - state.mean) <= limit) return accept(next, y, false);
  const p = state.pending;
  if (p !== null && Math.sign(p - state.mean) === Math.sign(y - state.mean) && Math.abs(y - p) <= limit) {
    // A step in the true rate: learn again from the two runs that agree.
    const first = accept({ ...next, runsIgnored: state.runsIgnored - 1 }, p, true);
    return accept(first, y, false);
  }
  return { ...next, runsIgnored: state.runsIgnored + 1, pending: y };
}

export function multiplierFromState(state: LearnedState): LearnedMultiplier {
  const half = Z90 / Math.sqrt(state.precision);
  return {
    multiplier: Math.exp(state.mean), low: Math.exp(state.mean - half), high: Math.exp(state.mean + half),
    runsUsed: state.runsUsed, runsIgnored: state.runsIgnored, rule: LEARNING_RULE,
  };
}

const byTime = (a: LearningRun, b: LearningRun) => Date.parse(a.loggedAt) - Date.parse(b.loggedAt);

/** The learned multiplier over a run history: the same fold `updateLearnedState` makes one run at a time. */
export function learnMultiplier(runs: readonly LearningRun[], options?: LearningOptions): LearnedMultiplier {
  return multiplierFromState([...runs].sort(byTime).reduce(updateLearnedState, emptyLearnedState(options)));
}
