import { actorRoute } from "@/server/http/route";
import { getCustomer } from "@/server/customers/queries";

export const dynamic = "force-dynamic";
type Params = { customerId: string };

export const GET = actorRoute<Params>(async (_request, { params, actor }) => Response.json(await getCustomer({ actor, customerId: params.customerId })));
