import { HoningInputError, requireFinite, requirePositive } from "./errors";

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

/** Standard normal CDF through erfc (Numerical Recipes' Chebyshev fit, relative error below 1.2·10⁻⁷). */
export function normalCdf(z: number): number {
  requireFinite("z", z);
  const x = Math.abs(z) / Math.SQRT2;
  const t = 1 / (1 + 0.5 * x);
  const erfc = t * Math.exp(-x * x - 1.26551223 + t * (1.00002368 + t * (0.37409196 + t * (0.09678418 + t * (-0.18628806 + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))));
  return z >= 0 ? 1 - erfc / 2 : erfc / 2;
}

/** The share of bores outside [lower, upper] if the finished sizes were normal with this mean and σ. */
export function outsideShare(meanUm: number, sdUm: number, lowerUm: number, upperUm: number): number {
  requireFinite("meanUm", meanUm);
  requireFinite("sdUm", sdUm);
  if (!(sdUm > 0)) return meanUm < lowerUm || meanUm > upperUm ? 1 : 0;
  return normalCdf((lowerUm - meanUm) / sdUm) + (1 - normalCdf((upperUm - meanUm) / sdUm));
}

/** "about 1 bore in 370": the share as one bore in so many, rounded to two significant figures. */
export function oneIn(share: number): string {
  requireFinite("share", share);
  if (!(share > 0)) return "practically none";
  const n = 1 / share;
  if (n < 1.5) return "most bores";
  const rounded = Number(n.toPrecision(2));
  return `about 1 bore in ${rounded.toLocaleString("en-US")}`;
}

/** Counts per bin of width `binUm`, from the lowest value's bin to the highest's (at most `maxBins`, wider bins past that). */
export function histogram(valuesUm: readonly number[], binUm: number, maxBins = 24): Array<{ fromUm: number; toUm: number; count: number }> {
  requirePositive("binUm", binUm);
  if (!Number.isInteger(maxBins) || maxBins < 1 || maxBins > 1000) throw new HoningInputError("maxBins", "between 1 and 1000 bins");
  if (valuesUm.length === 0) return [];
  valuesUm.forEach((v, i) => requireFinite(`valuesUm[${i}]`, v));
  const lo = Math.min(...valuesUm);
  const hi = Math.max(...valuesUm);
  let width = binUm;
  while ((hi - lo) / width + 1 > maxBins) width *= 2;
  const start = Math.floor(lo / width) * width;
  const bins = Math.floor((hi - start) / width) + 1;
  const out = Array.from({ length: bins }, (_, i) => ({ fromUm: start + i * width, toUm: start + (i + 1) * width, count: 0 }));
  for (const v of valuesUm) out[Math.min(bins - 1, Math.floor((v - start) / width))]!.count++;
  return out;
}
