import { actorRoute } from "@/server/http/route";
import { serveAttachment } from "@/server/uploads/serve";

type Params = { attachmentId: string };

export const GET = actorRoute<Params>(async (_request, { params, actor }) => serveAttachment({ actor, attachmentId: params.attachmentId, thumbnail: false }));
