// The plan wizard's input, shared by the wizard (client validation) and the routes (server
// validation): one schema, one set of physical limits (src/shared/limits.ts).
// Every length is µm; the wizard parses the machinist's text with parseLength before validating.
import { z } from "zod";
import { BORE_MATERIAL_CODES } from "@/lib/bore-materials";
import { DEFAULT_CHECKPOINT_FRACTION, DEFAULT_CROSSHATCH_DEG } from "@/lib/honing";
import { umWithin, valueWithin } from "@/shared/fields";
import { LIMITS } from "@/shared/limits";

const L = LIMITS;
const um = (v: number) => `${v} µm`;

const id = (what: string) => z.string({ error: `Choose ${what}.` }).trim().min(1, `Choose ${what}.`).max(36, `Choose ${what}.`);

export const clearanceSchema = z
  .object({
    minUm: umWithin("smallest clearance", L.clearanceUm, um),
    maxUm: umWithin("largest clearance", L.clearanceUm, um),
    /** Absent: the middle of the band. */
    targetUm: umWithin("target clearance", L.clearanceUm, um).nullable().optional(),
    performanceAllowanceUm: umWithin("performance allowance", L.performanceAllowanceUm, um).default(0),
    /** Explicit widening of the band's upper limit; the allowance alone never widens it. */
    bandWideningUm: umWithin("band widening", L.bandWideningUm, um).default(0),
  })
  .superRefine((v, ctx) => {
    if (v.minUm > v.maxUm) {
      ctx.addIssue({ code: "custom", path: ["maxUm"], message: "The largest clearance is smaller than the smallest: the band is upside down." });
      return;
    }
    if (v.targetUm != null && (v.targetUm < v.minUm || v.targetUm > v.maxUm)) {
      ctx.addIssue({ code: "custom", path: ["targetUm"], message: "The target clearance must lie inside the maker's band." });
      return;
    }
    const target = v.targetUm ?? (v.minUm + v.maxUm) / 2;
    if (target + v.performanceAllowanceUm > v.maxUm + v.bandWideningUm) {
      ctx.addIssue({ code: "custom", path: ["performanceAllowanceUm"], message: "The allowance puts the target past the maker's band: lower it, or widen the band explicitly." });
    }
  });

/** The bore as the plan takes it: the latest reading set, one typed size, or only the stock left. */
export const boreChoiceSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("readings") }),
  z.object({ kind: z.literal("diameter"), diameterUm: umWithin("bore size", L.diameterUm) }),
  z.object({ kind: z.literal("stock"), stockUm: umWithin("stock left", L.stockUm, um) }),
]);
export type BoreChoice = z.infer<typeof boreChoiceSchema>;

const roleRecord = <T extends z.ZodType>(value: T) =>
  z.object({ coarse: value.nullable().optional(), finish: value.nullable().optional(), plateau: value.nullable().optional() }).default({});

/** The choices every plan shares, job or quick. */
const planOptions = {
  machineId: id("a machine"),
  clearance: clearanceSchema,
  /** A stone per role the machinist prefers over the first listed; must have a rate row for the material. */
  stoneIds: roleRecord(z.string().trim().max(36)),
  /** Feed pressure per role, in the unit of that stone's rate row; absent = the reference pressure. */
  pressures: roleRecord(valueWithin("pressure", L.pressure)),
  checkpointFraction: valueWithin("checkpoint fraction", L.checkpointFraction).default(DEFAULT_CHECKPOINT_FRACTION),
  targetCrosshatchDeg: valueWithin("target crosshatch angle", L.crosshatchDeg, "°").default(DEFAULT_CROSSHATCH_DEG),
  overtravelFraction: valueWithin("overtravel fraction", L.overtravelFraction).nullable().optional(),
  /** Holds the spindle at this speed instead of choosing one; must lie in the machine's range. */
  spindleRpm: valueWithin("spindle speed", L.spindleRpm, " rpm").nullable().optional(),
  /** Boring first: true or false as the machinist chose; null = on when the stock is above the shop's setting. */
  boring: z
    .object({ enabled: z.boolean().nullable().default(null), marginUm: umWithin("boring margin", L.boringMarginUm, um).nullable().default(null) })
    .default({ enabled: null, marginUm: null }),
  /** The surface the first stones meet when the plan does not bore; absent = from the readings (as received unless bored). */
  incomingSurface: z.enum(["as_received", "bored"], { error: "Say whether the bore is as received or bored." }).nullable().optional(),
};

