import { assertCan } from "@/server/auth/guard";
import { updateStoneSchema } from "@/shared/stones/schema";
import { actorRoute, readJsonFor } from "@/server/http/route";
import { getStoneDetail } from "@/server/stones/queries";
import { updateStone } from "@/server/stones/mutations";

type Params = { stoneId: string };

export const GET = actorRoute<Params>(async (_request, { actor, params }) => Response.json(await getStoneDetail({ actor, stoneId: params.stoneId })));

/** Full update with `expectedVersion` and `reason`; writes a version record. */
export const PUT = actorRoute<Params>(async (request, { actor, params }) => {
  assertCan(actor, "stones.edit");
  const input = await readJsonFor(request, updateStoneSchema, { stoneId: params.stoneId });
  return Response.json(await updateStone({ actor, input }));
});
