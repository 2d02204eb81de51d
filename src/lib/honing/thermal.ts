import { HoningInputError, requireFinite, requirePositive } from "./errors";

/** Reference temperature of lengths: 20 °C (ISO 1). */
export const REFERENCE_TEMPERATURE_C = 20;

/**
 * Linear expansion coefficients, µm per m per K, near room temperature [M: engineering handbook
 * tables, from memory]. Grey iron 10–12 µm/m·K (the middle taken); the gauge and its setting master
 * are steel, about 11.5 µm/m·K. A liner in an aluminium block is taken at the liner's iron figure.
 */
export const EXPANSION_UM_PER_M_K = {
  grey_iron: 11,
  cgi: 11.5,
  ductile_iron: 11.5,
  al_iron_liner: 11,
  steel_liner: 11.5,
  hypereutectic_al: 18,
  coated: 11,
  gauge_steel: 11.5,
} as const satisfies Record<string, number>;

/** Block minus gauge temperature past which a final verdict waits for the block to cool: 2 K [C, shop setting]. */
export const DEFAULT_MAX_TEMPERATURE_DIFFERENCE_K = 2;

export const THERMAL_RULE =
  "D(20 °C) = reading × (1 + α_gauge·(t_gauge − 20)) / (1 + α_bore·(t_block − 20)) [ISO 1 reference; D]; ≈ reading − α·(t_block − t_gauge)·D when α_bore ≈ α_gauge";

const TEMPERATURE_LIMITS_C = { min: -30, max: 150 } as const;

function requireTemperature(field: string, value: number): void {
  requireFinite(field, value);
  if (value < TEMPERATURE_LIMITS_C.min || value > TEMPERATURE_LIMITS_C.max) throw new HoningInputError(field, "must be from −30 °C to 150 °C");
}

export interface Temperatures {
  blockC: number;
  gaugeC: number;
}

/** A reading taken with a gauge at t_gauge on a bore at t_block, as the bore would be at 20 °C [ISO 1; D]. */
export function diameterAt20C(readingUm: number, temperatures: Temperatures, boreExpansionUmPerMK: number, gaugeExpansionUmPerMK: number = EXPANSION_UM_PER_M_K.gauge_steel): number {
  requirePositive("readingUm", readingUm);
  requireTemperature("blockC", temperatures.blockC);
  requireTemperature("gaugeC", temperatures.gaugeC);
  requirePositive("boreExpansionUmPerMK", boreExpansionUmPerMK);
  requirePositive("gaugeExpansionUmPerMK", gaugeExpansionUmPerMK);
  if (boreExpansionUmPerMK > 100 || gaugeExpansionUmPerMK > 100) throw new HoningInputError("boreExpansionUmPerMK", "must be at most 100 µm/m·K");
  const bore = 1 + boreExpansionUmPerMK * 1e-6 * (temperatures.blockC - REFERENCE_TEMPERATURE_C);
  const gauge = 1 + gaugeExpansionUmPerMK * 1e-6 * (temperatures.gaugeC - REFERENCE_TEMPERATURE_C);
  return (readingUm * gauge) / bore;
}

/** Whether the block is close enough to the gauge's temperature for a final verdict [C]. */
export function temperatureSettled(temperatures: Temperatures, maxDifferenceK: number = DEFAULT_MAX_TEMPERATURE_DIFFERENCE_K): { settled: boolean; differenceK: number } {
  requireTemperature("blockC", temperatures.blockC);
  requireTemperature("gaugeC", temperatures.gaugeC);
  requireFinite("maxDifferenceK", maxDifferenceK);
  if (maxDifferenceK < 0 || maxDifferenceK > 50) throw new HoningInputError("maxDifferenceK", "must be 0 to 50 K");
  const differenceK = temperatures.blockC - temperatures.gaugeC;
  return { settled: Math.abs(differenceK) <= maxDifferenceK + 1e-9, differenceK };
}

/** Every level of a reading set corrected to 20 °C. */
export function levelsAt20C<L extends { aUm: number; bUm: number }>(levels: readonly L[], temperatures: Temperatures, boreExpansionUmPerMK: number): L[] {
  return levels.map((l) => ({ ...l, aUm: diameterAt20C(l.aUm, temperatures, boreExpansionUmPerMK), bUm: diameterAt20C(l.bUm, temperatures, boreExpansionUmPerMK) }));
}
