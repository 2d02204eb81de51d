import { z } from "zod";
import { assertCan } from "@/server/auth/guard";
import { actorRoute, readJsonFor } from "@/server/http/route";
import { createStoneSchema } from "@/shared/stones/schema";
import { listStones } from "@/server/stones/queries";
import { createStone } from "@/server/stones/mutations";

export const GET = actorRoute(async (_request, { actor }) => Response.json({ stones: await listStones({ actor }) }));

/** Creates a stone set; the stone schema (with its physical limits) validates inside createStone. */
export const POST = actorRoute(async (request, { actor }) => {
  assertCan(actor, "stones.edit");
  const input = await readJsonFor(request, createStoneSchema.and(z.object({ reason: z.string().max(500).optional() })));
  // A blank reason means "the default"; anything else is checked like every reason (length, type).
  const reason = typeof input.reason === "string" && !input.reason.trim() ? undefined : input.reason;
  return Response.json(await createStone({ actor, input, reason }), { status: 201 });
});
