import { assertCan } from "@/server/auth/guard";
import { setStoneActiveSchema } from "@/shared/stones/schema";
import { actorRoute, readJsonFor } from "@/server/http/route";
import { setStoneActive } from "@/server/stones/mutations";

/** Retires (`active: false`) or brings back a stone set, with a reason. */
export const POST = actorRoute<{ stoneId: string }>(async (request, { actor, params }) => {
  assertCan(actor, "stones.edit");
  const input = await readJsonFor(request, setStoneActiveSchema, { stoneId: params.stoneId });
  return Response.json(await setStoneActive({ actor, input }));
});
