import "server-only";
import { BackLink } from "@/components/ui/back-link";
import { orNotFound, pageActor } from "@/server/http/page";
import { getStoneDetail } from "@/server/stones/queries";
import { viewerUnits } from "@/server/units";

/** The stone an editor page works on, in the editor's units; without stones.edit the page goes back to the library. */
export async function loadStoneToEdit(stoneId: string) {
  const actor = await pageActor("stones.edit", "/stones");
  const [detail, units] = await Promise.all([orNotFound(getStoneDetail({ actor, stoneId })), viewerUnits(actor)]);
  return { ...detail, units };
}

export function BackToStone({ stone }: { stone: { id: string; code: string } }) {
  return <BackLink href={`/stones/${stone.id}`}>{stone.code}</BackLink>;
}
