// Shared by the reading grid, the CSV import and the server.
import { z } from "zod";
import { formatLength } from "@/lib/honing";
import { umWithin } from "@/shared/fields";
import { LIMITS } from "@/shared/limits";
import { READING_KINDS } from "@/shared/jobs/constants";

/**
 * A reading further than this from the standard bore is a slip (wrong unit, a missing digit), not
 * a worn or oversized bore: oversizes stop near +1.5 mm and sleeving is a different job.
 */
export const MAX_READING_OFFSET_UM = 3_000;

/** Why a reading cannot belong to a bore of this standard size, or null when it can. */
export function readingOutOfRange(diameterUm: number, standardBoreUm: number): string | null {
  if (Math.abs(diameterUm - standardBoreUm) <= MAX_READING_OFFSET_UM) return null;
  return `${formatLength(diameterUm, "mm")} is more than 3 mm from the ${formatLength(standardBoreUm, "mm")} standard bore; check the unit.`;
}

export const levelNameSchema = z.string().trim().min(1, "A level needs a name.").max(40, "Level names are at most 40 characters.");

export const readingLevelSchema = z.object({
  name: levelNameSchema,
  aUm: umWithin("reading in direction A", LIMITS.diameterUm),
  bUm: umWithin("reading in direction B", LIMITS.diameterUm),
});

export const readingSetSchema = z
  .object({
    cylinderId: z.string().min(1, "Pick a cylinder.").max(36),
    kind: z.enum(READING_KINDS, { error: "Choose when the readings were taken." }),
    gauge: z.string().trim().max(80, "At most 80 characters.").nullable().optional(),
    temperatureC: z.number().min(-30, "Below −30 °C: check the value.").max(60, "Above 60 °C: let the block cool before gauging.").nullable().optional(),
    clientKey: z.string().regex(/^[A-Za-z0-9_-]{8,64}$/, "Bad submission key.").optional(),
    levels: z.array(readingLevelSchema).min(1, "Enter at least one level.").max(8, "At most 8 levels."),
  })
  .superRefine((v, ctx) => {
    const names = v.levels.map((l) => l.name.toLowerCase());
    if (new Set(names).size !== names.length) ctx.addIssue({ code: "custom", path: ["levels"], message: "Each level appears once." });
  });
export type ReadingSetInput = z.infer<typeof readingSetSchema>;

export const importOptionsSchema = z.object({
  kind: z.enum(READING_KINDS, { error: "Choose when the readings were taken." }).default("as_received"),
  gauge: z.string().trim().max(80).optional().transform((v) => v || null),
  mode: z.enum(["preview", "commit"]).default("preview"),
});
