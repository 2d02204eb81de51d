import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { deletePiston, updatePiston } from "@/server/pistons/mutations";

type Params = { jobId: string; pistonId: string };

export const PATCH = actorRoute<Params>(async (request, { params, actor }) => {
  const input = await readJson(request, z.unknown());
  return Response.json(await updatePiston({ actor, jobId: params.jobId, pistonId: params.pistonId, input }));
});

export const DELETE = actorRoute<Params>(async (_request, { params, actor }) =>
  Response.json(await deletePiston({ actor, jobId: params.jobId, pistonId: params.pistonId })),
);
