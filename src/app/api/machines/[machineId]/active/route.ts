import { assertCan } from "@/server/auth/guard";
import { setMachineActiveSchema } from "@/shared/machines/schema";
import { actorRoute, readJsonFor } from "@/server/http/route";
import { setMachineActive } from "@/server/machines/mutations";

/** Retires (`active: false`) or brings back a machine. */
export const POST = actorRoute<{ machineId: string }>(async (request, { actor, params }) => {
  assertCan(actor, "machines.edit");
  const input = await readJsonFor(request, setMachineActiveSchema, { machineId: params.machineId });
  return Response.json(await setMachineActive({ actor, input }));
});
