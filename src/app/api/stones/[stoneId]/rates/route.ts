import { assertCan } from "@/server/auth/guard";
import { createRateRowSchema } from "@/shared/stones/schema";
import { actorRoute, readJsonFor } from "@/server/http/route";
import { createRateRow } from "@/server/stones/rate-mutations";

/** Adds the stone's rate row for one bore material. */
export const POST = actorRoute<{ stoneId: string }>(async (request, { actor, params }) => {
  assertCan(actor, "stones.edit");
  const input = await readJsonFor(request, createRateRowSchema, { stoneId: params.stoneId });
  return Response.json(await createRateRow({ actor, input }), { status: 201 });
});
