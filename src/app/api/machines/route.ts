import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { listMachines } from "@/server/machines/queries";
import { createMachine } from "@/server/machines/mutations";

export const GET = actorRoute(async (_request, { actor }) => Response.json({ machines: await listMachines({ actor }) }));

export const POST = actorRoute(async (request, { actor }) => {
  const input = await readJson(request, z.record(z.string(), z.unknown()));
  return Response.json(await createMachine({ actor, input }), { status: 201 });
});
