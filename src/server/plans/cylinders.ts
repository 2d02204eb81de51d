import "server-only";
import { boreGeometry, finishedBore, matchPistons, MAX_MATCH_COUNT, DEFAULT_MAX_HONING_STOCK_UM, type BoreStateInput, type ClearanceBand, type JobCylinderInput } from "@/lib/honing";
import type { ReadingSetView as FullReadingSetView } from "@/server/readings/queries";
import type { PistonView as FullPistonView } from "@/server/pistons/queries";
import { AppError } from "@/server/errors";
import type { BoreBasis } from "@/shared/plans/constants";
import type { CylinderChoice, JobPlanRequest } from "@/shared/plans/schema";

// Turns the wizard's per-cylinder choices and the job's records into planHone's bore and piston
// inputs. Nothing here computes a plan: it picks records and hands their numbers on.

/** The fields of a reading set and of a piston record that planning reads (plans/records.ts loads only these). */
export type ReadingSetView = Pick<FullReadingSetView, "id" | "cylinderId" | "kind" | "takenAt" | "levels">;
export type PistonView = Pick<FullPistonView, "id" | "cylinderId" | "label" | "diameterUm" | "sizingHeightUm">;

export type PistonSource = "typed" | "record" | "assigned" | "paired" | "label order";
export type CylinderBasis = {
  cylinder: number;
  cylinderId: string;
  piston: { source: PistonSource; pistonId: string | null; label: string; diameterUm: number; sizingHeightUm: number | null } | null;
  bore: { basis: BoreBasis; readingSetId: string | null; readingKind: string | null; takenAt: string | null; levels: ReadingSetView["levels"] } | null;
  /** Why this cylinder cannot be planned yet (no readings, no piston); the wizard asks for the figure. */
  needs: Array<{ field: "bore" | "piston"; message: string }>;
};

const isFullSet = (set: ReadingSetView) => set.levels.length >= 2 && set.levels.every((l) => l.aUm > 0 && l.bUm > 0);

/** The latest full reading set of a cylinder (any kind but "final": a finished bore is not re-planned). */
export function latestFullSet(sets: ReadingSetView[], cylinderId: string): ReadingSetView | null {
  return sets.find((s) => s.cylinderId === cylinderId && s.kind !== "final" && isFullSet(s)) ?? null;
}

function boreOf(choice: CylinderChoice, set: ReadingSetView | null): CylinderBasis["bore"] {
  if (choice.bore.kind === "diameter" || choice.bore.kind === "stock") {
    return { basis: choice.bore.kind, readingSetId: null, readingKind: null, takenAt: null, levels: [] };
  }
  if (!set) return null;
  return { basis: "readings", readingSetId: set.id, readingKind: set.kind, takenAt: set.takenAt, levels: set.levels };
}

export function boreStateOf(choice: CylinderChoice, basis: NonNullable<CylinderBasis["bore"]>): BoreStateInput {
  if (choice.bore.kind === "diameter") return { kind: "diameter", diameterUm: choice.bore.diameterUm };
  if (choice.bore.kind === "stock") return { kind: "stock", stockUm: choice.bore.stockUm };
  return { kind: "readings", levels: basis.levels };
}

const largestReading = (choice: CylinderChoice, bore: CylinderBasis["bore"]): number | null => {
  if (choice.bore.kind === "diameter") return choice.bore.diameterUm;
  if (choice.bore.kind === "readings" && bore && bore.levels.length > 0) return boreGeometry({ levels: bore.levels }).maxUm;
  return null;
};

/**
 * Loose pistons go to the bores that have no assigned one: matchPistons with a band that keeps every
 * bore able to clean up (bore − piston ≤ target clearance) and evens out the stock (smallest spread)
 * [D, DESIGN §5.6]. Where no such pairing exists, label order, and planHone flags the bore over target.
 */
function pairLoose(open: Array<{ cylinder: number; largestUm: number | null }>, loose: PistonView[], clearance: JobPlanRequest["clearance"]) {
  const pairs = new Map<number, { piston: PistonView; source: PistonSource }>();
  const sized = open.filter((o) => o.largestUm !== null);
  // Bore − piston at the target finished size (target clearance + allowance), from the sizing rule.
  const sizing = finishedBore(pistonInput(1, clearance));
  const target = sizing.targetUm - sizing.pistonDiameterUm;
  // More than the matching takes (rows from before the per-job bound): label order, never an unbounded search.
  const match = sized.length > 0 && loose.length >= sized.length && loose.length <= MAX_MATCH_COUNT && sized.length <= MAX_MATCH_COUNT
    ? matchPistons({ pistons: loose.map((p) => ({ id: p.id, diameterUm: p.diameterUm })), bores: sized.map((o) => ({ id: String(o.cylinder), diameterUm: o.largestUm! })), clearanceMinUm: target - DEFAULT_MAX_HONING_STOCK_UM, clearanceMaxUm: target })
    : null;
  const used = new Set<string>();
  if (match?.ok) {
    for (const pair of match.pairs) {
      const piston = loose.find((p) => p.id === pair.pistonId)!;
      pairs.set(Number(pair.boreId), { piston, source: "paired" });
      used.add(piston.id);
    }
  }
  const rest = loose.filter((p) => !used.has(p.id));
  for (const o of open) {
    if (pairs.has(o.cylinder)) continue;
    const piston = rest.shift();
    if (piston) pairs.set(o.cylinder, { piston, source: "label order" });
  }
  return pairs;
}

