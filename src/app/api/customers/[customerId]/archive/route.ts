import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { setCustomerArchived } from "@/server/customers/mutations";

type Params = { customerId: string };

export const POST = actorRoute<Params>(async (request, { params, actor }) => {
  const { archived } = await readJson(request, z.object({ archived: z.boolean() }));
  return Response.json(await setCustomerArchived({ actor, customerId: params.customerId, archived }));
});
