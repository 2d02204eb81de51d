import { actorRoute, readJson } from "@/server/http/route";
import { withdrawPlan } from "@/server/plans/mutations";
import { withdrawSchema } from "@/shared/plans/schema";

export const dynamic = "force-dynamic";

/** Withdraws a plan with a reason (lead or owner). */
export const POST = actorRoute<{ planId: string }>(async (request, { params, actor }) => {
  const input = await readJson(request, withdrawSchema);
  return Response.json(await withdrawPlan({ actor, planId: params.planId, input }));
});
