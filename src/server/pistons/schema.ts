// Shared by the piston form and the server (no "server-only").
import { z } from "zod";
import { LIMITS, lengthUm } from "@/server/jobs/schema";
import { PISTON_TYPES } from "@/server/jobs/constants";

/** Clearance bands: 0 to 0.5 mm covers tight cast pistons to loose forged racing pistons. */
export const CLEARANCE_LIMITS_UM = { min: 0, max: 500 } as const;
/** Sizing point height above the skirt bottom: 0 to 150 mm. */
export const SIZING_HEIGHT_LIMITS_UM = { min: 0, max: 150_000 } as const;

const clearance = (label: string) =>
  z
    .number({ error: `Enter the ${label}.` })
    .refine((v) => Number.isFinite(v) && v >= CLEARANCE_LIMITS_UM.min && v <= CLEARANCE_LIMITS_UM.max, `The ${label} must be between 0 and 0.5 mm.`);

export const pistonSchema = z
  .object({
    cylinderId: z.string().max(36).nullable().optional(),
    label: z.string().trim().min(1, "Give the piston a label, e.g. its stamp or 1.").max(40, "At most 40 characters."),
    diameterUm: lengthUm("piston diameter", LIMITS.boreUm),
    sizingHeightUm: z
      .number({ error: "Enter the sizing height." })
      .refine((v) => Number.isFinite(v) && v >= SIZING_HEIGHT_LIMITS_UM.min && v <= SIZING_HEIGHT_LIMITS_UM.max, "The sizing height must be between 0 and 150 mm."),
    type: z.enum(PISTON_TYPES, { error: "Choose the piston type." }),
    clearanceMinUm: clearance("smallest clearance"),
    clearanceMaxUm: clearance("largest clearance"),
    notes: z.string().trim().max(1000, "At most 1000 characters.").nullable().optional(),
  })
  .superRefine((v, ctx) => {
    if (v.clearanceMinUm > v.clearanceMaxUm) {
      ctx.addIssue({ code: "custom", path: ["clearanceMaxUm"], message: "The largest clearance is smaller than the smallest." });
    }
  });
export type PistonInput = z.infer<typeof pistonSchema>;
