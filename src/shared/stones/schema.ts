// Input of the stone library, shared by the forms and the server.
// Physical limits are sane bounds for honing stones and rate rows; outside them is a typing slip.
import { z } from "zod";
import { parseGrit } from "@/lib/honing";
import { BORE_MATERIAL_CODES } from "@/lib/bore-materials";
import { ABRASIVES, CLEANUP_MODES, PRESSURE_UNITS, RATE_SOURCES, STONE_ROLES } from "./constants";
import { LIMITS, PRESSURE_LIMITS } from "@/shared/limits";
import { checkbox, id, integerIn, lengthUm, numberIn, optionalLengthUm, optionalNumberIn, withPressureUnits } from "@/shared/fields";
import { expectedVersion, notes, reason } from "./fields";

/** A grit written with its scale ("JIS #400", "F220", "D54"); a bare "400" is refused. */
export const gritText = z.string({ error: "Enter the grit with its scale, e.g. JIS #400." }).transform((text, ctx) => {
  const parsed = parseGrit(text);
  if (parsed.ok) return parsed.grit;
  ctx.issues.push({ code: "custom", message: parsed.error, input: text });
  return z.NEVER;
});

const L = LIMITS;
export const stoneFields = z.object({
  code: z.string().trim().min(1, "Give the stone set a code.").max(40, "Keep the code under 40 characters."),
  role: z.enum(STONE_ROLES, { error: "Choose coarse, finish or plateau." }),
  abrasive: z.enum(ABRASIVES, { error: "Choose the abrasive." }),
  grit: gritText,
  bond: z.string().trim().min(1, "Name the bond (e.g. vitrified, resin, metal).").max(60),
  stoneLengthUm: lengthUm("Stone length", L.stoneLengthUm),
  stoneWidthUm: lengthUm("Stone width", L.stoneWidthUm),
  stonesPerHead: integerIn("Stones per head", L.stonesPerHead),
  startHeightUm: lengthUm("Starting height", L.stoneHeightUm),
  wearLimitHeightUm: lengthUm("Wear limit", L.stoneHeightUm),
  currentHeightUm: lengthUm("Current height", { min: 0, max: L.stoneHeightUm.max }),
  notes,
});

function checkHeights(v: { startHeightUm: number; wearLimitHeightUm: number; currentHeightUm: number }, ctx: z.RefinementCtx) {
  if (v.wearLimitHeightUm >= v.startHeightUm) {
    ctx.addIssue({ code: "custom", path: ["wearLimitHeightUm"], message: "The wear limit must be below the starting height." });
  }
  if (v.currentHeightUm > v.startHeightUm) {
    ctx.addIssue({ code: "custom", path: ["currentHeightUm"], message: "The current height cannot exceed the starting height." });
  }
}

export const stoneInputSchema = stoneFields.superRefine(checkHeights);
export type StoneInput = z.output<typeof stoneInputSchema>;

export const createStoneSchema = stoneInputSchema;
export const updateStoneSchema = stoneFields
  .extend({ stoneId: id, expectedVersion, reason })
  .superRefine(checkHeights);
export const setStoneActiveSchema = z.object({ stoneId: id, active: checkbox, reason });

const R = LIMITS;
export const rateFields = z.object({
  removalPerDoubleStrokeUm: numberIn("Removal per double stroke", R.removalPerDoubleStrokeUm, "µm"),
  referencePressure: numberIn("Reference pressure", R.feedPressure),
  referencePressureUnit: z.enum(PRESSURE_UNITS, { error: "Choose bar, dial or N." }),
  referenceBoreLengthUm: lengthUm("Reference bore length", R.referenceBoreLengthUm),
  referenceAngleDeg: numberIn("Reference crosshatch angle", R.referenceAngleDeg, "°").default(45),
  referenceDiameterUm: optionalLengthUm("Reference bore diameter", R.diameterUm),
  raUm: numberIn("Ra", R.raUm, "µm"),
  rzUm: numberIn("Rz", R.rzUm, "µm"),
  rkUm: optionalNumberIn("Rk", R.rkFamilyUm, "µm"),
  rpkUm: optionalNumberIn("Rpk", R.rkFamilyUm, "µm"),
  rvkUm: optionalNumberIn("Rvk", R.rkFamilyUm, "µm"),
  cleanupMode: z.enum(CLEANUP_MODES, { error: "Choose how the clean-up stock is found." }),
  cleanupStockUm: optionalNumberIn("Clean-up stock", R.cleanupStockUm, "µm"),
  cleanupRzMultiple: optionalNumberIn("Rz multiple", R.cleanupRzMultiple),
  wearUmPerUmStock: numberIn("Stone wear", R.wearUmPerUmStock, "µm per µm"),
  uncertaintyFraction: numberIn("Uncertainty", R.uncertaintyFraction),
  source: z.enum(RATE_SOURCES, { error: "Say where the numbers come from." }),
  notes,
});

type RateCheck = z.output<typeof rateFields>;
function checkRate(v: RateCheck, ctx: z.RefinementCtx) {
  const p = PRESSURE_LIMITS[v.referencePressureUnit];
  if (v.referencePressure < p.min || v.referencePressure > p.max) {
    ctx.addIssue({ code: "custom", path: ["referencePressure"], message: `Reference pressure must be ${p.min} to ${p.max} ${v.referencePressureUnit}.` });
  }
  if (v.rzUm < v.raUm) ctx.addIssue({ code: "custom", path: ["rzUm"], message: "Rz cannot be smaller than Ra." });
  if (v.cleanupMode === "explicit" && v.cleanupStockUm === undefined) {
    ctx.addIssue({ code: "custom", path: ["cleanupStockUm"], message: "Enter the clean-up stock, or choose “from Rz”." });
  }
}

const pressureTyped = <T extends z.ZodType>(schema: T) => withPressureUnits(schema, ["referencePressure"], "referencePressureUnit");
export const rateInputSchema = pressureTyped(rateFields.superRefine(checkRate));
export type RateInput = z.output<typeof rateInputSchema>;

export const createRateRowSchema = pressureTyped(rateFields
  .extend({ stoneId: id, boreMaterial: z.enum(BORE_MATERIAL_CODES, { error: "Choose the bore material." }) })
  .superRefine(checkRate));
export const updateRateRowSchema = pressureTyped(rateFields.extend({ rateRowId: id, expectedVersion, reason }).superRefine(checkRate));

export const restoreVersionSchema = z.object({ stoneId: id, versionId: id, reason });
