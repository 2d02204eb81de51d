import { actorRoute, readJson } from "@/server/http/route";
import { previewPlan } from "@/server/plans/preview";
import { planRequestSchema } from "@/server/plans/schema";

export const dynamic = "force-dynamic";

/** The wizard's live preview: the same schema as the form, then planHone per cylinder. */
export const POST = actorRoute(async (request, { actor }) => {
  const input = await readJson(request, planRequestSchema);
  return Response.json(await previewPlan({ actor, input }), { headers: { "cache-control": "no-store" } });
});
