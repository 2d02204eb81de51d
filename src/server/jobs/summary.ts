import "server-only";
import { boreGeometry, plateauStockOf, geometryVerdict, matchPistons, MAX_MATCH_COUNT, sizeJob, type JobSizing, type MatchPistonsResult, type StoneRateInput } from "@/lib/honing";
import { BORE_MATERIALS } from "@/lib/bore-materials";
import type { ShopSettings } from "@/server/shop-settings/schema";
import type { ReadingSetView } from "@/server/readings/queries";
import type { PistonView } from "@/server/pistons/queries";
import { READING_KIND_LABELS } from "./constants";
import { fmtSize, fmtSmall, type DisplayUnits } from "./units";
import type { JobView } from "./queries";

export type IntakeWarning = { code: string; tone: "stop" | "caution" | "info"; cylinder?: number; message: string };

export type CylinderGeometry = {
  cylinderId: string;
  number: number;
  readingSetId: string | null;
  kind: ReadingSetView["kind"] | null;
  minUm: number | null;
  maxUm: number | null;
  meanUm: number | null;
  spreadUm: number | null;
  taperUm: number | null;
  outOfRoundUm: number | null;
  outOfRoundLevel: string | null;
  tightEnd: "top" | "bottom" | null;
  taperOk: boolean | null;
  outOfRoundOk: boolean | null;
  stockUm: number | null;
};

type SummaryInput = {
  job: Pick<JobView, "boreMaterial" | "standardBoreUm" | "wallThicknessUm" | "minWallUm">;
  cylinders: Array<{ id: string; number: number }>;
  sets: ReadingSetView[];
  pistons: PistonView[];
  settings: ShopSettings;
  units: DisplayUnits;
  /** The shop's first stone per role for the job's material: the honing allowance rests on them. */
  sequence: Record<"coarse" | "finish" | "plateau", StoneRateInput | null>;
};

/** Only readings before machining decide the oversize: a checkpoint or final set never moves it (issue 10). */
const BEFORE_MACHINING: ReadonlyArray<ReadingSetView["kind"]> = ["as_received", "after_boring"];

function geometryOf(cylinder: { id: string; number: number }, set: ReadingSetView | undefined, settings: ShopSettings): CylinderGeometry {
  const empty = { minUm: null, maxUm: null, meanUm: null, spreadUm: null, taperUm: null, outOfRoundUm: null, outOfRoundLevel: null, tightEnd: null, taperOk: null, outOfRoundOk: null, stockUm: null };
  if (!set || set.levels.length === 0) return { cylinderId: cylinder.id, number: cylinder.number, readingSetId: null, kind: null, ...empty };
  const g = boreGeometry({ levels: set.levels });
  const verdict = geometryVerdict(g, { taperUm: settings.taperToleranceUm, outOfRoundUm: settings.outOfRoundToleranceUm });
  const values = set.levels.flatMap((l) => [l.aUm, l.bUm]);
  return {
    cylinderId: cylinder.id, number: cylinder.number, readingSetId: set.id, kind: set.kind,
    minUm: g.minUm, maxUm: g.maxUm, meanUm: values.reduce((a, b) => a + b, 0) / values.length, spreadUm: g.spreadUm,
    taperUm: g.taperUm, outOfRoundUm: g.outOfRoundUm, outOfRoundLevel: g.outOfRoundLevel, tightEnd: g.tightEnd,
    taperOk: verdict.taperOk, outOfRoundOk: verdict.outOfRoundOk, stockUm: null,
  };
}

function geometryWarning(r: CylinderGeometry, settings: ShopSettings, units: DisplayUnits): IntakeWarning[] {
  const tone = r.kind === "final" ? "stop" : "caution";
  const when = READING_KIND_LABELS[r.kind!].toLowerCase();
  const out: IntakeWarning[] = [];
  if (r.taperOk === false) out.push({ code: "TAPER", tone, cylinder: r.number, message: `Cylinder ${r.number} (${when}): taper ${fmtSmall(r.taperUm!, units)} is over the shop's ${fmtSmall(settings.taperToleranceUm, units)}${r.tightEnd ? `; tight at the ${r.tightEnd}` : ""}.` });
  if (r.outOfRoundOk === false) out.push({ code: "OUT_OF_ROUND", tone, cylinder: r.number, message: `Cylinder ${r.number} (${when}): out-of-round ${fmtSmall(r.outOfRoundUm!, units)} at the ${r.outOfRoundLevel} is over the shop's ${fmtSmall(settings.outOfRoundToleranceUm, units)}.` });
  return out;
}

/** Worn bores before machining are summed up in one line; checkpoint and final sets are judged one by one. */
function geometryWarnings(rows: CylinderGeometry[], settings: ShopSettings, units: DisplayUnits): IntakeWarning[] {
  const before = rows.filter((r) => (r.kind === "as_received" || r.kind === "after_boring") && (r.taperOk === false || r.outOfRoundOk === false));
  const out: IntakeWarning[] = rows.filter((r) => r.kind === "checkpoint" || r.kind === "final").flatMap((r) => geometryWarning(r, settings, units));
  if (before.length > 0) {
    const taper = before.reduce((a, b) => (b.taperUm! > a.taperUm! ? b : a));
    const round = before.reduce((a, b) => (b.outOfRoundUm! > a.outOfRoundUm! ? b : a));
    out.unshift({
      code: "WORN_BEFORE_MACHINING", tone: "caution",
      message: `Before machining, ${before.length === 1 ? `cylinder ${before[0]!.number} is` : `cylinders ${before.map((r) => r.number).join(", ")} are`} outside the finished-bore tolerances: worst taper ${fmtSmall(taper.taperUm!, units)} (cylinder ${taper.number}), worst out-of-round ${fmtSmall(round.outOfRoundUm!, units)} (cylinder ${round.number}). The rebore and hone must take this out.`,
    });
  }
  return out;
}

