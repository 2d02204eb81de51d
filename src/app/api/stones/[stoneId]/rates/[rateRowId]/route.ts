import { assertCan } from "@/server/auth/guard";
import { updateRateRowSchema } from "@/shared/stones/schema";
import { actorRoute, readJsonFor } from "@/server/http/route";
import { notFound } from "@/server/errors";
import { getRateRow } from "@/server/stones/queries";
import { updateRateRow } from "@/server/stones/rate-mutations";

type Params = { stoneId: string; rateRowId: string };

async function rowOfStone(actor: Parameters<typeof getRateRow>[0]["actor"], params: Params) {
  const row = await getRateRow({ actor, rateRowId: params.rateRowId });
  if (row.stoneId !== params.stoneId) throw notFound("That rate row");
  return row;
}

export const GET = actorRoute<Params>(async (_request, { actor, params }) => Response.json(await rowOfStone(actor, params)));

/** Full update with `expectedVersion` and `reason`; writes a version record. */
export const PUT = actorRoute<Params>(async (request, { actor, params }) => {
  assertCan(actor, "stones.edit");
  const input = await readJsonFor(request, updateRateRowSchema, { rateRowId: params.rateRowId });
  await rowOfStone(actor, params);
  return Response.json(await updateRateRow({ actor, input }));
});
