import "server-only";
import { parseLength } from "@/lib/honing";
import type { Actor } from "@/server/auth/policy";
import { getUnitSystem } from "@/server/jobs/queries";
import { displayUnits, type DisplayUnits } from "@/server/jobs/units";

/** The signed-in user's display units (metric → mm and µm, inch → in and thou). */
export async function viewerUnits(actor: Actor): Promise<DisplayUnits> {
  return displayUnits(await getUnitSystem({ userId: actor.userId }));
}

/** The length fields of the library forms: a bare number in them is in the user's size unit. */
export const STONE_LENGTH_FIELDS = ["stoneLengthUm", "stoneWidthUm", "startHeightUm", "wearLimitHeightUm", "currentHeightUm"] as const;
export const RATE_LENGTH_FIELDS = ["referenceBoreLengthUm", "referenceDiameterUm"] as const;
export const MACHINE_LENGTH_FIELDS = ["maxStrokeLengthUm", "headStoneLengthUm"] as const;

const BARE_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;

/**
 * A form's length text read in the user's unit, for the shared schemas (whose bare numbers mean mm):
 * a length becomes µm rounded to the database's 0.1 µm, so an untouched field compares equal to what
 * is stored; text that is not a length keeps its words (and gains the user's unit if bare) so the
 * schema refuses it with the same reason the field showed.
 */
export function readLengthText(value: unknown, units: DisplayUnits): unknown {
  if (typeof value !== "string" || value.trim() === "") return value;
  const text = BARE_NUMBER.test(value.trim()) ? `${value.trim()} ${units.size}` : value;
  const parsed = parseLength(text, units.size);
  return parsed.ok ? Math.round(parsed.um * 10) / 10 : text;
}

/** The form input with each named length field read in the actor's unit. */
export async function withUserLengths(actor: Actor, input: Record<string, unknown>, fields: readonly string[]): Promise<Record<string, unknown>> {
  const units = await viewerUnits(actor);
  const out = { ...input };
  for (const field of fields) if (field in out) out[field] = readLengthText(out[field], units);
  return out;
}
