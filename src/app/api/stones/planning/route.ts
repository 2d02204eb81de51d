import { z } from "zod";
import { BORE_MATERIAL_CODES } from "@/lib/bore-materials";
import { actorRoute } from "@/server/http/route";
import { getPlanningLibrary } from "@/server/plans/library";

const query = z.object({ boreMaterial: z.enum(BORE_MATERIAL_CODES), machineId: z.string().min(1).max(36) });

/** The stones, rate rows (with versions) and machine that planHone takes, for one material and machine. */
export const GET = actorRoute(async (request, { actor }) => {
  const params = query.parse(Object.fromEntries(new URL(request.url).searchParams));
  return Response.json(await getPlanningLibrary({ actor, ...params }));
});
