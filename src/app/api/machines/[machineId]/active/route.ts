import { z } from "zod";
import { actorRoute, readJson } from "@/server/http/route";
import { setMachineActive } from "@/server/machines/mutations";

/** Retires (`active: false`) or brings back a machine. */
export const POST = actorRoute<{ machineId: string }>(async (request, { actor, params }) => {
  const input = await readJson(request, z.record(z.string(), z.unknown()));
  return Response.json(await setMachineActive({ actor, input: { ...input, machineId: params.machineId } }));
});
