import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { getCustomer } from "@/server/customers/queries";
import { updateCustomer } from "@/server/customers/mutations";

export const dynamic = "force-dynamic";
type Params = { customerId: string };

export const GET = actorRoute<Params>(async (_request, { params, actor }) => Response.json(await getCustomer({ actor, customerId: params.customerId })));

export const PATCH = actorRoute<Params>(async (request, { params, actor }) => {
  const input = await readJson(request, z.unknown());
  return Response.json(await updateCustomer({ actor, customerId: params.customerId, input }));
});