function pistonFromRecord(p: PistonView, source: PistonSource): NonNullable<CylinderBasis["piston"]> {
  return { source, pistonId: p.id, label: p.label, diameterUm: p.diameterUm, sizingHeightUm: p.sizingHeightUm };
}

function chosenPiston(choice: CylinderChoice, index: number, pistons: PistonView[], cylinderId: string): CylinderBasis["piston"] | undefined {
  if (choice.pistonDiameterUm != null) return { source: "typed", pistonId: null, label: "typed", diameterUm: choice.pistonDiameterUm, sizingHeightUm: null };
  if (choice.pistonId) {
    const record = pistons.find((p) => p.id === choice.pistonId);
    if (!record) throw new AppError("bad_request", "Pick a piston of this job.", { fieldErrors: { [`cylinders.${index}.pistonId`]: ["Pick a piston of this job."] } });
    return pistonFromRecord(record, "record");
  }
  const assigned = pistons.find((p) => p.cylinderId === cylinderId);
  return assigned ? pistonFromRecord(assigned, "assigned") : undefined;
}

/** The first clearance a job is planned with: its pistons' common band, the middle as target, no allowance. */
export function defaultClearance(band: ClearanceBand): JobPlanRequest["clearance"] {
  return { minUm: band.clearanceMinUm, maxUm: band.clearanceMaxUm, targetUm: null, performanceAllowanceUm: 0, bandWideningUm: 0 };
}

/** Each requested cylinder with the readings and piston it rests on, or what it still needs. */
export function resolveCylinders(input: {
  request: Pick<JobPlanRequest, "cylinders" | "clearance">;
  cylinders: Array<{ id: string; number: number }>;
  sets: ReadingSetView[];
  pistons: PistonView[];
}): CylinderBasis[] {
  const { request, cylinders, sets, pistons } = input;
  const choices: CylinderChoice[] = request.cylinders.length > 0 ? request.cylinders : cylinders.map((c) => ({ cylinder: c.number, bore: { kind: "readings" } }));
  const resolved = choices.map((choice, index) => {
    const cylinder = cylinders.find((c) => c.number === choice.cylinder);
    if (!cylinder) throw new AppError("bad_request", `This job has no cylinder ${choice.cylinder}.`, { fieldErrors: { [`cylinders.${index}.cylinder`]: [`This job has no cylinder ${choice.cylinder}.`] } });
    const bore = boreOf(choice, latestFullSet(sets, cylinder.id));
    return { choice, cylinder, bore, piston: chosenPiston(choice, index, pistons, cylinder.id) };
  });
  const taken = new Set(resolved.flatMap((r) => (r.piston?.pistonId ? [r.piston.pistonId] : [])));
  const loose = pistons.filter((p) => !taken.has(p.id) && (p.cylinderId === null || !cylinders.some((c) => c.id === p.cylinderId)));
  const open = resolved.filter((r) => r.piston === undefined).map((r) => ({ cylinder: r.choice.cylinder, largestUm: largestReading(r.choice, r.bore) }));
  const paired = pairLoose(open, loose, request.clearance);
  return resolved.map(({ choice, cylinder, bore, piston }) => {
    const pair = paired.get(choice.cylinder);
    const finalPiston = piston ?? (pair ? pistonFromRecord(pair.piston, pair.source) : null);
    const needs: CylinderBasis["needs"] = [];
    if (!bore) needs.push({ field: "bore", message: `Cylinder ${choice.cylinder} has no full reading set: type the bore size or the stock left.` });
    if (!finalPiston) needs.push({ field: "piston", message: `Cylinder ${choice.cylinder} has no piston: pick a piston record or type its size.` });
    return { cylinder: choice.cylinder, cylinderId: cylinder.id, piston: finalPiston, bore, needs };
  });
}

/** planHoneJob's cylinder list: only the cylinders that have both a bore and a piston. */
export function jobCylinderInputs(bases: CylinderBasis[], choices: CylinderChoice[], clearance: JobPlanRequest["clearance"]): JobCylinderInput[] {
  return bases.flatMap((b) => {
    if (!b.bore || !b.piston) return [];
    const choice = choices.find((c) => c.cylinder === b.cylinder) ?? { cylinder: b.cylinder, bore: { kind: "readings" as const } };
    return [{ cylinder: b.cylinder, bore: boreStateOf(choice, b.bore), piston: pistonInput(b.piston.diameterUm, clearance) }];
  });
}

export function pistonInput(pistonDiameterUm: number, clearance: JobPlanRequest["clearance"]) {
  return {
    pistonDiameterUm, clearanceMinUm: clearance.minUm, clearanceMaxUm: clearance.maxUm,
    clearanceTargetUm: clearance.targetUm ?? undefined, performanceAllowanceUm: clearance.performanceAllowanceUm,
    bandWideningUm: clearance.bandWideningUm,
  };
}
