import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { assignCylinder } from "@/server/jobs/mutations";

type Params = { jobId: string; cylinderId: string };

export const PATCH = actorRoute<Params>(async (request, { params, actor }) => {
  const { assignedUserId } = await readJson(request, z.object({ assignedUserId: z.string().max(36).nullable() }));
  return Response.json(await assignCylinder({ actor, jobId: params.jobId, cylinderId: params.cylinderId, userId: assignedUserId || null }));
});
