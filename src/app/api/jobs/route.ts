import { actorRoute } from "@/server/http/route";
import { listJobs } from "@/server/jobs/queries";

export const dynamic = "force-dynamic";

export const GET = actorRoute(async (request, { actor }) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  return Response.json(await listJobs({ actor, query }));
});

