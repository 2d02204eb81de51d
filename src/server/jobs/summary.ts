import "server-only";
import { boreGeometry, commonClearanceBand, finishedBore, plateauStockOf, geometryVerdict, matchPistons, MAX_MATCH_COUNT, sizeJob, type ClearanceBand, type JobSizing, type MatchPistonsResult, type StoneRateInput } from "@/lib/honing";
import { BORE_MATERIALS } from "@/lib/bore-materials";
import type { ShopSettings } from "@/shared/shop-settings/schema";
import type { ReadingSetView } from "@/server/readings/queries";
import type { PistonView } from "@/server/pistons/queries";
import { defaultClearance, pistonInput, resolveCylinders } from "@/server/plans/cylinders";
import { READING_KIND_LABELS } from "@/shared/jobs/constants";
import { size, small, type DisplayUnits } from "@/shared/units";
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
  /** The finished size this cylinder is sized to: its piston + the target clearance (the plan's rule), or the nominal oversize without a piston. */
  finishedUm: number | null;
  finishedFrom: "piston" | "oversize" | null;
  pistonLabel: string | null;
  boreToUm: number | null;
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
  const empty = { minUm: null, maxUm: null, meanUm: null, spreadUm: null, taperUm: null, outOfRoundUm: null, outOfRoundLevel: null, tightEnd: null, taperOk: null, outOfRoundOk: null, finishedUm: null, finishedFrom: null, pistonLabel: null, boreToUm: null, stockUm: null };
  if (!set || set.levels.length === 0) return { cylinderId: cylinder.id, number: cylinder.number, readingSetId: null, kind: null, ...empty };
  const g = boreGeometry({ levels: set.levels });
  const verdict = geometryVerdict(g, { taperUm: settings.taperToleranceUm, outOfRoundUm: settings.outOfRoundToleranceUm });
  const values = set.levels.flatMap((l) => [l.aUm, l.bUm]);
  return {
    cylinderId: cylinder.id, number: cylinder.number, readingSetId: set.id, kind: set.kind,
    minUm: g.minUm, maxUm: g.maxUm, meanUm: values.reduce((a, b) => a + b, 0) / values.length, spreadUm: g.spreadUm,
    taperUm: g.taperUm, outOfRoundUm: g.outOfRoundUm, outOfRoundLevel: g.outOfRoundLevel, tightEnd: g.tightEnd,
    taperOk: verdict.taperOk, outOfRoundOk: verdict.outOfRoundOk, finishedUm: null, finishedFrom: null, pistonLabel: null, boreToUm: null, stockUm: null,
  };
}

