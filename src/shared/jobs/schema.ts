// Shared by the job forms and the server.
// Every length is µm; the forms parse the machinist's text with parseLength before validating.
import { z } from "zod";
import { BORE_MATERIAL_CODES } from "@/lib/bore-materials";
import { umWithin } from "@/shared/fields";
import { LIMITS, type Limits } from "@/shared/limits";
import { JOB_STATUSES } from "./constants";

const optionalLength = (label: string, limits: Limits) => umWithin(label, limits).nullable().optional();

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date like 2026-03-14.")
  .refine((v) => !/^\d{4}-\d{2}-\d{2}$/.test(v) || new Date(`${v}T00:00:00Z`).toISOString().startsWith(v), "That date does not exist.");

export const jobSchema = z
  .object({
    customerId: z.string().max(36).nullable().optional(),
    /** A new customer made with the job when no existing one is picked. */
    customerName: z.string().trim().max(120, "Names are at most 120 characters.").optional(),
    engineDescription: z.string().trim().min(3, "Describe the engine, e.g. flat four, 2.0 L.").max(200, "At most 200 characters."),
    boreMaterial: z.enum(BORE_MATERIAL_CODES, { error: "Choose the bore material." }),
    cylinderCount: z.number({ error: "Enter the number of cylinders." }).int("Whole cylinders only.").min(LIMITS.cylinders.min, "At least 1 cylinder.").max(LIMITS.cylinders.max, "At most 16 cylinders."),
    standardBoreUm: umWithin("standard bore", LIMITS.diameterUm),
    boreLengthUm: umWithin("honed bore length", LIMITS.boreLengthUm),
    bottomClearanceUm: optionalLength("room below the bore", LIMITS.bottomClearanceUm),
    wallThicknessUm: optionalLength("wall thickness", LIMITS.wallUm),
    minWallUm: optionalLength("minimum wall", LIMITS.wallUm),
    torquePlate: z.boolean().default(false),
    dueDate: isoDate.nullable().optional(),
    notes: z.string().trim().max(4000, "Notes are at most 4000 characters.").nullable().optional(),
    assignedUserId: z.string().max(36).nullable().optional(),
  })
  .superRefine((v, ctx) => {
    if (v.minWallUm != null && v.wallThicknessUm != null && v.minWallUm > v.wallThicknessUm) {
      ctx.addIssue({ code: "custom", path: ["minWallUm"], message: "The minimum wall is thicker than the wall measured: check both." });
    }
  });
export type JobInput = z.infer<typeof jobSchema>;

export const jobStatusSchema = z.object({ status: z.enum(JOB_STATUSES, { error: "Choose a status." }) });

export const JOB_SORTS = ["number", "dueDate", "customer", "status", "createdAt"] as const;

export const jobListSchema = z.object({
  q: z.string().trim().max(100).optional().default(""),
  status: z.enum([...JOB_STATUSES, "open", "all"]).optional().default("open"),
  dueFrom: isoDate.optional().or(z.literal("").transform(() => undefined)),
  dueTo: isoDate.optional().or(z.literal("").transform(() => undefined)),
  sort: z.enum(JOB_SORTS).optional().default("number"),
  dir: z.enum(["asc", "desc"]).optional().default("desc"),
  page: z.coerce.number().int().min(1).max(10_000).optional().default(1),
  pageSize: z.coerce.number().int().min(5).max(100).optional().default(20),
  archived: z.enum(["only", "include", "exclude"]).optional().default("exclude"),
  customerId: z.string().max(36).optional(),
});
export type JobListQuery = z.infer<typeof jobListSchema>;
