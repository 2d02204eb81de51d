import { actorRoute, readJson } from "@/server/http/route";
import { previewRequestJson } from "@/server/plans/preview";
import { planRequestSchema } from "@/shared/plans/schema";

export const dynamic = "force-dynamic";

/** The wizard's live preview: the same schema as the form, then planHone per cylinder. */
export const POST = actorRoute(async (request, { actor, planningVersion }) => {
  const plan = await readJson(request, planRequestSchema);
  const body = await previewRequestJson({ actor, request: plan, planningVersion });
  return new Response(body, { headers: { "content-type": "application/json", "cache-control": "no-store" } });
});
