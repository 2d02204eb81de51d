import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { getStoneDetail } from "@/server/stones/queries";
import { updateStone } from "@/server/stones/mutations";

type Params = { stoneId: string };
const body = z.record(z.string(), z.unknown());

export const GET = actorRoute<Params>(async (_request, { actor, params }) => Response.json(await getStoneDetail({ actor, stoneId: params.stoneId })));

/** Full update with `expectedVersion` and `reason`; writes a version record. */
export const PUT = actorRoute<Params>(async (request, { actor, params }) => {
  const input = await readJson(request, body);
  return Response.json(await updateStone({ actor, input: { ...input, stoneId: params.stoneId } }));
});
