import { HoningInputError, requireFinite } from "./errors";

export interface Capability {
  count: number;
  meanUm: number;
  /** Sample standard deviation (n − 1). */
  sdUm: number;
  cp: number | null;
  cpk: number | null;
  rule: string;
}

export const CAPABILITY_RULE =
  "Cp = (USL − LSL) / 6σ, Cpk = min(USL − μ, μ − LSL) / 3σ, σ the sample standard deviation [NIST/SEMATECH e-Handbook of Statistical Methods §6.1.6]";

/**
 * How well a machine holds the band on one bore material: from finished sizes (or their deviation from
 * target) and the band's limits. Cp and Cpk are null with fewer than two values or no spread.
 */
export function processCapability(valuesUm: readonly number[], lowerUm: number, upperUm: number): Capability {
  requireFinite("lowerUm", lowerUm);
  requireFinite("upperUm", upperUm);
  if (lowerUm >= upperUm) throw new HoningInputError("lowerUm", "the lower limit must be below the upper");
  valuesUm.forEach((v, i) => requireFinite(`valuesUm[${i}]`, v));
  const count = valuesUm.length;
  const meanUm = count === 0 ? 0 : valuesUm.reduce((a, b) => a + b, 0) / count;
  const sdUm = count < 2 ? 0 : Math.sqrt(valuesUm.reduce((a, v) => a + (v - meanUm) ** 2, 0) / (count - 1));
  const spread = sdUm > 0 ? sdUm : null;
  return {
    count, meanUm, sdUm,
    cp: spread === null ? null : (upperUm - lowerUm) / (6 * spread),
    cpk: spread === null ? null : Math.min(upperUm - meanUm, meanUm - lowerUm) / (3 * spread),
    rule: CAPABILITY_RULE,
  };
}

/** A plain sentence for the shop: what the index means for the bores it finishes [C]. */
export function capabilityVerdict(c: Capability): string {
  if (c.cpk === null) return "Too few finished bores to say how well the band is held.";
  if (c.cpk >= 1.33) return "The band is held with room to spare: almost every bore lands well inside it.";
  if (c.cpk >= 1) return "The band is held, but with little room: a small shift would put bores outside it.";
  return "Some bores will land outside the band: centre the process on the target or reduce its spread.";
}
