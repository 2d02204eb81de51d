import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { getMachine } from "@/server/machines/queries";
import { updateMachine } from "@/server/machines/mutations";

type Params = { machineId: string };

export const GET = actorRoute<Params>(async (_request, { actor, params }) => Response.json(await getMachine({ actor, machineId: params.machineId })));

export const PUT = actorRoute<Params>(async (request, { actor, params }) => {
  const input = await readJson(request, z.record(z.string(), z.unknown()));
  return Response.json(await updateMachine({ actor, input: { ...input, machineId: params.machineId } }));
});
