import { readingSetSchema } from "@/shared/readings/schema";
import { actorRoute, readJsonFor } from "@/server/http/route";
import { createReadingSet } from "@/server/readings/mutations";

type Params = { jobId: string };

export const POST = actorRoute<Params>(async (request, { params, actor }) => {
  const input = await readJsonFor(request, readingSetSchema);
  const result = await createReadingSet({ actor, jobId: params.jobId, input });
  return Response.json(result, { status: result.created ? 201 : 200 });
});
