import { actorRoute } from "@/server/http/route";
import { deleteReadingSet } from "@/server/readings/mutations";

type Params = { jobId: string; readingSetId: string };

export const DELETE = actorRoute<Params>(async (_request, { params, actor }) =>
  Response.json(await deleteReadingSet({ actor, jobId: params.jobId, readingSetId: params.readingSetId })),
);
