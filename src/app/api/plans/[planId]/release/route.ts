import { actorRoute } from "@/server/http/route";
import { releasePlan } from "@/server/plans/mutations";

export const dynamic = "force-dynamic";

/** Releases a draft plan to the floor (lead or owner). */
export const POST = actorRoute<{ planId: string }>(async (_request, { params, actor }) => Response.json(await releasePlan({ actor, planId: params.planId })));
