import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { setJobStatus } from "@/server/jobs/mutations";

type Params = { jobId: string };

export const POST = actorRoute<Params>(async (request, { params, actor }) => {
  const input = await readJson(request, z.unknown());
  return Response.json(await setJobStatus({ actor, jobId: params.jobId, input }));
});
