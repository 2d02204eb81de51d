import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { listCustomers } from "@/server/customers/queries";
import { createCustomer } from "@/server/customers/mutations";

export const dynamic = "force-dynamic";

export const GET = actorRoute(async (request, { actor }) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  return Response.json(await listCustomers({ actor, query }));
});

export const POST = actorRoute(async (request, { actor }) => {
  const input = await readJson(request, z.unknown());
  return Response.json(await createCustomer({ actor, input }), { status: 201 });
});