function geometryWarning(r: CylinderGeometry, settings: ShopSettings, units: DisplayUnits): IntakeWarning[] {
  const tone = r.kind === "final" ? "stop" : "caution";
  const when = READING_KIND_LABELS[r.kind!].toLowerCase();
  const out: IntakeWarning[] = [];
  if (r.taperOk === false) out.push({ code: "TAPER", tone, cylinder: r.number, message: `Cylinder ${r.number} (${when}): taper ${small(r.taperUm!, units)} is over the shop's ${small(settings.taperToleranceUm, units)}${r.tightEnd ? `; tight at the ${r.tightEnd}` : ""}.` });
  if (r.outOfRoundOk === false) out.push({ code: "OUT_OF_ROUND", tone, cylinder: r.number, message: `Cylinder ${r.number} (${when}): out-of-round ${small(r.outOfRoundUm!, units)} at the ${r.outOfRoundLevel} is over the shop's ${small(settings.outOfRoundToleranceUm, units)}.` });
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
      message: `Before machining, ${before.length === 1 ? `cylinder ${before[0]!.number} is` : `cylinders ${before.map((r) => r.number).join(", ")} are`} outside the finished-bore tolerances: worst taper ${small(taper.taperUm!, units)} (cylinder ${taper.number}), worst out-of-round ${small(round.outOfRoundUm!, units)} (cylinder ${round.number}). The rebore and hone must take this out.`,
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

/**
 * Per cylinder, the piston the wizard's first plan rests on (the same resolver) and the finished size it
 * gives with the pistons' common band: so the intake's bore-to and stock are the plan's.
 */
function pistonTargets(input: SummaryInput, band: ClearanceBand | null): Map<number, { targetUm: number; label: string }> {
  const targets = new Map<number, { targetUm: number; label: string }>();
  if (!band) return targets;
  const clearance = defaultClearance(band);
  const bases = resolveCylinders({ request: { cylinders: [], clearance }, cylinders: input.cylinders, sets: input.sets, pistons: input.pistons });
  for (const b of bases) if (b.piston) targets.set(b.cylinder, { targetUm: finishedBore(pistonInput(b.piston.diameterUm, clearance)).targetUm, label: b.piston.label });
  return targets;
}

function sizeRows(rows: CylinderGeometry[], sizing: JobSizing | null, targets: ReturnType<typeof pistonTargets>) {
  if (!sizing) return;
  for (const r of rows) {
    if (r.kind === null) continue;
    const piston = targets.get(r.number);
    const nominal = sizing.oversize.ok ? sizing.oversize.finishedBoreUm : null;
    r.finishedUm = piston?.targetUm ?? nominal;
    r.finishedFrom = piston ? "piston" : nominal === null ? null : "oversize";
    r.pistonLabel = piston?.label ?? null;
    r.boreToUm = r.finishedUm === null ? null : r.finishedUm - sizing.allowance.allowanceUm;
    r.stockUm = r.finishedUm === null ? null : r.finishedUm - r.minUm!;
  }
}

function proposePairing(pistons: PistonView[], measured: CylinderGeometry[], band: ClearanceBand | null): { band: ClearanceBand; result: MatchPistonsResult } | null {
  if (!band || measured.length === 0) return null;
  if (pistons.length > MAX_MATCH_COUNT || measured.length > MAX_MATCH_COUNT) return null;
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
  const band = commonClearanceBand(input.pistons);
  sizeRows(measured, proposal?.sizing ?? null, pistonTargets(input, band));
  const worstNumber = proposal && oversize ? proposal.numbers[oversize.worstCylinderIndex] : undefined;
  const worst = worstNumber === undefined ? null : rows.find((r) => r.number === worstNumber) ?? null;
  const pairing = proposePairing(input.pistons, measured, band);
  const warnings: IntakeWarning[] = [];
  const material = BORE_MATERIALS.find((m) => m.code === input.job.boreMaterial);
  if (material && !material.honable) warnings.push({ code: "NOT_HONABLE", tone: "stop", message: `${material.label}: follow the coating maker's process; conventional stones are not planned for it.` });
  const missing = rows.filter((r) => r.kind === null).map((r) => r.number);
  if (missing.length > 0) warnings.push({ code: "NO_READINGS", tone: "info", message: `No readings yet for cylinder${missing.length > 1 ? "s" : ""} ${missing.join(", ")}.` });
  warnings.push(...geometryWarnings(rows, settings, units));
  if (oversize && !oversize.ok) {
    const where = `cylinder ${worst?.number ?? "?"} reads ${size(oversize.worstReadingUm, units)}`;
    const wall = oversize.wallAfterUm !== null ? ` (wall left ${size(oversize.wallAfterUm, units)})` : "";
    warnings.push({ code: oversize.reason, tone: "stop", cylinder: worst?.number, message: `${oversize.message} Worst bore: ${where}${wall}.` });
  }
  if (input.pistons.length > 0 && !band) warnings.push({ code: "BANDS_DISAGREE", tone: "caution", message: "The pistons' clearance bands do not overlap: check the maker's figures." });
  if (pairing && !pairing.result.ok) warnings.push(pairingWarning(pairing.result, measured));
  return { cylinders: rows, worst: worst ? { cylinder: worst.number, readingUm: oversize!.worstReadingUm } : null, oversize, allowance: proposal?.sizing.allowance ?? null, pairing, warnings };
}
export type IntakeSummary = ReturnType<typeof intakeSummary>;
