import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { createPiston } from "@/server/pistons/mutations";

type Params = { jobId: string };

export const POST = actorRoute<Params>(async (request, { params, actor }) => {
  const input = await readJson(request, z.unknown());
  return Response.json(await createPiston({ actor, jobId: params.jobId, input }), { status: 201 });
});
