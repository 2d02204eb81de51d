// The machining record's view (issue 14): every figure already in the customer's units, with its
// unit, beside the µm it came from (tests compare those with the final readings). Built here, pure,
// from what the server loads; the page, the PDF and the customer's link all render this one object.
import { boreMaterialLabel, type BoreMaterial } from "@/lib/bore-materials";
import { formatOversizeStep, SURFACE_LABELS, SURFACE_PARAMETERS, type SurfaceReading } from "@/lib/honing";
import { STONE_ROLE_LABELS, type StoneRoleName } from "@/shared/stones/constants";
import { displayUnits, size, small, type UnitSystem } from "@/shared/units";

export type Figure = { um: number; text: string };

export type RecordCylinder = {
  number: number;
  piston: { label: string; diameter: Figure; sizingHeight: Figure | null };
  levels: { name: string; a: Figure; b: Figure }[];
  smallest: Figure;
  largest: Figure;
  /** Bore minus piston at the smallest and the largest reading. */
  clearance: { min: Figure; max: Figure };
  taper: Figure;
  outOfRound: Figure;
  finish: { name: string; text: string }[];
  stones: { stage: string; code: string; grit: string }[];
  inspectedBy: string;
  inspectedAt: string;
};

export type RecordView = {
  unitSystem: UnitSystem;
  units: { size: string; small: string };
  /** timeZone: the shop's when the record was made; records sent before it was kept read as UTC. */
  shop: { name: string; address: string; contact: string; hasLogo: boolean; timeZone?: string };
  job: {
    id: string; number: number; customer: string; engineDescription: string; material: string;
    standardBore: Figure; oversize: { um: number; text: string }; torquePlate: boolean; notes: string;
  };
  cylinders: RecordCylinder[];
  inspection: { by: string; at: string };
  remarks: string;
  madeAt: string;
};

export type RecordSource = {
  shop: { name: string; address: string; contact: string; hasLogo: boolean; remarks: string; oversizeStepsUm: number[]; timeZone: string };
  job: { id: string; number: number; customer: string | null; engineDescription: string; boreMaterial: BoreMaterial; standardBoreUm: number; torquePlate: boolean; notes: string | null };
  cylinders: {
    number: number;
    piston: { label: string; diameterUm: number; sizingHeightUm: number | null };
    /** The final reading set, corrected to 20 °C. */
    levels: { name: string; aUm: number; bUm: number }[];
    verdict: { minUm: number; maxUm: number; taperUm: number; outOfRoundUm: number };
    surface: SurfaceReading | null;
    stages: { role: StoneRoleName; code: string; grit: string }[];
    inspectedBy: string;
    inspectedAt: Date;
  }[];
  madeAt: Date;
};

const UNIT_NAMES = { mm: "mm", in: "in", um: "µm", thou: "thou" } as const;

/** The shop's oversize step (named as bought: mm or inch steps) nearest the finished size over standard (the step the pistons were bought for). */
export function oversizeStep(finishedUm: number, standardUm: number, stepsUm: readonly number[]): number {
  const over = finishedUm - standardUm;
  const steps = stepsUm.length > 0 ? stepsUm : [0];
  return steps.reduce((best, s) => (Math.abs(s - over) < Math.abs(best - over) ? s : best), steps[0]!);
}

function finishOf(surface: SurfaceReading | null): RecordCylinder["finish"] {
  if (!surface) return [];
  return SURFACE_PARAMETERS.flatMap((key) => {
    const value = surface[key];
    if (value === undefined || value === null) return [];
    const { name, unit } = SURFACE_LABELS[key];
    return [{ name, text: unit === "%" ? `${value.toFixed(0)} %` : `${value.toFixed(2)} µm` }];
  });
}

/** The record of a job that passed final inspection, in the customer's units. */
export function buildRecordView(source: RecordSource, system: UnitSystem): RecordView {
  const u = displayUnits(system);
  const big = (um: number): Figure => ({ um, text: size(um, u) });
  const little = (um: number): Figure => ({ um, text: small(um, u) });
  const cylinders = [...source.cylinders].sort((a, b) => a.number - b.number).map((c): RecordCylinder => ({
    number: c.number,
    piston: { label: c.piston.label, diameter: big(c.piston.diameterUm), sizingHeight: c.piston.sizingHeightUm === null ? null : big(c.piston.sizingHeightUm) },
    levels: c.levels.map((l) => ({ name: l.name, a: big(l.aUm), b: big(l.bUm) })),
    smallest: big(c.verdict.minUm),
    largest: big(c.verdict.maxUm),
    clearance: { min: little(c.verdict.minUm - c.piston.diameterUm), max: little(c.verdict.maxUm - c.piston.diameterUm) },
    taper: little(c.verdict.taperUm),
    outOfRound: little(c.verdict.outOfRoundUm),
    finish: finishOf(c.surface),
    stones: c.stages.map((s) => ({ stage: STONE_ROLE_LABELS[s.role], code: s.code, grit: s.grit })),
    inspectedBy: c.inspectedBy,
    inspectedAt: c.inspectedAt.toISOString(),
  }));
  const last = [...source.cylinders].sort((a, b) => b.inspectedAt.getTime() - a.inspectedAt.getTime())[0];
  const inspectors = [...new Set(source.cylinders.map((c) => c.inspectedBy))];
  const meanFinished = source.cylinders.length === 0 ? source.job.standardBoreUm
    : source.cylinders.reduce((sum, c) => sum + (c.verdict.minUm + c.verdict.maxUm) / 2, 0) / source.cylinders.length;
  const step = oversizeStep(meanFinished, source.job.standardBoreUm, source.shop.oversizeStepsUm);
  return {
    unitSystem: system,
    units: { size: UNIT_NAMES[u.size], small: UNIT_NAMES[u.small] },
    shop: { name: source.shop.name, address: source.shop.address, contact: source.shop.contact, hasLogo: source.shop.hasLogo, timeZone: source.shop.timeZone },
    job: {
      id: source.job.id, number: source.job.number, customer: source.job.customer ?? "—", engineDescription: source.job.engineDescription,
      material: boreMaterialLabel(source.job.boreMaterial), standardBore: big(source.job.standardBoreUm),
      oversize: { um: step, text: formatOversizeStep(step) }, torquePlate: source.job.torquePlate, notes: source.job.notes ?? "",
    },
    cylinders,
    inspection: { by: inspectors.join(", "), at: (last?.inspectedAt ?? source.madeAt).toISOString() },
    remarks: source.shop.remarks,
    madeAt: source.madeAt.toISOString(),
  };
}
