import { actorRoute } from "@/server/http/route";
import { listStoneHistory } from "@/server/stones/history";

export const GET = actorRoute<{ stoneId: string }>(async (_request, { actor, params }) =>
  Response.json({ history: await listStoneHistory({ actor, stoneId: params.stoneId }) }),
);
