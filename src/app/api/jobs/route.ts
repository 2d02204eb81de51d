import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { listJobs } from "@/server/jobs/queries";
import { createJob } from "@/server/jobs/mutations";

export const dynamic = "force-dynamic";

export const GET = actorRoute(async (request, { actor }) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  return Response.json(await listJobs({ actor, query }));
});

export const POST = actorRoute(async (request, { actor }) => {
  const input = await readJson(request, z.unknown());
  return Response.json(await createJob({ actor, input }), { status: 201 });
});
