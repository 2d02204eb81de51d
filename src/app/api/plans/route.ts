import { actorRoute, readJson } from "@/server/http/route";
import { savePlanDraft } from "@/server/plans/mutations";
import { jobPlanSchema } from "@/shared/plans/schema";

export const dynamic = "force-dynamic";

/** Saves the wizard's choices as a draft plan of the job (numbers recomputed on the server). */
export const POST = actorRoute(async (request, { actor }) => {
  const input = await readJson(request, jobPlanSchema);
  return Response.json(await savePlanDraft({ actor, input }), { status: 201 });
});
