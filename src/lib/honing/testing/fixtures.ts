/**
 * Example inputs for the honing tests and bench. The stone rows and machine are INVENTED example
 * inputs (labelled demo), not check values; where a figure matches trade-facts it says so.
 */
import type { MachineInput, PlanHoneInput, StoneInput } from "../index";

const THOU = 25.4;

/** Demo stones (invented). Finish rate 0.5 µm per double stroke as in trade-facts §11.28; stone 75 mm as §11.26. */
export const demoStones = (): StoneInput[] => [
  {
    id: "demo-coarse", role: "coarse", stoneLengthUm: 75_000, currentHeightUm: 6_000, wearLimitHeightUm: 1_000,
    rate: { removalPerDoubleStrokeUm: 1.2, referencePressure: 1, referenceBoreLengthUm: 140_000, uncertaintyFraction: 0.25, raUm: 1.6, rzUm: 7, wearUmPerUmStock: 0.5 },
  },
  {
    id: "demo-finish", role: "finish", stoneLengthUm: 75_000, currentHeightUm: 6_000, wearLimitHeightUm: 1_000,
    rate: { removalPerDoubleStrokeUm: 0.5, referencePressure: 1, referenceBoreLengthUm: 140_000, uncertaintyFraction: 0.25, raUm: 0.5, rzUm: 3, wearUmPerUmStock: 0.3 },
  },
  {
    id: "demo-plateau", role: "plateau", stoneLengthUm: 75_000, currentHeightUm: 6_000, wearLimitHeightUm: 1_000,
    rate: { removalPerDoubleStrokeUm: 0.2, referencePressure: 1, referenceBoreLengthUm: 140_000, uncertaintyFraction: 0.3, raUm: 0.3, rzUm: 1.5, wearUmPerUmStock: 0.2 },
  },
];

/** Demo machine (invented ranges). */
export const demoMachine = (): MachineInput => ({
  spindleRpmMin: 80, spindleRpmMax: 400, doubleStrokesPerMinMin: 20, doubleStrokesPerMinMax: 200,
  maxStrokeLengthUm: 250_000, drive: "constant",
});

/**
 * Common practice (practitioner account in issue 3): forged coated-skirt piston 93.92 mm,
 * clearance about 0.004 in → about 94.02 mm. The ±0.0005 in band around it is a demo choice.
 */
export const demoPiston = () => ({
  pistonDiameterUm: 93_920, clearanceMinUm: 3.5 * THOU, clearanceMaxUm: 4.5 * THOU, clearanceTargetUm: 4 * THOU,
});

export const demoInput = (overrides: Partial<PlanHoneInput> = {}): PlanHoneInput => ({
  piston: demoPiston(),
  bore: { kind: "diameter", diameterUm: 93_950 },
  stones: demoStones(),
  machine: demoMachine(),
  boreLengthUm: 140_000,
  ...overrides,
});
