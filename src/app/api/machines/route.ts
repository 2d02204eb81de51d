import { assertCan } from "@/server/auth/guard";
import { createMachineSchema } from "@/shared/machines/schema";
import { actorRoute, readJsonFor } from "@/server/http/route";
import { listMachines } from "@/server/machines/queries";
import { createMachine } from "@/server/machines/mutations";

export const GET = actorRoute(async (_request, { actor }) => Response.json({ machines: await listMachines({ actor }) }));

export const POST = actorRoute(async (request, { actor }) => {
  assertCan(actor, "machines.edit");
  const input = await readJsonFor(request, createMachineSchema);
  return Response.json(await createMachine({ actor, input }), { status: 201 });
});
