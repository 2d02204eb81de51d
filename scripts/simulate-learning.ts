// `npm run bench:learning`: a shop simulator for the learned rate multiplier (issue 13). Every figure is
// invented: run histories with a known true multiplier per machine, lognormal run-to-run noise, misread
// gauges (gross outliers), slow glazing with dressing resets, and a step change (new stone batch). It
// replays them through the estimator and prints the median error of the predicted strokes against the
// strokes really needed, for the table alone and with learning, by run number; then the cost of one
// update after 10 and 100 000 runs, and of a rebuild from 100 000 runs.
import { emptyLearnedState, learnMultiplier, multiplierFromState, updateLearnedState, type LearnedState, type LearningRun } from "../src/lib/honing/learning";

const HISTORIES = 400;
const RUNS = 40;
const MODEL_RATE_UM = 0.5;
/** Run-to-run spread of the true rate in ln: a bore gauge reading to 1 µm on 25–60 µm of stock, and the stone's own scatter [from memory]. */
const NOISE_SIGMA = 0.04;
const OUTLIER_CHANCE = 0.03;

/** Deterministic pseudo-random numbers (mulberry32), so every run of the bench replays the same shops. */
function random(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}
const gaussian = (next: () => number) => Math.sqrt(-2 * Math.log(1 - next())) * Math.cos(2 * Math.PI * next());
const median = (xs: number[]) => { const s = [...xs].sort((a, b) => a - b); return s.length === 0 ? NaN : s[Math.floor(s.length / 2)]!; };
const at = (i: number) => new Date(Date.UTC(2026, 0, 1) + i * 3_600_000).toISOString();

type Sample = { run: number; table: number; learned: number; sinceStep: number | null };

/** One machine's history: a true multiplier that glazes 0.8 % per run, is dressed back every 8–15 runs, and may step once. */
function simulate(seed: number, withStep: boolean, noiseSigma = NOISE_SIGMA): Sample[] {
  const next = random(seed);
  const base = Math.exp((next() * 2 - 1) * 0.45); // 0.64–1.57 × the table
  const stepAt = withStep ? 15 + Math.floor(next() * 10) : Infinity;
  const stepBy = next() < 0.5 ? 0.7 : 1.4;
  let state: LearnedState = emptyLearnedState();
  let glaze = 1;
  let nextDressing = 8 + Math.floor(next() * 8);
  const samples: Sample[] = [];
  for (let i = 0; i < RUNS; i++) {
    if (i === nextDressing) { glaze = 1; nextDressing = i + 8 + Math.floor(next() * 8); }
    const truth = base * glaze * (i >= stepAt ? stepBy : 1);
    const stockUm = 15 + next() * 45;
    const trueRate = MODEL_RATE_UM * truth * Math.exp(noiseSigma * gaussian(next));
    const needed = stockUm / trueRate;
    const learned = multiplierFromState(state).multiplier;
    samples.push({ run: i + 1, table: Math.abs(stockUm / MODEL_RATE_UM - needed), learned: Math.abs(stockUm / (MODEL_RATE_UM * learned) - needed), sinceStep: i >= stepAt ? i - stepAt : null });
    const misread = next() < OUTLIER_CHANCE ? (next() < 0.5 ? 2 : 0.5) : 1;
    const logged: LearningRun = { stockRemovedUm: stockUm * misread, strokes: Math.max(1, Math.round(needed)), modelRatePerStrokeUm: MODEL_RATE_UM, loggedAt: at(i) };
    state = updateLearnedState(state, logged);
    glaze *= 0.992;
  }
  return samples;
}

function report(label: string, samples: Sample[], pick: (s: Sample) => boolean) {
  const chosen = samples.filter(pick);
  const table = median(chosen.map((s) => s.table));
  const learned = median(chosen.map((s) => s.learned));
  console.log(`${label.padEnd(34)} ${table.toFixed(2).padStart(10)} ${learned.toFixed(2).padStart(12)} ${(learned / table).toFixed(3).padStart(8)}`);
  return learned / table;
}

const steady = Array.from({ length: HISTORIES }, (_, h) => simulate(1_000 + h, false)).flat();
const stepped = Array.from({ length: HISTORIES }, (_, h) => simulate(9_000 + h, true)).flat();
console.log(`\n${HISTORIES} invented machine histories of ${RUNS} runs each (noise σ ${NOISE_SIGMA} in ln, ${OUTLIER_CHANCE * 100} % misread gauges, glazing 0.8 %/run with dressing)`);
console.log("median |predicted − needed| strokes".padEnd(34), "table".padStart(10), "with learning".padStart(12), "ratio".padStart(8));
report("runs 1–3", steady, (s) => s.run <= 3);
report("runs 4–10", steady, (s) => s.run >= 4 && s.run <= 10);
report("runs 11+", steady, (s) => s.run >= 11);
const noisy = Array.from({ length: HISTORIES }, (_, h) => simulate(1_000 + h, false, 0.06)).flat();
report("runs 11+, a noisier shop (σ 0.06)", noisy, (s) => s.run >= 11);
const settled = median(stepped.filter((s) => s.sinceStep === null && s.run >= 11).map((s) => s.learned));
console.log("\nstep change (×0.7 or ×1.4 at run 15–24): learned error by runs since the step, against the settled error before it");
for (const k of [0, 2, 5, 10]) {
  const e = median(stepped.filter((s) => s.sinceStep === k).map((s) => s.learned));
  console.log(`  ${String(k).padStart(2)} runs after: ${e.toFixed(2)} strokes = ${(e / settled).toFixed(2)}× settled (${settled.toFixed(2)})`);
}

// One gross outlier into a settled state: how far the multiplier moves.
const settledRuns = Array.from({ length: 20 }, (_, i) => ({ stockRemovedUm: 30, strokes: Math.round(60 / (0.9 * (1 + 0.04 * Math.sin(i)))), modelRatePerStrokeUm: MODEL_RATE_UM, loggedAt: at(i) }));
const before = learnMultiplier(settledRuns).multiplier;
const moves = [2, 0.5, 3].map((f) => Math.abs(learnMultiplier([...settledRuns, { ...settledRuns[0]!, stockRemovedUm: 30 * f, loggedAt: at(21) }]).multiplier / before - 1));
console.log(`\none gross outlier (×2, ×0.5, ×3 the stock) moves a settled multiplier by at most ${(Math.max(...moves) * 100).toFixed(2)} %`);

// Cost: one update after 10 and after 100 000 earlier runs; a rebuild from 100 000 runs.
const many: LearningRun[] = Array.from({ length: 100_000 }, (_, i) => ({ stockRemovedUm: 30 + (i % 7), strokes: 60 + (i % 11), modelRatePerStrokeUm: MODEL_RATE_UM, loggedAt: at(i) }));
const timeUpdates = (state: LearnedState) => {
  const t = performance.now();
  for (let i = 0; i < 100_000; i++) updateLearnedState(state, many[i % 1000]!);
  return ((performance.now() - t) / 100_000) * 1000;
};
const stateAfter = (n: number) => many.slice(0, n).reduce(updateLearnedState, emptyLearnedState());
const small = stateAfter(10);
const large = stateAfter(100_000);
timeUpdates(small);
console.log(`one update: ${timeUpdates(small).toFixed(2)} µs after 10 runs, ${timeUpdates(large).toFixed(2)} µs after 100 000 runs (the state is ${JSON.stringify(large).length} bytes either way)`);
const t = performance.now();
learnMultiplier(many);
console.log(`rebuild from 100 000 runs: ${(performance.now() - t).toFixed(0)} ms`);
