import { actorRoute } from "@/server/http/route";
import { getJobDetail } from "@/server/jobs/detail";

export const dynamic = "force-dynamic";
type Params = { jobId: string };

export const GET = actorRoute<Params>(async (_request, { params, actor }) => Response.json(await getJobDetail({ actor, jobId: params.jobId })));

