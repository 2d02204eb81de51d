import "server-only";
import type { Actor } from "@/shared/auth/policy";
import { getUnitSystem } from "@/server/jobs/queries";
import { displayUnits, readLengthText, type DisplayUnits } from "@/shared/units";

/** The signed-in user's display units (metric → mm and µm, inch → in and thou). */
export async function viewerUnits(actor: Actor): Promise<DisplayUnits> {
  return displayUnits(await getUnitSystem({ userId: actor.userId }));
}

/** The form input with each named length field read in the actor's unit. */
export async function withUserLengths(actor: Actor, input: Record<string, unknown>, fields: readonly string[]): Promise<Record<string, unknown>> {
  const units = await viewerUnits(actor);
  const out = { ...input };
  for (const field of fields) if (field in out) out[field] = readLengthText(out[field], units);
  return out;
}
