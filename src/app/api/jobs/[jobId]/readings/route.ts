import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { createReadingSet } from "@/server/readings/mutations";

type Params = { jobId: string };

export const POST = actorRoute<Params>(async (request, { params, actor }) => {
  const input = await readJson(request, z.unknown());
  const result = await createReadingSet({ actor, jobId: params.jobId, input });
  return Response.json(result, { status: result.created ? 201 : 200 });
});
