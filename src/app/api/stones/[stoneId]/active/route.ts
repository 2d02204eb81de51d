import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { setStoneActive } from "@/server/stones/mutations";

/** Retires (`active: false`) or brings back a stone set, with a reason. */
export const POST = actorRoute<{ stoneId: string }>(async (request, { actor, params }) => {
  const input = await readJson(request, z.record(z.string(), z.unknown()));
  return Response.json(await setStoneActive({ actor, input: { ...input, stoneId: params.stoneId } }));
});
