import { actorRoute, readJson } from "@/server/http/route";
import { z } from "zod";
import { listStones } from "@/server/stones/queries";
import { createStone } from "@/server/stones/mutations";

const body = z.record(z.string(), z.unknown());

export const GET = actorRoute(async (_request, { actor }) => Response.json({ stones: await listStones({ actor }) }));

/** Creates a stone set; the stone schema (with its physical limits) validates inside createStone. */
export const POST = actorRoute(async (request, { actor }) => {
  const input = await readJson(request, body);
  // A blank reason means "the default"; anything else is checked like every reason (length, type).
  const reason = typeof input.reason === "string" && !input.reason.trim() ? undefined : input.reason;
  return Response.json(await createStone({ actor, input, reason }), { status: 201 });
});
