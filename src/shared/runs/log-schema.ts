// The run log's filters (/runs, issue 13), read from the query string: one schema for the page's form
// and the server. Every field is optional; an empty field means "any".
import { z } from "zod";
import { BORE_MATERIAL_CODES } from "@/lib/bore-materials";

/** Rows per page: enough to scan a day, bounded so one request reads a bounded slice of the log. */
export const RUN_LOG_PAGE_SIZE = 50;
/** Capability over the last N finished bores: the choices the form offers and their bounds. */
export const CAPABILITY_BORES = { min: 8, default: 30, max: 500 } as const;

const blank = z.literal("").transform(() => undefined);
const id = (what: string) => z.string().trim().max(36, `${what} ids are at most 36 characters.`).regex(/^[A-Za-z0-9-]+$/, `That is not a ${what.toLowerCase()} id.`).optional().or(blank);
const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date like 2026-03-14.")
  .refine((v) => !/^\d{4}-\d{2}-\d{2}$/.test(v) || new Date(`${v}T00:00:00Z`).toISOString().startsWith(v), "That date does not exist.");

/** Where a page ends: the last row's time (ms since 1970) and id, so the next page starts after it (no OFFSET). */
export const RUN_CURSOR_PATTERN = /^(\d{1,15})\.([A-Za-z0-9-]{1,36})$/;

export const runLogSchema = z
  .object({
    stone: id("Stone"),
    machine: id("Machine"),
    material: z.enum(BORE_MATERIAL_CODES, "Pick a bore material from the list.").optional().or(blank),
    person: id("Person"),
    from: isoDate.optional().or(blank),
    to: isoDate.optional().or(blank),
    after: z.string().regex(RUN_CURSOR_PATTERN, "That page link is damaged; start from the first page.").optional().or(blank),
    bores: z.coerce
      .number("The number of bores must be a whole number.")
      .int("The number of bores must be a whole number.")
      .min(CAPABILITY_BORES.min, `Use at least ${CAPABILITY_BORES.min} bores.`)
      .max(CAPABILITY_BORES.max, `Use at most ${CAPABILITY_BORES.max} bores.`)
      .optional()
      .default(CAPABILITY_BORES.default),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { path: ["to"], message: "The end date is before the start date." });

export type RunLogQuery = z.infer<typeof runLogSchema>;

/** The query string of a filter set (empty fields left out), for links that keep the filters. */
export function runLogHref(query: Partial<Record<keyof RunLogQuery, string | number | undefined>>): string {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) if (v !== undefined && v !== "") params.set(k, String(v));
  const text = params.toString();
  return text ? `/runs?${text}` : "/runs";
}
