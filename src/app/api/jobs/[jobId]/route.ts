import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { getJobDetail } from "@/server/jobs/detail";
import { updateJob } from "@/server/jobs/mutations";

export const dynamic = "force-dynamic";
type Params = { jobId: string };

export const GET = actorRoute<Params>(async (_request, { params, actor }) => Response.json(await getJobDetail({ actor, jobId: params.jobId })));

export const PATCH = actorRoute<Params>(async (request, { params, actor }) => {
  const input = await readJson(request, z.unknown());
  return Response.json(await updateJob({ actor, jobId: params.jobId, input }));
});
