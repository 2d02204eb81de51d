import { HoningInputError, requireNonNegative, requirePositive } from "./errors";
import { boreGeometry } from "./geometry";
import { checkClearance } from "./sizing";
import { temperatureSettled, type Temperatures } from "./thermal";
import type { ReadingLevel } from "./types";

export const SURFACE_PARAMETERS = ["raUm", "rzUm", "rkUm", "rpkUm", "rvkUm", "mr1Pct", "mr2Pct"] as const;
export type SurfaceParameter = (typeof SURFACE_PARAMETERS)[number];
export const SURFACE_LABELS: Record<SurfaceParameter, { name: string; unit: "µm" | "%" }> = {
  raUm: { name: "Ra", unit: "µm" }, rzUm: { name: "Rz", unit: "µm" }, rkUm: { name: "Rk", unit: "µm" }, rpkUm: { name: "Rpk", unit: "µm" },
  rvkUm: { name: "Rvk", unit: "µm" }, mr1Pct: { name: "Mr1", unit: "%" }, mr2Pct: { name: "Mr2", unit: "%" },
};
export type SurfaceReading = Partial<Record<SurfaceParameter, number>>;
export type SurfaceTargets = Partial<Record<SurfaceParameter, { min?: number; max?: number }>>;

export type InspectionCheck = "size_small" | "size_large" | "taper" | "out_of_round" | "clearance_tight" | "clearance_loose" | "surface";

export interface InspectionFailure {
  check: InspectionCheck;
  /** The measured figure and the limit it broke, in µm (or % for Mr1/Mr2). */
  value: number;
  limit: number;
  by: number;
  where: string;
  message: string;
}

export interface CylinderVerdict {
  status: "pass" | "fail" | "held";
  failures: InspectionFailure[];
  taperUm: number;
  outOfRoundUm: number;
  minUm: number;
  maxUm: number;
  clearanceUm: number | null;
  temperatureDifferenceK: number | null;
  reason: string;
}

export interface InspectionInput {
  /** The final reading set, corrected to 20 °C. */
  levels: readonly ReadingLevel[];
  band: { minUm: number; maxUm: number };
  tolerances: { taperUm: number; outOfRoundUm: number };
  piston?: { diameterUm: number; clearanceMinUm: number; clearanceMaxUm: number } | null;
  temperatures?: Temperatures | null;
  maxTemperatureDifferenceK?: number;
  surface?: SurfaceReading | null;
  surfaceTargets?: SurfaceTargets | null;
}

export const INSPECTION_RULE =
  "pass = every reading in the band, taper and out-of-round within the shop's tolerances [C, DESIGN §5.2], clearance to the matched piston in its band [V S17], surface within the plateau stone's targets; held while block and gauge differ by more than the set difference [C]";

const fmt = (x: number, unit = "µm") => `${x.toFixed(1)} ${unit}`;

function surfaceFailures(surface: SurfaceReading, targets: SurfaceTargets): InspectionFailure[] {
  return SURFACE_PARAMETERS.flatMap((key) => {
    const value = surface[key];
    const target = targets[key];
    if (value === undefined || !target) return [] as InspectionFailure[];
    requireNonNegative(`surface.${key}`, value);
    const { name, unit } = SURFACE_LABELS[key];
    if (target.max !== undefined && value > target.max) {
      return [{ check: "surface" as const, value, limit: target.max, by: value - target.max, where: name, message: `${name} ${fmt(value, unit)} is ${fmt(value - target.max, unit)} above the ${fmt(target.max, unit)} target.` }];
    }
    if (target.min !== undefined && value < target.min) {
      return [{ check: "surface" as const, value, limit: target.min, by: target.min - value, where: name, message: `${name} ${fmt(value, unit)} is ${fmt(target.min - value, unit)} below the ${fmt(target.min, unit)} target.` }];
    }
    return [];
  });
}

function sizeFailures(levels: readonly ReadingLevel[], band: InspectionInput["band"]): InspectionFailure[] {
  return levels.flatMap((l) => (["A", "B"] as const).flatMap((d): InspectionFailure[] => {
    const value = d === "A" ? l.aUm : l.bUm;
    const where = `${l.name} ${d}`;
    if (value > band.maxUm) return [{ check: "size_large" as const, value, limit: band.maxUm, by: value - band.maxUm, where, message: `At ${where} the bore is ${fmt(value - band.maxUm)} over the band.` }];
    if (value < band.minUm) return [{ check: "size_small" as const, value, limit: band.minUm, by: band.minUm - value, where, message: `At ${where} the bore is ${fmt(band.minUm - value)} under the band.` }];
    return [];
  }));
}