/** The oversize from the same sizing story the wizard plans with (sizeJob), over the readings before machining. */
function proposeOversize(input: SummaryInput): { sizing: JobSizing; numbers: number[] } | null {
  const before = new Map<string, ReadingSetView>();
  for (const set of input.sets) if (BEFORE_MACHINING.includes(set.kind) && set.levels.length > 0 && !before.has(set.cylinderId)) before.set(set.cylinderId, set);
  const cylinders = input.cylinders.filter((c) => before.has(c.id));
  if (cylinders.length === 0) return null;
  const { settings, sequence } = input;
  const sizing = sizeJob({
    boresUm: cylinders.map((c) => before.get(c.id)!.levels.flatMap((l) => [l.aUm, l.bUm])),
    stepsUm: settings.oversizeStepsUm, standardBoreUm: input.job.standardBoreUm,
    allowance: { coarse: sequence.coarse, finish: sequence.finish, plateauStockUm: plateauStockOf(sequence.plateau !== null), boringRzUm: settings.boringRzUm, marginUm: settings.boringMarginUm },
    ...(input.job.wallThicknessUm != null && { wallThicknessUm: input.job.wallThicknessUm }),
    ...(input.job.minWallUm != null && { minWallUm: input.job.minWallUm }),
  });
  return { sizing, numbers: cylinders.map((c) => c.number) };
}

/** The tightest band every piston allows: the largest minimum and the smallest maximum. */
function commonBand(pistons: PistonView[]) {
  return { clearanceMinUm: Math.max(...pistons.map((p) => p.clearanceMinUm)), clearanceMaxUm: Math.min(...pistons.map((p) => p.clearanceMaxUm)) };
}

function proposePairing(pistons: PistonView[], measured: CylinderGeometry[]): { band: ReturnType<typeof commonBand>; result: MatchPistonsResult } | null {
  if (pistons.length === 0 || measured.length === 0) return null;
  if (pistons.length > MAX_MATCH_COUNT || measured.length > MAX_MATCH_COUNT) return null;
  const band = commonBand(pistons);
  if (band.clearanceMinUm > band.clearanceMaxUm) return null;
  const result = matchPistons({
    pistons: pistons.map((p) => ({ id: p.id, diameterUm: p.diameterUm })),
    bores: measured.map((r) => ({ id: r.cylinderId, diameterUm: r.meanUm! })),
    ...band,
  });
  return { band, result };
}

function pairingWarning(result: Extract<MatchPistonsResult, { ok: false }>, measured: CylinderGeometry[]): IntakeWarning {
  const unfinished = measured.some((r) => r.kind === "as_received" || r.kind === "after_boring");
  if (result.reason === "NO_FIT" && unfinished) {
    return { code: "NO_FIT_YET", tone: "info", message: "The pistons do not fit the bores as they are now; the pairing is proposed again from the checkpoint and final readings." };
  }
  return { code: result.reason, tone: "caution", message: result.message };
}

/** The intake summary: geometry per cylinder, the worst bore, the proposed oversize, the pairing, every warning with numbers. */
export function intakeSummary(input: SummaryInput) {
  const { settings, units } = input;
  const latest = new Map<string, ReadingSetView>();
  for (const set of input.sets) if (!latest.has(set.cylinderId)) latest.set(set.cylinderId, set);
  const rows = input.cylinders.map((c) => geometryOf(c, latest.get(c.id), settings));
  const measured = rows.filter((r) => r.kind !== null);
  const proposal = proposeOversize(input);
  const oversize = proposal?.sizing.oversize ?? null;
  if (oversize?.ok) for (const r of measured) r.stockUm = oversize.finishedBoreUm - r.minUm!;
  const worstNumber = proposal && oversize ? proposal.numbers[oversize.worstCylinderIndex] : undefined;
  const worst = worstNumber === undefined ? null : rows.find((r) => r.number === worstNumber) ?? null;
  const pairing = proposePairing(input.pistons, measured);
  const warnings: IntakeWarning[] = [];
  const material = BORE_MATERIALS.find((m) => m.code === input.job.boreMaterial);
  if (material && !material.honable) warnings.push({ code: "NOT_HONABLE", tone: "stop", message: `${material.label}: follow the coating maker's process; conventional stones are not planned for it.` });
  const missing = rows.filter((r) => r.kind === null).map((r) => r.number);
  if (missing.length > 0) warnings.push({ code: "NO_READINGS", tone: "info", message: `No readings yet for cylinder${missing.length > 1 ? "s" : ""} ${missing.join(", ")}.` });
  warnings.push(...geometryWarnings(rows, settings, units));
  if (oversize && !oversize.ok) {
    const where = `cylinder ${worst?.number ?? "?"} reads ${fmtSize(oversize.worstReadingUm, units)}`;
    const wall = oversize.wallAfterUm !== null ? ` (wall left ${fmtSize(oversize.wallAfterUm, units)})` : "";
    warnings.push({ code: oversize.reason, tone: "stop", cylinder: worst?.number, message: `${oversize.message} Worst bore: ${where}${wall}.` });
  }
  if (input.pistons.length > 0 && !pairing) warnings.push({ code: "BANDS_DISAGREE", tone: "caution", message: "The pistons' clearance bands do not overlap: check the maker's figures." });
  if (pairing && !pairing.result.ok) warnings.push(pairingWarning(pairing.result, measured));
  return { cylinders: rows, worst: worst ? { cylinder: worst.number, readingUm: oversize!.worstReadingUm } : null, oversize, allowance: proposal?.sizing.allowance ?? null, pairing, warnings };
}
export type IntakeSummary = ReturnType<typeof intakeSummary>;
