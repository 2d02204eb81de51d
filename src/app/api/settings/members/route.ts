import { actorRoute } from "@/server/http/route";
import { listMembers } from "@/server/auth/members";

/** The members of the caller's shop (owners only, members.view), for client-side refreshes. */
export const GET = actorRoute(async (_request, { actor }) => {
  const members = await listMembers(actor);
  return Response.json({ members: members.map((m) => ({ ...m, joinedAt: m.joinedAt.toISOString() })) });
});