/** The final verdict of one cylinder: which number failed and by how much, or held while the block is warm. */
export function inspectCylinder(input: InspectionInput): CylinderVerdict {
  const { band, tolerances } = input;
  requirePositive("band.minUm", band.minUm);
  requirePositive("band.maxUm", band.maxUm);
  if (band.minUm > band.maxUm) throw new HoningInputError("band.minUm", "the band's lower limit is above its upper limit");
  requireNonNegative("tolerances.taperUm", tolerances.taperUm);
  requireNonNegative("tolerances.outOfRoundUm", tolerances.outOfRoundUm);
  const geometry = boreGeometry({ levels: input.levels });
  const failures = sizeFailures(input.levels, band);
  if (geometry.taperUm > tolerances.taperUm) {
    failures.push({ check: "taper", value: geometry.taperUm, limit: tolerances.taperUm, by: geometry.taperUm - tolerances.taperUm, where: `direction ${geometry.taperDirection}`, message: `Taper ${fmt(geometry.taperUm)} is ${fmt(geometry.taperUm - tolerances.taperUm)} over the ${fmt(tolerances.taperUm)} tolerance.` });
  }
  if (geometry.outOfRoundUm > tolerances.outOfRoundUm) {
    failures.push({ check: "out_of_round", value: geometry.outOfRoundUm, limit: tolerances.outOfRoundUm, by: geometry.outOfRoundUm - tolerances.outOfRoundUm, where: geometry.outOfRoundLevel, message: `Out-of-round ${fmt(geometry.outOfRoundUm)} at ${geometry.outOfRoundLevel} is ${fmt(geometry.outOfRoundUm - tolerances.outOfRoundUm)} over the ${fmt(tolerances.outOfRoundUm)} tolerance.` });
  }
  let clearanceUm: number | null = null;
  if (input.piston) {
    const p = input.piston;
    const clearance = checkClearance({ boreDiameterUm: geometry.minUm, pistonDiameterUm: p.diameterUm, clearanceMinUm: p.clearanceMinUm, clearanceMaxUm: p.clearanceMaxUm });
    clearanceUm = clearance.clearanceUm;
    const loose = checkClearance({ boreDiameterUm: geometry.maxUm, pistonDiameterUm: p.diameterUm, clearanceMinUm: p.clearanceMinUm, clearanceMaxUm: p.clearanceMaxUm });
    if (clearance.verdict === "tight") failures.push({ check: "clearance_tight", value: clearance.clearanceUm, limit: p.clearanceMinUm, by: p.clearanceMinUm - clearance.clearanceUm, where: "smallest reading", message: `Clearance to the piston ${fmt(clearance.clearanceUm)} is ${fmt(p.clearanceMinUm - clearance.clearanceUm)} tighter than the ${fmt(p.clearanceMinUm)} minimum.` });
    if (loose.verdict === "loose") failures.push({ check: "clearance_loose", value: loose.clearanceUm, limit: p.clearanceMaxUm, by: loose.clearanceUm - p.clearanceMaxUm, where: "largest reading", message: `Clearance to the piston ${fmt(loose.clearanceUm)} is ${fmt(loose.clearanceUm - p.clearanceMaxUm)} looser than the ${fmt(p.clearanceMaxUm)} maximum.` });
  }
  if (input.surface && input.surfaceTargets) failures.push(...surfaceFailures(input.surface, input.surfaceTargets));
  const settled = input.temperatures ? temperatureSettled(input.temperatures, input.maxTemperatureDifferenceK) : null;
  const common = { failures, taperUm: geometry.taperUm, outOfRoundUm: geometry.outOfRoundUm, minUm: geometry.minUm, maxUm: geometry.maxUm, clearanceUm, temperatureDifferenceK: settled?.differenceK ?? null };
  if (settled && !settled.settled) {
    return { ...common, status: "held", reason: `The block is ${settled.differenceK.toFixed(1)} K away from the gauge: let it settle within ${input.maxTemperatureDifferenceK ?? 2} K and measure again.` };
  }
  return failures.length === 0
    ? { ...common, status: "pass", reason: "Size, taper, out-of-round and clearance are within the limits." }
    : { ...common, status: "fail", reason: failures.map((f) => f.message).join(" ") };
}

/** The job passes when every cylinder's last verdict passes; it lists the cylinders still open or failed. */
export function inspectJob(cylinders: readonly { cylinder: number; verdict: CylinderVerdict["status"] | null }[]): { status: "pass" | "fail" | "open"; failed: number[]; open: number[] } {
  const failed = cylinders.filter((c) => c.verdict === "fail").map((c) => c.cylinder);
  const open = cylinders.filter((c) => c.verdict === null || c.verdict === "held").map((c) => c.cylinder);
  return { status: failed.length > 0 ? "fail" : open.length > 0 ? "open" : "pass", failed, open };
}
