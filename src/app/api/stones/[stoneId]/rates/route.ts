import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { createRateRow } from "@/server/stones/rate-mutations";

/** Adds the stone's rate row for one bore material. */
export const POST = actorRoute<{ stoneId: string }>(async (request, { actor, params }) => {
  const input = await readJson(request, z.record(z.string(), z.unknown()));
  return Response.json(await createRateRow({ actor, input: { ...input, stoneId: params.stoneId } }), { status: 201 });
});
