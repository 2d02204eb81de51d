import { actorRoute } from "@/server/http/route";
import { listStonesNearWearLimit } from "@/server/stones/queries";

export const GET = actorRoute(async (_request, { actor }) => Response.json({ stones: await listStonesNearWearLimit({ actor }) }));
