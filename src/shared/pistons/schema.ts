// Shared by the piston form and the server.
import { z } from "zod";
import { umWithin } from "@/shared/fields";
import { LIMITS } from "@/shared/limits";
import { PISTON_TYPES } from "@/shared/jobs/constants";


const clearance = (label: string) =>
  z
    .number({ error: `Enter the ${label}.` })
    .refine((v) => Number.isFinite(v) && v >= LIMITS.clearanceUm.min && v <= LIMITS.clearanceUm.max, `The ${label} must be between 0 and 0.5 mm.`);

export const pistonSchema = z
  .object({
    cylinderId: z.string().max(36).nullable().optional(),
    label: z.string().trim().min(1, "Give the piston a label, e.g. its stamp or 1.").max(40, "At most 40 characters."),
    diameterUm: umWithin("piston diameter", LIMITS.diameterUm),
    sizingHeightUm: z
      .number({ error: "Enter the sizing height." })
      .refine((v) => Number.isFinite(v) && v >= LIMITS.sizingHeightUm.min && v <= LIMITS.sizingHeightUm.max, "The sizing height must be between 0 and 150 mm."),
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