export const cylinderChoiceSchema = z.object({
  cylinder: z.number({ error: "Cylinder number missing." }).int().min(1).max(L.cylinders.max),
  /** A piston record of this job; absent = the one assigned to this cylinder or the proposed pairing. */
  pistonId: z.string().trim().max(36).nullable().optional(),
  /** A typed piston size instead of a record. */
  pistonDiameterUm: umWithin("piston size", L.diameterUm).nullable().optional(),
  bore: boreChoiceSchema.default({ kind: "readings" }),
});
export type CylinderChoice = z.infer<typeof cylinderChoiceSchema>;

export const jobPlanSchema = z
  .object({
    mode: z.literal("job"),
    jobId: id("a job"),
    /** Empty: every cylinder of the job with its latest readings and proposed piston. */
    cylinders: z.array(cylinderChoiceSchema).max(L.cylinders.max).default([]),
    ...planOptions,
  })
  .superRefine((v, ctx) => {
    const seen = new Set<number>();
    v.cylinders.forEach((c, i) => {
      if (seen.has(c.cylinder)) ctx.addIssue({ code: "custom", path: ["cylinders", i, "cylinder"], message: `Cylinder ${c.cylinder} is listed twice.` });
      seen.add(c.cylinder);
    });
  });

export const quickPlanSchema = z.object({
  mode: z.literal("quick"),
  boreMaterial: z.enum(BORE_MATERIAL_CODES, { error: "Choose the bore material." }),
  boreLengthUm: umWithin("honed bore length", L.boreLengthUm),
  bottomClearanceUm: umWithin("room below the bore", L.bottomClearanceUm).nullable().optional(),
  pistonDiameterUm: umWithin("piston size", L.diameterUm),
  bore: z.discriminatedUnion("kind", [
    z.object({ kind: z.literal("diameter"), diameterUm: umWithin("bore size", L.diameterUm) }),
    z.object({ kind: z.literal("stock"), stockUm: umWithin("stock left", L.stockUm, um) }),
  ]),
  ...planOptions,
});

/** The body of POST /api/plans/preview and of saving a plan. */
export const planRequestSchema = z.discriminatedUnion("mode", [jobPlanSchema, quickPlanSchema], {
  error: 'Say whether this is a job plan ("job") or a quick plan ("quick").',
});
export type JobPlanRequest = z.infer<typeof jobPlanSchema>;
export type QuickPlanRequest = z.infer<typeof quickPlanSchema>;
export type PlanRequest = z.infer<typeof planRequestSchema>;
/** What the wizard holds before defaults are applied (the schema's input side). */
export type JobPlanDraft = z.input<typeof jobPlanSchema>;
export type QuickPlanDraft = z.input<typeof quickPlanSchema>;

export const withdrawSchema = z.object({
  reason: z.string({ error: "Say why the plan is withdrawn." }).trim().min(3, "Say why the plan is withdrawn.").max(500, "At most 500 characters."),
});

/** Saving a quick plan into a new job: the job's own fields beside the plan's inputs. */
export const quickSaveSchema = z.object({
  plan: quickPlanSchema,
  job: z.object({
    engineDescription: z.string().trim().min(3, "Describe the engine, e.g. flat four, 2.0 L.").max(200, "At most 200 characters."),
    cylinderCount: z.number({ error: "Enter the number of cylinders." }).int("Whole cylinders only.").min(L.cylinders.min, "At least 1 cylinder.").max(L.cylinders.max, "At most 16 cylinders."),
    standardBoreUm: umWithin("standard bore", L.diameterUm),
    customerName: z.string().trim().max(120).optional(),
  }),
});
export type QuickSaveRequest = z.infer<typeof quickSaveSchema>;
