import { assertCan } from "@/server/auth/guard";
import { restoreVersionSchema } from "@/shared/stones/schema";
import { actorRoute, readJsonFor } from "@/server/http/route";
import { getVersion } from "@/server/stones/history";
import { restoreVersion } from "@/server/stones/restore";

type Params = { stoneId: string; versionId: string };

export const GET = actorRoute<Params>(async (_request, { actor, params }) => Response.json(await getVersion({ actor, ...params })));

/** Restores this version's figures as a new version; body `{ reason }`. */
export const POST = actorRoute<Params>(async (request, { actor, params }) => {
  assertCan(actor, "stones.edit");
  const input = await readJsonFor(request, restoreVersionSchema, params);
  return Response.json(await restoreVersion({ actor, input }));
});
