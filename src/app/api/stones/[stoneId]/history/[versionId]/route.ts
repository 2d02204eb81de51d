import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { getVersion } from "@/server/stones/history";
import { restoreVersion } from "@/server/stones/restore";

type Params = { stoneId: string; versionId: string };

export const GET = actorRoute<Params>(async (_request, { actor, params }) => Response.json(await getVersion({ actor, ...params })));

/** Restores this version's figures as a new version; body `{ reason }`. */
export const POST = actorRoute<Params>(async (request, { actor, params }) => {
  const input = await readJson(request, z.record(z.string(), z.unknown()));
  return Response.json(await restoreVersion({ actor, input: { ...input, ...params } }));
});
