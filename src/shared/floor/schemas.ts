// What the floor device sends: one schema for the device's queue and the server (no server imports).
import { z } from "zod";
import { SURFACE_PARAMETERS } from "@/lib/honing";
import { lengthUm, numberIn } from "@/shared/fields";
import { CLIENT_ID_PATTERN } from "@/shared/client-id";
import { RUN_BLOCKS } from "./constants";

/** Bores the trade hones: 20–400 mm (as the job intake). */
const BORE_LIMITS_UM = { min: 20_000, max: 400_000 } as const;
/** Most blocks of strokes are well under a thousand; more than this is a typing slip. */
export const MAX_STROKES_PER_BLOCK = 20_000;
/** A block just honed may be hot to the hand, but gauging above 80 °C is no measurement [common practice]. */
export const BLOCK_TEMPERATURE_LIMITS_C = { min: -10, max: 80 } as const;
export const GAUGE_TEMPERATURE_LIMITS_C = { min: -10, max: 45 } as const;

export const clientIdSchema = z.string().regex(CLIENT_ID_PATTERN, "This entry has no valid device id; reload the page.");

export const floorLevelSchema = z.object({
  name: z.string().trim().min(1, "A level needs a name.").max(40, "Level names are at most 40 characters."),
  aUm: lengthUm("Reading in direction A", BORE_LIMITS_UM),
  bUm: lengthUm("Reading in direction B", BORE_LIMITS_UM),
});
export type FloorLevel = z.infer<typeof floorLevelSchema>;

export const temperaturesSchema = z.object({
  blockC: numberIn("Block temperature", BLOCK_TEMPERATURE_LIMITS_C, "°C"),
  gaugeC: numberIn("Gauge temperature", GAUGE_TEMPERATURE_LIMITS_C, "°C"),
});

const target = {
  id: clientIdSchema,
  planId: z.string().min(1).max(36),
  cylinder: z.number().int().min(1).max(24),
};

/** One block of strokes done at the machine, with the reading taken after it (if one was). */
export const runSubmissionSchema = z.object({
  ...target,
  stagePosition: z.number().int().min(0).max(20),
  block: z.enum(RUN_BLOCKS),
  strokesDone: z.number().int("Strokes are whole double strokes.").min(0, "Strokes cannot be negative.").max(MAX_STROKES_PER_BLOCK, `At most ${MAX_STROKES_PER_BLOCK} strokes in one block.`),
  pressure: numberIn("Pressure", { min: 0.01, max: 20_000 }).optional(),
  spindleRpm: numberIn("Spindle speed", { min: 1, max: 5_000 }, "rpm").optional(),
  doubleStrokesPerMin: numberIn("Stroke rate", { min: 1, max: 1_000 }, "double strokes/min").optional(),
  readings: z.array(floorLevelSchema).min(1).max(8).nullable(),
  temperatures: temperaturesSchema.nullable(),
  notes: z.string().trim().max(1000, "Notes are at most 1000 characters.").default(""),
  doneAt: z.iso.datetime({ offset: true, error: "The time the block was done is missing." }),
});
export type RunSubmission = z.input<typeof runSubmissionSchema>;

const surfaceSchema = z.object(
  Object.fromEntries(SURFACE_PARAMETERS.map((p) => [p, z.number().min(0, "Cannot be negative.").max(p.endsWith("Pct") ? 100 : 100, "Beyond any honed surface.").optional()])) as Record<
    (typeof SURFACE_PARAMETERS)[number],
    z.ZodOptional<z.ZodNumber>
  >,
);

/** Where a surface report goes: named in the upload's address, read before its body. */
export const surfaceReportTargetSchema = z.object({
  planId: z.string().min(1, "Name the plan.").max(36),
  cylinder: z.coerce.number().int().min(1).max(24),
});

/** The final reading set of a cylinder, with its temperatures and an optional surface report. */
export const inspectionSubmissionSchema = z.object({
  ...target,
  readings: z.array(floorLevelSchema).min(1, "Enter the final readings.").max(8),
  temperatures: temperaturesSchema.nullable(),
  surface: surfaceSchema.nullable(),
  /** The uploaded profilometer report this check is backed by (an attachment on the cylinder). */
  surfaceReportId: clientIdSchema.nullable().default(null),
  inspectedAt: z.iso.datetime({ offset: true }),
});
export type InspectionSubmission = z.input<typeof inspectionSubmissionSchema>;
