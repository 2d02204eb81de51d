import { assertCan } from "@/server/auth/guard";
import { updateMachineSchema } from "@/shared/machines/schema";
import { actorRoute, readJsonFor } from "@/server/http/route";
import { getMachine } from "@/server/machines/queries";
import { updateMachine } from "@/server/machines/mutations";

type Params = { machineId: string };

export const GET = actorRoute<Params>(async (_request, { actor, params }) => Response.json(await getMachine({ actor, machineId: params.machineId })));

export const PUT = actorRoute<Params>(async (request, { actor, params }) => {
  assertCan(actor, "machines.edit");
  const input = await readJsonFor(request, updateMachineSchema, { machineId: params.machineId });
  return Response.json(await updateMachine({ actor, input }));
});
