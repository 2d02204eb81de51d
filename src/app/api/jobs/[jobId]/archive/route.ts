import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { setJobArchived } from "@/server/jobs/mutations";

type Params = { jobId: string };

export const POST = actorRoute<Params>(async (request, { params, actor }) => {
  const { archived } = await readJson(request, z.object({ archived: z.boolean() }));
  return Response.json(await setJobArchived({ actor, jobId: params.jobId, archived }));
});
