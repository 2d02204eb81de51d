import { actorRoute, readJson } from "@/server/http/route";
import { saveQuickPlan } from "@/server/plans/mutations";
import { quickSaveSchema } from "@/shared/plans/schema";

export const dynamic = "force-dynamic";

/** Saves a quick plan into a new job with its inputs. */
export const POST = actorRoute(async (request, { actor }) => {
  const input = await readJson(request, quickSaveSchema);
  return Response.json(await saveQuickPlan({ actor, input }), { status: 201 });
});
